import { and, asc, eq, inArray } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { framing, rig, target } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { framingInputSchema, framingUpdateSchema, targetInputSchema, targetUpdateSchema, type Framing, type Target } from '@/shared/schemas/target';
import type { TargetKind } from '@/shared/targets/schema';
import { parseBody, parseId } from './validate';
import { updateVersioned } from './versioned';

type TargetRow = typeof target.$inferSelect;
type FramingRow = typeof framing.$inferSelect;

export function toFraming(f: FramingRow): Framing {
  const { createdAt, updatedAt, ...rest } = f;
  return { ...rest, source: rest.source as Framing['source'], sourceDetail: rest.sourceDetail as Framing['sourceDetail'], createdAt: createdAt.toISOString(), updatedAt: updatedAt.toISOString() };
}

export function toTarget(t: TargetRow, framings: FramingRow[] = []): Target {
  const { ownerId: _owner, createdAt, updatedAt, ...rest } = t;
  return {
    ...rest,
    type: rest.type as TargetKind,
    majorArcmin: rest.majorArcmin ?? 0,
    createdAt: createdAt.toISOString(),
    updatedAt: updatedAt.toISOString(),
    framings: framings.map(toFraming),
  };
}

async function ownTarget(db: Database, ownerId: string, id: string): Promise<TargetRow> {
  const [row] = await db.select().from(target).where(and(eq(target.id, id), eq(target.ownerId, ownerId)));
  if (!row) throw notFound('No such target');
  return row;
}

/** A framing may only name one of the user's own rigs. */
async function checkRig(db: Database, ownerId: string, rigId: string | null) {
  if (!rigId) return;
  const [row] = await db.select({ id: rig.id }).from(rig).where(and(eq(rig.id, rigId), eq(rig.ownerId, ownerId)));
  if (!row) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { rigId: ['No such rig'] } });
}

/** /api/targets: the user's target list with the framings of each target. */
export function targetsRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const rows = await db.select().from(target).where(eq(target.ownerId, res.locals.user.id)).orderBy(asc(target.designation));
    const frames = rows.length ? await db.select().from(framing).where(inArray(framing.targetId, rows.map((t) => t.id))).orderBy(asc(framing.createdAt)) : [];
    res.json({ targets: rows.map((t) => toTarget(t, frames.filter((f) => f.targetId === t.id))) });
  });

  r.post('/', async (req, res) => {
    const input = parseBody(targetInputSchema, req);
    const ownerId = res.locals.user.id;
    const row = await db.transaction(async (tx) => {
      const [dupe] = await tx.select({ id: target.id }).from(target).where(and(eq(target.ownerId, ownerId), eq(target.designation, input.designation)));
      if (dupe) throw new HttpError(409, 'duplicate', `${input.designation} is already on your list`, { id: dupe.id });
      const [created] = await tx.insert(target).values({ ...input, ownerId }).returning();
      return created!;
    });
    res.status(201).json({ target: toTarget(row) });
  });

  r.get('/:id', async (req, res) => {
    const row = await ownTarget(db, res.locals.user.id, parseId(req.params.id, 'target'));
    const frames = await db.select().from(framing).where(eq(framing.targetId, row.id)).orderBy(asc(framing.createdAt));
    res.json({ target: toTarget(row, frames) });
  });

  r.put('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'target');
    const { version, ...input } = parseBody(targetUpdateSchema, req);
    const row = await db.transaction((tx) => updateVersioned<typeof target, TargetRow>(tx, target, { id, ownerId: res.locals.user.id }, version, input, (t) => toTarget(t), 'target'));
    const frames = await db.select().from(framing).where(eq(framing.targetId, row.id)).orderBy(asc(framing.createdAt));
    res.json({ target: toTarget(row, frames) });
  });

  r.delete('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'target');
    const gone = await db.delete(target).where(and(eq(target.id, id), eq(target.ownerId, res.locals.user.id))).returning({ id: target.id });
    if (gone.length === 0) throw notFound('No such target');
    res.status(204).end();
  });

  r.post('/:id/framings', async (req, res) => {
    const t = await ownTarget(db, res.locals.user.id, parseId(req.params.id, 'target'));
    const input = parseBody(framingInputSchema, req);
    await checkRig(db, res.locals.user.id, input.rigId);
    const [row] = await db.insert(framing).values({ ...input, targetId: t.id }).returning();
    res.status(201).json({ framing: toFraming(row!) });
  });

  r.put('/:id/framings/:framingId', async (req, res) => {
    const t = await ownTarget(db, res.locals.user.id, parseId(req.params.id, 'target'));
    const framingId = parseId(req.params.framingId, 'framing');
    const { version, ...input } = parseBody(framingUpdateSchema, req);
    await checkRig(db, res.locals.user.id, input.rigId);
    const row = await db.transaction(async (tx) => {
      const [current] = await tx.select().from(framing).where(and(eq(framing.id, framingId), eq(framing.targetId, t.id))).for('update');
      if (!current) throw notFound('No such framing');
      if (current.version !== version) throw new HttpError(409, 'version-conflict', 'This framing was changed elsewhere since you opened it', { current: toFraming(current) });
      const [updated] = await tx.update(framing).set({ ...input, version: version + 1, updatedAt: new Date() }).where(eq(framing.id, framingId)).returning();
      return updated!;
    });
    res.json({ framing: toFraming(row) });
  });

  r.delete('/:id/framings/:framingId', async (req, res) => {
    const t = await ownTarget(db, res.locals.user.id, parseId(req.params.id, 'target'));
    const gone = await db.delete(framing).where(and(eq(framing.id, parseId(req.params.framingId, 'framing')), eq(framing.targetId, t.id))).returning({ id: framing.id });
    if (gone.length === 0) throw notFound('No such framing');
    res.status(204).end();
  });

  return r;
}
