import { z } from 'zod';
import type { RecipeTree } from '@/shared/recipe/types';
import type { SuggestedTarget } from '@/shared/recipe/template';
import type { TreeChange } from '@/shared/recipe/template-diff';

/*
 * Clubs and their shared recipe templates: request bodies (validated on both sides) and the
 * response shapes of /api/clubs, /api/recipes/:id/template-* and /api/account/settings.
 */

const id = z.string().uuid('Not an id');

/** Longest template title, description and changelog: the API's limits and the forms' boxes. */
export const TEMPLATE_TITLE_MAX_CHARS = 80;
export const TEMPLATE_DESCRIPTION_MAX_CHARS = 4000;
export const CHANGELOG_MAX_CHARS = 2000;

export const templateTitleSchema = z
  .string({ error: 'Title must be text' })
  .trim()
  .min(1, 'Give the template a title')
  .max(TEMPLATE_TITLE_MAX_CHARS, `A title has at most ${TEMPLATE_TITLE_MAX_CHARS} characters`);
export const templateDescriptionSchema = z.string({ error: 'Description must be text' }).max(TEMPLATE_DESCRIPTION_MAX_CHARS, `A description has at most ${TEMPLATE_DESCRIPTION_MAX_CHARS} characters`);
export const templateTagSchema = z.string({ error: 'A tag must be text' }).trim().toLowerCase().min(1, 'A tag cannot be empty').max(30, 'A tag has at most 30 characters');
export const templateTagsSchema = z.array(templateTagSchema).max(10, 'At most 10 tags').transform((tags) => [...new Set(tags)]);
export const changelogSchema = z
  .string({ error: 'Changelog must be text' })
  .trim()
  .min(1, 'Say what this version is or changes')
  .max(CHANGELOG_MAX_CHARS, `A changelog has at most ${CHANGELOG_MAX_CHARS} characters`);

/** Publishing a recipe as a new template (version 1). */
export const templateCreateSchema = z.object({
  recipeId: id,
  title: templateTitleSchema,
  description: templateDescriptionSchema.default(''),
  tags: templateTagsSchema.default([]),
  changelog: changelogSchema,
});
export type TemplateCreate = z.input<typeof templateCreateSchema>;

/** Publishing a new version from a recipe. */
export const templateVersionCreateSchema = z.object({ recipeId: id, changelog: changelogSchema });
export type TemplateVersionCreate = z.input<typeof templateVersionCreateSchema>;

/** Editing a template's metadata (versions are immutable). */
export const templatePatchSchema = z
  .object({ title: templateTitleSchema.optional(), description: templateDescriptionSchema.optional(), tags: templateTagsSchema.optional() })
  .refine((p) => p.title !== undefined || p.description !== undefined || p.tags !== undefined, { message: 'Change the title, description or tags', path: ['_'] });
export type TemplatePatch = z.input<typeof templatePatchSchema>;

/** Taking a template into one's recipes. */
export const templateUseSchema = z.object({
  version: z.number({ error: 'Version must be a number' }).int('Version is a whole number').positive('Version starts at 1').optional(),
  rigId: id.nullable(),
  siteId: id.nullable().default(null),
  name: z.string({ error: 'Name must be text' }).trim().min(1, 'Give the recipe a name').max(80, 'A name has at most 80 characters').optional(),
  bandMap: z.record(z.string().min(1).max(24), z.string({ error: 'Filter must be text' }).trim().min(1, 'Name a filter').max(24, 'A filter name has at most 24 characters')).default({}),
  targetIds: z.record(id, id.nullable()).default({}),
});
export type TemplateUse = z.input<typeof templateUseSchema>;

export const templateListQuerySchema = z.object({
  q: z.string().max(100).optional(),
  tag: z.string().max(30).optional(),
  retired: z.enum(['0', '1']).optional(),
});

/**
 * An invitation id in a link: better-auth's ids (32 letters and digits) or UUIDs. Anything else
 * is refused before the database is asked.
 */
export const invitationIdSchema = z.string().regex(/^[A-Za-z0-9-]{16,64}$/, 'This is not an invitation link');

export const accountSettingsSchema = z.object({ notifyTemplateVersions: z.boolean({ error: 'Choose on or off' }) });
export type AccountSettings = z.output<typeof accountSettingsSchema>;

export interface ClubListItem {
  id: string;
  name: string;
  slug: string;
  myRoles: string[];
  memberCount: number;
  templateCount: number;
}

export interface ClubMember {
  /** better-auth's membership id (what role changes and removals take). */
  memberId: string;
  userId: string;
  name: string;
  email: string;
  roles: string[];
  joinedAt: string;
}

export interface ClubInvitation {
  id: string;
  email: string;
  role: string;
  status: string;
  expiresAt: string;
}

/**
 * What an e-mailed invitation link shows before anyone signs in (GET /api/invitations/:id/preview):
 * only a pending, unexpired invitation answers, and only with these fields.
 */
export interface InvitationPreview {
  clubName: string;
  inviterName: string;
  /** As stored: one role or a comma list ("admin,member"). */
  role: string;
  /** The invited address, masked ("t***@quarryhill.example"). */
  email: string;
  expiresAt: string;
  status: 'pending';
}

export interface TemplateSummary {
  id: string;
  clubId: string;
  title: string;
  description: string;
  tags: string[];
  latestVersion: number;
  useCount: number;
  retired: boolean;
  updatedAt: string;
}

export interface ClubDetail {
  club: { id: string; name: string; slug: string };
  myRoles: string[];
  members: ClubMember[];
  invitations: ClubInvitation[];
  templates: TemplateSummary[];
}

export interface TemplateVersionSummary {
  version: number;
  changelog: string;
  createdAt: string;
  /** The publisher's name ('' when the account is gone). */
  createdBy: string;
  useCount: number;
}

export interface TemplateDetail extends TemplateSummary {
  versions: TemplateVersionSummary[];
  /** The latest version's tree (filters by band, stages without targets). */
  tree: RecipeTree;
  /** Filter references (bands or custom filter names) the latest version uses. */
  bands: string[];
  /** The publisher's targets of the latest version, keyed by stage id (a suggestion). */
  suggestedTargets: Record<string, SuggestedTarget>;
  myUses: { recipeId: string | null; version: number }[];
}

export interface TemplateVersionDetail {
  version: number;
  changelog: string;
  tree: RecipeTree;
  bands: string[];
  suggestedTargets: Record<string, SuggestedTarget>;
  createdAt: string;
}

/** A version's changelog, as the notice about newer versions lists them. */
export interface TemplateVersionNote {
  version: number;
  changelog: string;
  createdAt: string;
}

export interface TemplateOrigin {
  clubId: string;
  templateId: string;
  title: string;
  version: number;
  latestVersion: number;
  newer: boolean;
  /** The versions after the one the recipe came from, newest first. */
  newerVersions: TemplateVersionNote[];
}

export interface TemplateDiff {
  from: number;
  to: number;
  changes: TreeChange[];
}
