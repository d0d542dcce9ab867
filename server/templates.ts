import { and, asc, countDistinct, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { clubTemplate, clubTemplateVersion, member, recipe, rig, target, templateUse, user, userSettings } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { actionMail, type Mailer } from '@/server/mail/mailer';
import { toTemplateTree, type SuggestedTarget, type TemplateSnapshot } from '@/shared/recipe/template';
import type { RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';
import type { TemplateDetail, TemplateSummary, TemplateVersionDetail } from '@/shared/schemas/club-api';

type TemplateRow = typeof clubTemplate.$inferSelect;
type VersionRow = typeof clubTemplateVersion.$inferSelect;
export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

const splitRoles = (role: string) => role.split(',').map((r) => r.trim()).filter(Boolean);
export const isClubManager = (roles: string[]) => roles.includes('owner') || roles.includes('admin');

/** The user's roles in a club; 404 when they are not a member (non-members see nothing of a club). */
export async function clubRolesOf(db: Database, userId: string, clubId: string): Promise<string[]> {
  const [row] = await db.select({ role: member.role }).from(member).where(and(eq(member.userId, userId), eq(member.organizationId, clubId)));
  if (!row) throw notFound('No such club');
  return splitRoles(row.role);
}

/** A template of the club, or 404. */
export async function templateOfClub(db: Database | Tx, clubId: string, templateId: string, lock = false): Promise<TemplateRow> {
  const q = db.select().from(clubTemplate).where(and(eq(clubTemplate.id, templateId), eq(clubTemplate.clubId, clubId)));
  const [row] = lock ? await q.for('update') : await q;
  if (!row) throw notFound('No such template');
  return row;
}

/** The user's recipe made rig-agnostic (a 400 on `recipeId` when it is not theirs). */
export async function snapshotOfRecipe(db: Database | Tx, userId: string, recipeId: string): Promise<TemplateSnapshot> {
  const [row] = await db.select().from(recipe).where(and(eq(recipe.id, recipeId), eq(recipe.ownerId, userId), isNull(recipe.deletedAt)));
  if (!row) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { recipeId: ['No such recipe'] } });
  return abstractRecipe(db, userId, row);
}

/** A recipe row's tree re-abstracted to bands with the recipe's own rig and the owner's targets. */
export async function abstractRecipe(db: Database | Tx, userId: string, row: typeof recipe.$inferSelect): Promise<TemplateSnapshot> {
  const [r] = row.rigId ? await db.select({ spec: rig.spec }).from(rig).where(eq(rig.id, row.rigId)) : [];
  const targets = await db
    .select({ id: target.id, designation: target.designation, name: target.name, raDeg: target.raDeg, decDeg: target.decDeg })
    .from(target)
    .where(eq(target.ownerId, userId));
  const byId = new Map<string, SuggestedTarget>(targets.map(({ id, ...t }) => [id, t]));
  return toTemplateTree(row.tree as RecipeTree, { rig: (r?.spec as RigInput | undefined) ?? null, targetOf: (id) => byId.get(id) });
}

const toSummary = (t: TemplateRow, useCount: number): TemplateSummary => ({
  id: t.id,
  clubId: t.clubId,
  title: t.title,
  description: t.description,
  tags: t.tags,
  latestVersion: t.latestVersion,
  useCount,
  retired: t.retiredAt !== null,
  updatedAt: t.updatedAt.toISOString(),
});

/** Distinct users per template (the "used by" count). */
async function useCounts(db: Database, templateIds: string[]): Promise<Map<string, number>> {
  if (templateIds.length === 0) return new Map();
  const rows = await db.select({ id: templateUse.templateId, n: countDistinct(templateUse.userId) }).from(templateUse).where(inArray(templateUse.templateId, templateIds)).groupBy(templateUse.templateId);
  return new Map(rows.map((r) => [r.id, Number(r.n)]));
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** A club's templates, newest first; retired ones only when asked for. */
export async function templateSummaries(db: Database, clubId: string, opts: { q?: string; tag?: string; withRetired?: boolean } = {}): Promise<TemplateSummary[]> {
  const conds: (SQL | undefined)[] = [eq(clubTemplate.clubId, clubId), opts.withRetired ? undefined : isNull(clubTemplate.retiredAt)];
  if (opts.q) conds.push(or(ilike(clubTemplate.title, `%${escapeLike(opts.q)}%`), ilike(clubTemplate.description, `%${escapeLike(opts.q)}%`)));
  if (opts.tag) conds.push(sql`${clubTemplate.tags} @> ${JSON.stringify([opts.tag.trim().toLowerCase()])}::jsonb`);
  const rows = await db.select().from(clubTemplate).where(and(...conds)).orderBy(desc(clubTemplate.updatedAt)).limit(500);
  const counts = await useCounts(db, rows.map((r) => r.id));
  return rows.map((r) => toSummary(r, counts.get(r.id) ?? 0));
}

export const toVersionDetail = (v: VersionRow): TemplateVersionDetail => ({
  version: v.version,
  changelog: v.changelog,
  tree: v.tree as RecipeTree,
  bands: v.bands,
  suggestedTargets: v.suggestedTargets as Record<string, SuggestedTarget>,
  createdAt: v.createdAt.toISOString(),
});

/** The template page: summary, every version with its use count, the latest tree and the user's own uses. */
export async function templateDetail(db: Database, t: TemplateRow, userId: string): Promise<TemplateDetail> {
  const versions = await db
    .select({ v: clubTemplateVersion, by: user.name })
    .from(clubTemplateVersion)
    .leftJoin(user, eq(user.id, clubTemplateVersion.createdBy))
    .where(eq(clubTemplateVersion.templateId, t.id))
    .orderBy(asc(clubTemplateVersion.version));
  const perVersion = await db.select({ version: templateUse.version, n: countDistinct(templateUse.userId) }).from(templateUse).where(eq(templateUse.templateId, t.id)).groupBy(templateUse.version);
  const mine = await db.select({ recipeId: templateUse.recipeId, version: templateUse.version }).from(templateUse).where(and(eq(templateUse.templateId, t.id), eq(templateUse.userId, userId))).orderBy(asc(templateUse.createdAt));
  const latest = versions.find((x) => x.v.version === t.latestVersion)?.v ?? versions[versions.length - 1]!.v;
  const counts = await useCounts(db, [t.id]);
  return {
    ...toSummary(t, counts.get(t.id) ?? 0),
    versions: versions.map(({ v, by }) => ({ version: v.version, changelog: v.changelog, createdAt: v.createdAt.toISOString(), createdBy: by ?? '', useCount: Number(perVersion.find((p) => p.version === v.version)?.n ?? 0) })),
    tree: latest.tree as RecipeTree,
    bands: latest.bands,
    suggestedTargets: latest.suggestedTargets as Record<string, SuggestedTarget>,
    myUses: mine,
  };
}

/**
 * Mails "new version" to every user who used the template, is still in its club and has not
 * opted out (the publisher excepted). Failures are logged: the version is already stored.
 */
export async function mailNewVersion(db: Database, mailer: Mailer, baseUrl: string, t: TemplateRow, publisherId: string): Promise<void> {
  const rows = await db
    .selectDistinct({ email: user.email, userId: user.id, notify: userSettings.notifyTemplateVersions })
    .from(templateUse)
    .innerJoin(user, eq(user.id, templateUse.userId))
    .innerJoin(member, and(eq(member.userId, templateUse.userId), eq(member.organizationId, t.clubId)))
    .leftJoin(userSettings, eq(userSettings.userId, templateUse.userId))
    .where(eq(templateUse.templateId, t.id));
  const url = `${baseUrl}/clubs/${t.clubId}/templates/${t.id}`;
  for (const r of rows) {
    if (r.userId === publisherId || r.notify === false) continue;
    const intro = `Version ${t.latestVersion} of the template "${t.title}" is out. Your recipe made from it stays as it is; compare it with the new version when you like. You can turn these messages off in your account settings.`;
    await mailer.send(actionMail(r.email, `New version of ${t.title}`, intro, 'Open the template', url)).catch((err: unknown) => console.error('[mail] new template version:', err));
  }
}
