import { and, asc, eq, ne } from 'drizzle-orm';
import express, { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { site } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { horizonProfileSchema, parseHorizonCsv } from '@/shared/horizon/profile';
import { siteInputSchema, siteUpdateSchema, type Site } from '@/shared/schemas/site';
import { parseBody, parseId } from './validate';
import { updateVersioned } from './versioned';

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
    minAltitudeDeg: row.minAltitudeDeg,
    duskTempC: row.duskTempC,
    dawnTempC: row.dawnTempC,
    horizon: row.horizon,
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
      // Clear the old default first: the one-default index is checked row by row. A 404 or 409
      // below rolls this back with the rest.
      if (input.isDefault) await tx.update(site).set({ isDefault: false }).where(and(eq(site.ownerId, ownerId), ne(site.id, id)));
      return updateVersioned<typeof site, SiteRow>(tx, site, { id, ownerId }, version, input, toSite, 'site');
    });
    res.json({ site: toSite(row) });
  });

  // A horizon profile uploaded as CSV (two columns: azimuth, altitude in degrees). Any bad row
  // answers 400 with every error by line, and the stored profile stays as it was.
  r.put('/:id/horizon', express.text({ type: ['text/csv', 'text/plain'], limit: '256kb' }), async (req, res) => {
    const id = parseId(req.params.id, 'site');
    const { version } = z.object({ version: z.coerce.number().int().positive('Send the version you edited') }).parse(req.query);
    if (typeof req.body !== 'string') throw new HttpError(415, 'unsupported-media-type', 'Send the horizon as text/csv');
    const parsed = parseHorizonCsv(req.body);
    if ('errors' in parsed) {
      throw new HttpError(400, 'invalid-csv', `The horizon file has ${parsed.errors.length} bad row(s); nothing was saved`, { rows: parsed.errors });
    }
    const checked = horizonProfileSchema.parse({ points: parsed.points });
    const row = await db.transaction((tx) =>
      updateVersioned<typeof site, SiteRow>(tx, site, { id, ownerId: res.locals.user.id }, version, { horizon: checked.points }, toSite, 'site'),
    );
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
