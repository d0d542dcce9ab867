import { and, eq, inArray } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { captureFrame, darkSet, userSettings } from '@/db/schema';
import { notFound } from '@/server/errors';
import { DEFAULT_DARK_VALIDITY_MONTHS, darkValidity, handDarkSet, loadDarkLibrary, toStoredFrame } from '@/server/dry-run-input';
import { groupBiasFrames } from '@/shared/calibration/bias';
import { groupDarkFrames } from '@/shared/calibration/darks';
import { calibrationSettingsSchema, darkSetInputSchema } from '@/shared/schemas/calibration-api';
import { parseBody, parseId } from './validate';
import { updateVersioned } from './versioned';

type FrameRow = typeof captureFrame.$inferSelect;
type DarkSetRow = typeof darkSet.$inferSelect;

type Grouping = typeof groupDarkFrames | typeof groupBiasFrames;

/** Which library set (`intake:<key>` or `bias:<key>`, by `group`) each recorded frame falls in: frame ids by set id. */
function framesBySet(rows: FrameRow[], validity: { validityMonths: number; today: string }, group: Grouping): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const row of rows) {
    const [set] = group([toStoredFrame(row)], validity.validityMonths, validity.today);
    if (!set) continue;
    const ids = out.get(set.id) ?? [];
    ids.push(row.id);
    out.set(set.id, ids);
  }
  return out;
}

const darkSetUpdateSchema = darkSetInputSchema.extend({ version: z.number({ error: 'Send the version you last saw' }).int().positive() });

/** /api/calibration: the dark library (hand sets, sets grouped from recorded darks, bias sets) and its validity setting. */
export function calibrationDarksRouter(db: Database): Router {
  const r = Router();

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

  /** Deletes the user's recorded frames of one grouped set; 404 when none of theirs falls in it. */
  async function deleteGroupedSet(ownerId: string, frameType: 'dark' | 'bias', id: string, group: Grouping): Promise<number> {
    const rows = await db.select().from(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, frameType)));
    const ids = framesBySet(rows, await darkValidity(db, ownerId), group).get(id) ?? [];
    if (ids.length === 0) throw notFound(frameType === 'dark' ? 'No such dark set' : 'No such bias set');
    const gone = await db.delete(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), inArray(captureFrame.id, ids))).returning({ id: captureFrame.id });
    return gone.length;
  }

  // A set grouped from recorded dark frames: its frames go.
  r.delete('/dark-library/intake/:key', async (req, res) => {
    res.json({ deleted: await deleteGroupedSet(res.locals.user.id, 'dark', `intake:${req.params.key}`, groupDarkFrames) });
  });

  // A bias set (id `bias:<key>`): its recorded bias frames go.
  r.delete('/dark-library/bias/:key', async (req, res) => {
    res.json({ deleted: await deleteGroupedSet(res.locals.user.id, 'bias', `bias:${req.params.key}`, groupBiasFrames) });
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

  return r;
}
