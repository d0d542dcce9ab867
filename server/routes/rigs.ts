import { and, asc, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { rig } from '@/db/schema';
import { notFound } from '@/server/errors';
import { rigInputSchema, rigUpdateSchema, type Rig } from '@/shared/rig/schema';
import { parseBody, parseId } from './validate';
import { updateVersioned } from './versioned';

type RigRow = typeof rig.$inferSelect;

export function toRig(row: RigRow): Rig {
  return { ...row.spec, name: row.name, id: row.id, version: row.version, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

export async function findOwnRig(db: Database, ownerId: string, id: string): Promise<RigRow> {
  const [row] = await db.select().from(rig).where(and(eq(rig.id, id), eq(rig.ownerId, ownerId)));
  if (!row) throw notFound('No such rig');
  return row;
}

/** /api/rigs: the user's equipment profiles, validated whole by the shared rig schema. */
export function rigsRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const rows = await db.select().from(rig).where(eq(rig.ownerId, res.locals.user.id)).orderBy(asc(rig.name));
    res.json({ rigs: rows.map(toRig) });
  });

  r.post('/', async (req, res) => {
    const spec = parseBody(rigInputSchema, req);
    const [row] = await db.insert(rig).values({ ownerId: res.locals.user.id, name: spec.name, spec }).returning();
    res.status(201).json({ rig: toRig(row!) });
  });

  r.get('/:id', async (req, res) => {
    res.json({ rig: toRig(await findOwnRig(db, res.locals.user.id, parseId(req.params.id, 'rig'))) });
  });

  r.put('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'rig');
    const { version, ...spec } = parseBody(rigUpdateSchema, req);
    const row = await db.transaction((tx) =>
      updateVersioned<typeof rig, RigRow>(tx, rig, { id, ownerId: res.locals.user.id }, version, { name: spec.name, spec }, toRig, 'rig'),
    );
    res.json({ rig: toRig(row) });
  });

  r.delete('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'rig');
    const deleted = await db.delete(rig).where(and(eq(rig.id, id), eq(rig.ownerId, res.locals.user.id))).returning({ id: rig.id });
    if (deleted.length === 0) throw notFound('No such rig');
    res.status(204).end();
  });

  return r;
}
