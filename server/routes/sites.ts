import { and, asc, eq, ne } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { site } from '@/db/schema';
import { conflict, notFound } from '@/server/errors';
import { siteInputSchema, siteUpdateSchema, type Site } from '@/shared/schemas/site';
import { parseBody, parseId } from './validate';

type SiteRow = typeof site.$inferSelect;

export function toSite(row: SiteRow): Site {
  return {
    id: row.id,
    name: row.name,
    latitudeDeg: row.latitudeDeg,
    longitudeDeg: row.longitudeDeg,
    elevationM: row.elevationM,
    timeZone: row.timeZone,
    isDefault: row.isDefault,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The user's default site, else their first one, else undefined. */
export async function findDefaultSite(db: Database, ownerId: string): Promise<SiteRow | undefined> {
  const rows = await db.select().from(site).where(eq(site.ownerId, ownerId)).orderBy(asc(site.createdAt)).limit(50);
  return rows.find((r) => r.isDefault) ?? rows[0];
}

export async function findOwnSite(db: Database, ownerId: string, id: string): Promise<SiteRow> {
  const [row] = await db.select().from(site).where(and(eq(site.id, id), eq(site.ownerId, ownerId)));
  if (!row) throw notFound('No such site');
  return row;
}

export function sitesRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const rows = await db.select().from(site).where(eq(site.ownerId, res.locals.user.id)).orderBy(asc(site.name));
    res.json({ sites: rows.map(toSite) });
  });

  r.post('/', async (req, res) => {
    const input = parseBody(siteInputSchema, req);
    const ownerId = res.locals.user.id;
    const row = await db.transaction(async (tx) => {
      const existing = await tx.select({ id: site.id }).from(site).where(eq(site.ownerId, ownerId)).limit(1);
      // A user's first site becomes their default.
      const isDefault = input.isDefault || existing.length === 0;
      if (isDefault) await tx.update(site).set({ isDefault: false }).where(eq(site.ownerId, ownerId));
      const [created] = await tx.insert(site).values({ ...input, isDefault, ownerId }).returning();
      return created!;
    });
    res.status(201).json({ site: toSite(row) });
  });

  r.get('/:id', async (req, res) => {
    const row = await findOwnSite(db, res.locals.user.id, parseId(req.params.id, 'site'));
    res.json({ site: toSite(row) });
  });

  r.put('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'site');
    const ownerId = res.locals.user.id;
    const { version, ...input } = parseBody(siteUpdateSchema, req);
    const row = await db.transaction(async (tx) => {
      const [current] = await tx.select().from(site).where(and(eq(site.id, id), eq(site.ownerId, ownerId))).for('update');
      if (!current) throw notFound('No such site');
      if (current.version !== version) throw conflict('This site was changed elsewhere since you opened it', { current: toSite(current) });
      if (input.isDefault) await tx.update(site).set({ isDefault: false }).where(and(eq(site.ownerId, ownerId), ne(site.id, id)));
      const [updated] = await tx
        .update(site)
        .set({ ...input, version: current.version + 1, updatedAt: new Date() })
        .where(eq(site.id, id))
        .returning();
      return updated!;
    });
    res.json({ site: toSite(row) });
  });

  r.delete('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'site');
    const deleted = await db.delete(site).where(and(eq(site.id, id), eq(site.ownerId, res.locals.user.id))).returning({ id: site.id });
    if (deleted.length === 0) throw notFound('No such site');
    res.status(204).end();
  });

  return r;
}
