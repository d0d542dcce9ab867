/**
 * Nightloom's own tables. better-auth's tables live in ./auth-schema.ts and are re-exported
 * here so that one `schema` object describes the whole database for Drizzle and drizzle-kit.
 */
import { sql } from 'drizzle-orm';
import { boolean, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { HorizonPoint } from '@/shared/horizon/profile';
import type { RigInput } from '@/shared/rig/schema';
import { organization, user } from './auth-schema';

export * from './auth-schema';

/** Columns of every row a user owns and edits: id, owner, version (optimistic concurrency), timestamps. */
const ownedRow = () => ({
  id: uuid().primaryKey().defaultRandom(),
  ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
  version: integer().notNull().default(1),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/** The catalogue facts of a deep-sky object (J2000 position, size, magnitude), shared by catalogues and targets. */
const objectFacts = () => ({
  designation: text().notNull(),
  aliases: jsonb().$type<string[]>().notNull().default([]),
  name: text().notNull().default(''),
  type: text().notNull().default('other'),
  raDeg: doublePrecision().notNull(),
  decDeg: doublePrecision().notNull(),
  majorArcmin: doublePrecision(),
  minorArcmin: doublePrecision(),
  positionAngleDeg: doublePrecision(),
  magnitude: doublePrecision(),
});

/** An observing site. `version` is bumped on every update (optimistic concurrency). */
export const site = pgTable(
  'site',
  {
    ...ownedRow(),
    name: text().notNull(),
    latitudeDeg: doublePrecision().notNull(),
    longitudeDeg: doublePrecision().notNull(),
    elevationM: doublePrecision().notNull(),
    timeZone: text().notNull(),
    isDefault: boolean().notNull().default(false),
    minAltitudeDeg: doublePrecision().notNull().default(30),
    duskTempC: doublePrecision().notNull().default(10),
    dawnTempC: doublePrecision().notNull().default(5),
    horizon: jsonb().$type<HorizonPoint[]>().notNull().default([]),
  },
  (t) => [
    index('site_owner_id_idx').on(t.ownerId),
    // At most one default site per owner, enforced by the database.
    uniqueIndex('site_one_default_per_owner').on(t.ownerId).where(sql`${t.isDefault}`),
  ],
);

/**
 * Mail captured by the local SMTP fake (development and tests only). Kept in the database so
 * that any server process can show it and none keeps state of its own.
 */
export const devMail = pgTable(
  'dev_mail',
  {
    id: uuid().primaryKey().defaultRandom(),
    from: text().notNull(),
    to: jsonb().$type<string[]>().notNull(),
    subject: text().notNull(),
    text: text().notNull().default(''),
    html: text().notNull().default(''),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('dev_mail_received_at_idx').on(t.receivedAt)],
);

/** An equipment profile. The validated rig (`shared/rig/schema.ts`) is stored whole in `spec`. */
export const rig = pgTable(
  'rig',
  {
    ...ownedRow(),
    name: text().notNull(),
    spec: jsonb().$type<RigInput>().notNull(),
  },
  (t) => [index('rig_owner_id_idx').on(t.ownerId)],
);

/** An imported catalogue, personal (ownerId) or shared with a club (clubId). */
export const catalogue = pgTable(
  'catalogue',
  {
    id: uuid().primaryKey().defaultRandom(),
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    clubId: text().references(() => organization.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    objectCount: integer().notNull().default(0),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('catalogue_owner_id_idx').on(t.ownerId), index('catalogue_club_id_idx').on(t.clubId)],
);

/** One object of an imported catalogue. `searchKey` holds the normalised designation, aliases and name. */
export const catalogueObject = pgTable(
  'catalogue_object',
  {
    id: uuid().primaryKey().defaultRandom(),
    catalogueId: uuid().notNull().references(() => catalogue.id, { onDelete: 'cascade' }),
    ...objectFacts(),
    searchKey: text().notNull(),
  },
  (t) => [uniqueIndex('catalogue_object_designation_idx').on(t.catalogueId, t.designation), index('catalogue_object_catalogue_idx').on(t.catalogueId)],
);

/** A target on the user's list: a catalogue object or custom coordinates, with its framings. */
export const target = pgTable(
  'target',
  {
    ...ownedRow(),
    ...objectFacts(),
    notes: text().notNull().default(''),
  },
  (t) => [index('target_owner_id_idx').on(t.ownerId)],
);

/** A repeatable framing of a target: centre, sky position angle, optional mosaic. */
export const framing = pgTable(
  'framing',
  {
    id: uuid().primaryKey().defaultRandom(),
    targetId: uuid().notNull().references(() => target.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    raDeg: doublePrecision().notNull(),
    decDeg: doublePrecision().notNull(),
    positionAngleDeg: doublePrecision().notNull().default(0),
    mosaicCols: integer().notNull().default(1),
    mosaicRows: integer().notNull().default(1),
    overlapPct: doublePrecision().notNull().default(10),
    rigId: uuid().references(() => rig.id, { onDelete: 'set null' }),
    source: text().notNull().default('manual'),
    sourceDetail: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('framing_target_id_idx').on(t.targetId)],
);

/**
 * A night recipe. `tree` holds the validated recipe tree (`shared/recipe`); the summary columns
 * are derived from it on every save so the list needs no tree parsing. Deleting sets
 * `deletedAt` (undo restores it).
 */
export const recipe = pgTable(
  'recipe',
  {
    id: uuid().primaryKey().defaultRandom(),
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    notes: text().notNull().default(''),
    rigId: uuid().references(() => rig.id, { onDelete: 'set null' }),
    siteId: uuid().references(() => site.id, { onDelete: 'set null' }),
    tree: jsonb().$type<unknown>().notNull(),
    nodeCount: integer().notNull().default(0),
    targetCount: integer().notNull().default(0),
    plannedExposureS: doublePrecision().notNull().default(0),
    version: integer().notNull().default(1),
    deletedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('recipe_owner_id_idx').on(t.ownerId)],
);

/** Every saved version of a recipe, for history and restore (the newest ones are kept). */
export const recipeRevision = pgTable(
  'recipe_revision',
  {
    id: uuid().primaryKey().defaultRandom(),
    recipeId: uuid().notNull().references(() => recipe.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    name: text().notNull(),
    notes: text().notNull().default(''),
    tree: jsonb().$type<unknown>().notNull(),
    nodeCount: integer().notNull().default(0),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('recipe_revision_version_idx').on(t.recipeId, t.version)],
);

/**
 * A stored dry run of a recipe version on a night. The newest one per recipe feeds the recipe
 * list (its end time); it is stale once the recipe's version has moved on.
 */
export const dryRun = pgTable(
  'dry_run',
  {
    id: uuid().primaryKey().defaultRandom(),
    recipeId: uuid().notNull().references(() => recipe.id, { onDelete: 'cascade' }),
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    recipeVersion: integer().notNull(),
    nightDate: text().notNull(),
    siteId: uuid().references(() => site.id, { onDelete: 'set null' }),
    rigId: uuid().references(() => rig.id, { onDelete: 'set null' }),
    nightEnd: timestamp({ withTimezone: true }),
    stopCount: integer().notNull().default(0),
    warnCount: integer().notNull().default(0),
    result: jsonb().$type<unknown>().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('dry_run_recipe_created_idx').on(t.recipeId, t.createdAt)],
);

/**
 * A recipe template shared in a club. Its versions are immutable snapshots (clubTemplateVersion);
 * `latestVersion` is the newest one. Retired templates are hidden from plain members.
 */
export const clubTemplate = pgTable(
  'club_template',
  {
    id: uuid().primaryKey().defaultRandom(),
    clubId: text().notNull().references(() => organization.id, { onDelete: 'cascade' }),
    title: text().notNull(),
    description: text().notNull().default(''),
    tags: jsonb().$type<string[]>().notNull().default([]),
    latestVersion: integer().notNull().default(1),
    retiredAt: timestamp({ withTimezone: true }),
    createdBy: text().references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('club_template_club_id_idx').on(t.clubId)],
);

/** One immutable version of a template: a rig-agnostic tree (filters by band) and a changelog. */
export const clubTemplateVersion = pgTable(
  'club_template_version',
  {
    id: uuid().primaryKey().defaultRandom(),
    templateId: uuid().notNull().references(() => clubTemplate.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    changelog: text().notNull().default(''),
    tree: jsonb().$type<unknown>().notNull(),
    bands: jsonb().$type<string[]>().notNull().default([]),
    suggestedTargets: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    createdBy: text().references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('club_template_version_idx').on(t.templateId, t.version)],
);

/** A member took a template version into their recipes. */
export const templateUse = pgTable(
  'template_use',
  {
    id: uuid().primaryKey().defaultRandom(),
    templateId: uuid().notNull().references(() => clubTemplate.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    userId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    recipeId: uuid().references(() => recipe.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('template_use_template_idx').on(t.templateId), index('template_use_recipe_idx').on(t.recipeId)],
);

/** Per-user preferences (a row appears on first change; absent means the defaults). */
export const userSettings = pgTable('user_settings', {
  userId: text().primaryKey().references(() => user.id, { onDelete: 'cascade' }),
  notifyTemplateVersions: boolean().notNull().default(true),
  /** Dark sets older than this many months are stale (default 6; common practice, trade-defaults.md S22). */
  darkValidityMonths: integer().notNull().default(6),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/**
 * One recorded frame (light, dark, flat or bias) read from a FITS header at intake. The
 * fingerprint (shared/fits/fingerprint.ts) is unique per owner, so a frame imported twice is
 * counted once. Which target a light belongs to is worked out when history is read (targets
 * change; frames do not).
 */
export const captureFrame = pgTable(
  'capture_frame',
  {
    id: uuid().primaryKey().defaultRandom(),
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    fingerprint: text().notNull(),
    fileName: text().notNull(),
    frameType: text().$type<'light' | 'dark' | 'flat' | 'bias'>().notNull(),
    object: text(),
    takenAt: timestamp({ withTimezone: true }).notNull(),
    /** The evening the frame's night started on, at the user's default site (else UTC). */
    nightDate: text().notNull(),
    exposureS: doublePrecision().notNull(),
    filter: text(),
    gain: doublePrecision(),
    offset: doublePrecision(),
    binning: integer().notNull().default(1),
    readoutMode: text(),
    setTempC: doublePrecision(),
    sensorTempC: doublePrecision(),
    focuserPositionSteps: integer(),
    rotatorAngleDeg: doublePrecision(),
    pierSide: text().$type<'east' | 'west'>(),
    /** Telescope pointing from OBJCTRA/OBJCTDEC or RA/DEC. */
    pointingRaDeg: doublePrecision(),
    pointingDecDeg: doublePrecision(),
    /** Image centre and sky position angle from the WCS, when the frame was plate-solved. */
    wcsRaDeg: doublePrecision(),
    wcsDecDeg: doublePrecision(),
    wcsPositionAngleDeg: doublePrecision(),
    wcsScaleArcsecPerPx: doublePrecision(),
    wcsMirrored: boolean(),
    intakeId: uuid().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('capture_frame_owner_fingerprint_idx').on(t.ownerId, t.fingerprint),
    index('capture_frame_owner_type_night_idx').on(t.ownerId, t.frameType, t.nightDate),
  ],
);

/** A dark set entered by hand (sets from intake are the recorded dark frames, grouped). */
export const darkSet = pgTable(
  'dark_set',
  {
    ...ownedRow(),
    exposureS: doublePrecision().notNull(),
    gain: doublePrecision(),
    offset: doublePrecision(),
    binning: integer().notNull().default(1),
    readoutMode: text(),
    temperatureC: doublePrecision().notNull(),
    frames: integer().notNull(),
    /** YYYY-MM-DD. */
    takenOn: text().notNull(),
    notes: text().notNull().default(''),
  },
  (t) => [index('dark_set_owner_idx').on(t.ownerId)],
);

/** A target's capture summary shared into a club by its owner (nothing is shared otherwise). */
export const captureShare = pgTable(
  'capture_share',
  {
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    targetId: uuid().notNull().references(() => target.id, { onDelete: 'cascade' }),
    organizationId: text().notNull().references(() => organization.id, { onDelete: 'cascade' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('capture_share_target_org_idx').on(t.targetId, t.organizationId), index('capture_share_org_idx').on(t.organizationId)],
);
