import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { captureFrame, darkSet, framing, rig, target, userSettings } from '@/db/schema';
import { HttpError } from '@/server/errors';
import { groupBiasFrames } from '@/shared/calibration/bias';
import { darkLibraryForDryRun, groupDarkFrames, isDarkSetStale } from '@/shared/calibration/darks';
import type { StoredFrame } from '@/shared/calibration/types';
import type { BiasLibrarySet, DarkLibrary, DarkLibrarySet } from '@/shared/schemas/calibration-api';
import type { DryRunInput, DryRunTarget } from '@/shared/dry-run';
import { targetIds } from '@/shared/recipe/summary';
import type { RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { currentNightDate } from '@/shared/night-date';
import { localDateYmd } from '@/shared/time';
import { findDefaultSite, findOwnSite } from './routes/sites';

export interface DryRunContext {
  input: DryRunInput;
  siteId: string;
  rigId: string | null;
}

/**
 * Everything a dry run needs from the database, for one user: the rig (the recipe's, else a
 * rig with the defaults of trade-defaults.md), the site (the recipe's, else the default site),
 * the targets the tree points at with their framings, the night's date and the dark library
 * (sets entered by hand and sets grouped from recorded dark frames) with its validity.
 */
export async function loadDryRunContext(
  db: Database,
  ownerId: string,
  tree: RecipeTree,
  opts: { rigId: string | null; siteId: string | null; date?: string; startTime?: string },
): Promise<DryRunContext> {
  const siteRow = opts.siteId ? await findOwnSite(db, ownerId, opts.siteId) : await findDefaultSite(db, ownerId);
  if (!siteRow) throw new HttpError(404, 'no-site', 'Add a site first: the dry run plays the night at a place');
  let spec: RigInput = defaultRigInput();
  if (opts.rigId) {
    const [r] = await db.select({ spec: rig.spec }).from(rig).where(and(eq(rig.id, opts.rigId), eq(rig.ownerId, ownerId)));
    if (!r) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { rigId: ['No such rig'] } });
    spec = r.spec;
  }
  const ids = targetIds(tree);
  const rows = ids.length ? await db.select().from(target).where(and(eq(target.ownerId, ownerId), inArray(target.id, ids))) : [];
  const frames = rows.length ? await db.select().from(framing).where(inArray(framing.targetId, rows.map((t) => t.id))).orderBy(asc(framing.createdAt)) : [];
  const library = await loadDarkLibrary(db, ownerId);
  const targets: Record<string, DryRunTarget> = {};
  for (const t of rows) {
    targets[t.id] = {
      designation: t.designation,
      name: t.name,
      raDeg: t.raDeg,
      decDeg: t.decDeg,
      framings: frames.filter((f) => f.targetId === t.id).map((f) => ({ id: f.id, name: f.name, raDeg: f.raDeg, decDeg: f.decDeg, positionAngleDeg: f.positionAngleDeg })),
    };
  }
  return {
    siteId: siteRow.id,
    rigId: opts.rigId,
    input: {
      tree,
      rig: spec,
      site: siteRow,
      nightDate: opts.date ?? currentNightDate(siteRow.timeZone),
      startTime: opts.startTime,
      targets,
      darkLibrary: library.sets.length ? darkLibraryForDryRun(library.sets) : [],
      darkValidityMonths: library.validityMonths,
    },
  };
}

/** Dark sets are stale after this many months unless the user chose otherwise (trade-defaults.md S22). */
export const DEFAULT_DARK_VALIDITY_MONTHS = 6;

type FrameRow = typeof captureFrame.$inferSelect;
type DarkSetRow = typeof darkSet.$inferSelect;

/** A stored frame row as the pure calibration functions take it. */
export function toStoredFrame(row: FrameRow): StoredFrame {
  const { id: _id, ownerId: _owner, intakeId: _intake, createdAt: _created, takenAt, ...rest } = row;
  return { ...rest, takenAt: takenAt.toISOString() };
}

/** The user's dark validity and today's date at their default site (else UTC), for staleness. */
export async function darkValidity(db: Database, ownerId: string, now: Date = new Date()): Promise<{ validityMonths: number; today: string }> {
  const [row] = await db.select({ months: userSettings.darkValidityMonths }).from(userSettings).where(eq(userSettings.userId, ownerId));
  const siteRow = await findDefaultSite(db, ownerId);
  return { validityMonths: row?.months ?? DEFAULT_DARK_VALIDITY_MONTHS, today: localDateYmd(now, siteRow?.timeZone ?? 'UTC') };
}

/** A dark set entered by hand, as the library lists it. */
export function handDarkSet(row: DarkSetRow, validity: { validityMonths: number; today: string }): DarkLibrarySet {
  return {
    id: row.id,
    source: 'hand',
    version: row.version,
    exposureS: row.exposureS,
    gain: row.gain,
    offset: row.offset,
    binning: row.binning,
    readoutMode: row.readoutMode,
    temperatureC: row.temperatureC,
    frames: row.frames,
    takenOn: row.takenOn,
    stale: isDarkSetStale(row.takenOn, validity.validityMonths, validity.today),
    notes: row.notes,
  };
}

/**
 * The user's dark library: sets entered by hand, then sets grouped from recorded dark frames
 * (newest first); and bias sets grouped from recorded bias frames, stale by the same validity.
 */
export async function loadDarkLibrary(db: Database, ownerId: string): Promise<DarkLibrary> {
  const validity = await darkValidity(db, ownerId);
  const hand = await db.select().from(darkSet).where(eq(darkSet.ownerId, ownerId)).orderBy(desc(darkSet.takenOn), asc(darkSet.createdAt));
  const rows = await db.select().from(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), inArray(captureFrame.frameType, ['dark', 'bias'])));
  const frames = rows.map(toStoredFrame);
  const grouped = frames.length ? groupDarkFrames(frames, validity.validityMonths, validity.today) : [];
  const biasSets = frames.length ? groupBiasFrames(frames, validity.validityMonths, validity.today) : [];
  return { validityMonths: validity.validityMonths, sets: [...hand.map((row) => handDarkSet(row, validity)), ...grouped], biasSets };
}

/** The user's bias sets (grouped from recorded bias frames) with their staleness today. */
export async function loadBiasSets(db: Database, ownerId: string): Promise<BiasLibrarySet[]> {
  const rows = await db.select().from(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'bias')));
  if (rows.length === 0) return [];
  const validity = await darkValidity(db, ownerId);
  return groupBiasFrames(rows.map(toStoredFrame), validity.validityMonths, validity.today);
}
