import { randomUUID } from 'node:crypto';
import { and, asc, desc, eq, gte, inArray, lt, lte, or, type SQL } from 'drizzle-orm';
import express, { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { captureFrame, darkSet, recipe, rig, userSettings } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { DEFAULT_DARK_VALIDITY_MONTHS, darkValidity, handDarkSet, loadDarkLibrary, toStoredFrame } from '@/server/dry-run-input';
import { darksRecipeTree, groupDarkFrames } from '@/shared/calibration/darks';
import { FLAT_VALID_DAYS_AFTER, flatCombos, flatsRecipeTree } from '@/shared/calibration/flats';
import { frameNightDate, readIntakeFile } from '@/shared/calibration/intake';
import type { StoredFrame } from '@/shared/calibration/types';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeTree } from '@/shared/recipe/types';
import {
  calibrationSettingsSchema,
  darkSetInputSchema,
  darksRecipeRequestSchema,
  flatsRecipeRequestSchema,
  FRAME_TYPES,
  intakeRequestSchema,
  type IntakeResult,
} from '@/shared/schemas/calibration-api';
import { nightDateSchema } from '@/shared/schemas/night';
import { addDaysYmd } from '@/shared/time';
import { derived, recordRevision } from './recipes';
import { findDefaultSite } from './sites';
import { parseBody, parseId, parseQuery } from './validate';
import { updateVersioned } from './versioned';

type FrameRow = typeof captureFrame.$inferSelect;
type DarkSetRow = typeof darkSet.$inferSelect;

/**
 * Largest intake body: INTAKE_MAX_FILES headers of up to three blocks each as base64, plus names
 * (a typical camera header with a plate solution is one to three 2880-byte blocks).
 */
export const INTAKE_BODY_LIMIT = '24mb';
/** Rows per INSERT (28 columns: well under PostgreSQL's 65535 parameters). */
const INSERT_CHUNK = 500;

const invalid = (fields: Record<string, string[]>) => new HttpError(400, 'invalid-input', 'Some fields need attention', { fields });

/** A rig named for a new recipe must be the caller's (400 field error otherwise). */
async function checkRig(db: Database, ownerId: string, rigId: string | null | undefined): Promise<string | null> {
  if (!rigId) return null;
  const [row] = await db.select({ id: rig.id }).from(rig).where(and(eq(rig.id, rigId), eq(rig.ownerId, ownerId)));
  if (!row) throw invalid({ rigId: ['No such rig'] });
  return row.id;
}

/** Stores a new recipe and its first revision (as POST /api/recipes does); returns its id. */
export async function createRecipe(db: Database, values: { ownerId: string; name: string; notes?: string; rigId: string | null; siteId: string | null; tree: RecipeTree }): Promise<string> {
  const tree = recipeTreeSchema.parse(values.tree);
  return db.transaction(async (tx) => {
    const [created] = await tx
      .insert(recipe)
      .values({ ...values, name: values.name.slice(0, 80), notes: values.notes ?? '', tree, ...derived(tree) })
      .returning();
    await recordRevision(tx, created!);
    return created!.id;
  });
}

/** Which library set (`intake:<key>`) each recorded dark frame falls in: frame ids by set id. */
function framesBySet(rows: FrameRow[], validity: { validityMonths: number; today: string }): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const row of rows) {
    const [set] = groupDarkFrames([toStoredFrame(row)], validity.validityMonths, validity.today);
    if (!set) continue;
    const ids = out.get(set.id) ?? [];
    ids.push(row.id);
    out.set(set.id, ids);
  }
  return out;
}

/** POST /api/calibration/intake: FITS header bytes of many files → recorded frames (one transaction). */
export function calibrationIntakeRouter(db: Database): Router {
  const r = Router();
  r.post('/', express.json({ limit: INTAKE_BODY_LIMIT }), async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(intakeRequestSchema, req);
    const timeZone = (await findDefaultSite(db, ownerId))?.timeZone ?? 'UTC';
    const intakeId = randomUUID();
    const rejected: IntakeResult['rejected'] = [];
    const fresh = new Map<string, StoredFrame>();
    let duplicates = 0;
    for (const file of body.files) {
      const bytes = Buffer.from(file.headerBase64, 'base64');
      const outcome = readIntakeFile(file.name, new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      if (!outcome.ok) {
        rejected.push({ name: outcome.name, reason: outcome.reason, kind: outcome.kind });
      } else if (fresh.has(outcome.frame.fingerprint)) {
        duplicates += 1;
      } else {
        fresh.set(outcome.frame.fingerprint, { ...outcome.frame, nightDate: frameNightDate(outcome.frame.takenAt, timeZone) });
      }
    }
    const rows = [...fresh.values()].map((f) => ({ ...f, takenAt: new Date(f.takenAt), ownerId, intakeId }));
    const inserted = await db.transaction(async (tx) => {
      const out: { frameType: FrameRow['frameType'] }[] = [];
      for (let i = 0; i < rows.length; i += INSERT_CHUNK) {
        const part = rows.slice(i, i + INSERT_CHUNK);
        out.push(...(await tx.insert(captureFrame).values(part).onConflictDoNothing({ target: [captureFrame.ownerId, captureFrame.fingerprint] }).returning({ frameType: captureFrame.frameType })));
      }
      return out;
    });
    const recorded = { light: 0, dark: 0, flat: 0, bias: 0 };
    for (const row of inserted) recorded[row.frameType] += 1;
    duplicates += rows.length - inserted.length;
    const result: IntakeResult = { intakeId, recorded, duplicates, rejected };
    res.json(result);
  });
  return r;
}

const framesQuerySchema = z.object({
  type: z.enum(FRAME_TYPES, { error: 'Type is light, dark, flat or bias' }).optional(),
  night: nightDateSchema.optional(),
  limit: z.coerce.number({ error: 'Limit must be a number' }).int('Limit is a whole number').min(1, 'Limit is 1 to 500').max(500, 'Limit is 1 to 500').default(100),
  /** The `nextCursor` of the previous page. */
  cursor: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}T[\d:.]+Z_[0-9a-f-]{36}$/i, 'Not a cursor from this list')
    .optional(),
});

function toFrameItem(row: FrameRow) {
  const { ownerId: _owner, createdAt: _created, takenAt, ...rest } = row;
  return { ...rest, takenAt: takenAt.toISOString() };
}

const darkSetUpdateSchema = darkSetInputSchema.extend({ version: z.number({ error: 'Send the version you last saw' }).int().positive() });

/** /api/calibration: recorded frames, the dark library, settings and calibration recipes. */
export function calibrationRouter(db: Database): Router {
  const r = Router();

  r.get('/frames', async (req, res) => {
    const q = parseQuery(framesQuerySchema, req);
    const conds: (SQL | undefined)[] = [eq(captureFrame.ownerId, res.locals.user.id), q.type ? eq(captureFrame.frameType, q.type) : undefined, q.night ? eq(captureFrame.nightDate, q.night) : undefined];
    if (q.cursor) {
      const cut = q.cursor.lastIndexOf('_');
      const at = new Date(q.cursor.slice(0, cut));
      const id = q.cursor.slice(cut + 1);
      conds.push(or(lt(captureFrame.takenAt, at), and(eq(captureFrame.takenAt, at), lt(captureFrame.id, id))));
    }
    const rows = await db
      .select()
      .from(captureFrame)
      .where(and(...conds))
      .orderBy(desc(captureFrame.takenAt), desc(captureFrame.id))
      .limit(q.limit + 1);
    const page = rows.slice(0, q.limit);
    const last = page[page.length - 1];
    res.json({ frames: page.map(toFrameItem), nextCursor: rows.length > q.limit && last ? `${last.takenAt.toISOString()}_${last.id}` : null });
  });

  // Undo of an import: the frames it recorded go (frames it found already recorded stay).
  r.delete('/intakes/:intakeId', async (req, res) => {
    const intakeId = parseId(req.params.intakeId, 'intake');
    const gone = await db.delete(captureFrame).where(and(eq(captureFrame.ownerId, res.locals.user.id), eq(captureFrame.intakeId, intakeId))).returning({ id: captureFrame.id });
    if (gone.length === 0) throw notFound('No such intake');
    res.json({ deleted: gone.length });
  });

  r.get('/dark-library', async (_req, res) => {
    res.json(await loadDarkLibrary(db, res.locals.user.id));
  });

  r.post('/dark-sets', async (req, res) => {
    const ownerId = res.locals.user.id;
    const input = parseBody(darkSetInputSchema, req);
    const [row] = await db.insert(darkSet).values({ ...input, ownerId }).returning();
    res.status(201).json({ set: handDarkSet(row!, await darkValidity(db, ownerId)) });
  });

  r.put('/dark-sets/:id', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'dark set');
    const { version, ...input } = parseBody(darkSetUpdateSchema, req);
    const validity = await darkValidity(db, ownerId);
    const row = await db.transaction((tx) => updateVersioned<typeof darkSet, DarkSetRow>(tx, darkSet, { id, ownerId }, version, input, (x) => handDarkSet(x, validity), 'dark set'));
    res.json({ set: handDarkSet(row, validity) });
  });

  r.delete('/dark-sets/:id', async (req, res) => {
    const id = parseId(req.params.id, 'dark set');
    const gone = await db.delete(darkSet).where(and(eq(darkSet.id, id), eq(darkSet.ownerId, res.locals.user.id))).returning({ id: darkSet.id });
    if (gone.length === 0) throw notFound('No such dark set');
    res.status(204).end();
  });

  // A set grouped from recorded dark frames: its frames go.
  r.delete('/dark-library/intake/:key', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = `intake:${req.params.key}`;
    const rows = await db.select().from(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'dark')));
    const ids = framesBySet(rows, await darkValidity(db, ownerId)).get(id) ?? [];
    if (ids.length === 0) throw notFound('No such dark set');
    const gone = await db.delete(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), inArray(captureFrame.id, ids))).returning({ id: captureFrame.id });
    res.json({ deleted: gone.length });
  });

  r.get('/settings', async (_req, res) => {
    const [row] = await db.select({ darkValidityMonths: userSettings.darkValidityMonths }).from(userSettings).where(eq(userSettings.userId, res.locals.user.id));
    res.json({ settings: { darkValidityMonths: row?.darkValidityMonths ?? DEFAULT_DARK_VALIDITY_MONTHS } });
  });

  r.put('/settings', async (req, res) => {
    const body = parseBody(calibrationSettingsSchema, req);
    const values = { darkValidityMonths: body.darkValidityMonths, updatedAt: new Date() };
    const [row] = await db.insert(userSettings).values({ userId: res.locals.user.id, ...values }).onConflictDoUpdate({ target: userSettings.userId, set: values }).returning();
    res.json({ settings: { darkValidityMonths: row!.darkValidityMonths } });
  });

  r.post('/darks-recipe', async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(darksRecipeRequestSchema, req);
    const rigId = await checkRig(db, ownerId, body.rigId);
    const tree = darksRecipeTree(body.darks, body.count ?? 30);
    const recipeId = await createRecipe(db, { ownerId, name: body.name ?? 'Darks for a cloudy night', rigId, siteId: null, tree });
    res.status(201).json({ recipeId });
  });

  r.get('/flats', async (req, res) => {
    const ownerId = res.locals.user.id;
    const q = parseQuery(z.object({ night: nightDateSchema.optional() }), req);
    const nightRows = await db
      .selectDistinct({ nightDate: captureFrame.nightDate })
      .from(captureFrame)
      .where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'light')))
      .orderBy(desc(captureFrame.nightDate));
    const nights = nightRows.map((n) => n.nightDate);
    const nightDate = q.night ?? nights[0] ?? null;
    res.json({ nights, nightDate, combos: nightDate ? await combosOfNight(db, ownerId, nightDate) : [] });
  });

  r.post('/flats-recipe', async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(flatsRecipeRequestSchema, req);
    const rigId = await checkRig(db, ownerId, body.rigId);
    const combos = await combosOfNight(db, ownerId, body.nightDate);
    if (combos.length === 0) throw invalid({ nightDate: ['No light frames on record for that night'] });
    const tree = flatsRecipeTree(combos, body.source, body.count ?? 25);
    const recipeId = await createRecipe(db, { ownerId, name: `Flats for the night of ${body.nightDate}`, rigId, siteId: null, tree });
    res.status(201).json({ recipeId });
  });

  return r;
}

/** The night's (filter, rotator, focus) combinations with the flats on record for each; [] without lights. */
async function combosOfNight(db: Database, ownerId: string, nightDate: string) {
  const lights = await db
    .select()
    .from(captureFrame)
    .where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'light'), eq(captureFrame.nightDate, nightDate)))
    .orderBy(asc(captureFrame.takenAt));
  if (lights.length === 0) return [];
  // One day of slack past the window: the pure function decides what counts.
  const flats = await db
    .select()
    .from(captureFrame)
    .where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'flat'), gte(captureFrame.nightDate, nightDate), lte(captureFrame.nightDate, addDaysYmd(nightDate, FLAT_VALID_DAYS_AFTER + 1))));
  return flatCombos(lights.map(toStoredFrame), flats.map(toStoredFrame), nightDate);
}
