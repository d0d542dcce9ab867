import { and, gte, inArray, isNotNull, like, lte, or, type SQL } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { catalogueObject } from '@/db/schema';
import { HttpError } from '@/server/errors';
import { computeNight } from '@/shared/ephemeris/night';
import { darkHoursScreen } from '@/shared/ephemeris/visibility';
import { currentNightDate } from '@/shared/night-date';
import { catalogueSearchQuerySchema, type CatalogueSearchResult } from '@/shared/schemas/target';
import { BUILTIN_TARGETS } from '@/shared/targets/builtin';
import type { CatalogueObject, TargetKind } from '@/shared/targets/schema';
import { foldForSearch, normaliseDesignation, searchTargets, type TargetFilter } from '@/shared/targets/search';
import { readableCatalogues } from './catalogues';
import { findDefaultSite, findOwnSite } from './sites';
import { parseQuery } from './validate';

type Hit = CatalogueObject & { source: 'builtin' | 'catalogue'; catalogueId: string | null; catalogueName: string | null };

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Imported objects passing the filter, narrowed in SQL (text, kind, size, magnitude) first. */
async function catalogueHits(db: Database, catalogues: { id: string; name: string }[], filter: TargetFilter): Promise<Hit[]> {
  if (catalogues.length === 0) return [];
  const conds: (SQL | undefined)[] = [inArray(catalogueObject.catalogueId, catalogues.map((c) => c.id))];
  const q = filter.query?.trim();
  if (q) {
    const folded = escapeLike(foldForSearch(q));
    const asDesignation = escapeLike(foldForSearch(normaliseDesignation(q)));
    conds.push(or(like(catalogueObject.searchKey, `%${folded}%`), like(catalogueObject.searchKey, `%${asDesignation}%`)));
  }
  if (filter.types?.length) conds.push(inArray(catalogueObject.type, [...filter.types]));
  if (filter.minSizeArcmin !== undefined) conds.push(gte(catalogueObject.majorArcmin, filter.minSizeArcmin));
  if (filter.maxSizeArcmin !== undefined) conds.push(lte(catalogueObject.majorArcmin, filter.maxSizeArcmin));
  if (filter.faintestMag !== undefined) conds.push(and(isNotNull(catalogueObject.magnitude), lte(catalogueObject.magnitude, filter.faintestMag)));
  const rows = await db.select().from(catalogueObject).where(and(...conds));
  const names = new Map(catalogues.map((c) => [c.id, c.name]));
  return rows.map((r) => ({
    designation: r.designation,
    aliases: r.aliases,
    name: r.name,
    type: r.type as TargetKind,
    raDeg: r.raDeg,
    decDeg: r.decDeg,
    majorArcmin: r.majorArcmin ?? 0,
    minorArcmin: r.minorArcmin,
    positionAngleDeg: r.positionAngleDeg,
    magnitude: r.magnitude,
    source: 'catalogue' as const,
    catalogueId: r.catalogueId,
    catalogueName: names.get(r.catalogueId) ?? null,
  }));
}

/**
 * GET /api/catalogue/search: the built-in list plus the user's own and club catalogues, by
 * designation or name, kind, size and magnitude; optionally only what is well placed in the
 * night's darkness at a site (see `darkHoursScreen`), best placed first.
 */
export function catalogueSearchRouter(db: Database): Router {
  const r = Router();
  r.get('/search', async (req, res) => {
    const query = parseQuery(catalogueSearchQuerySchema, req);
    const userId = res.locals.user.id;
    const filter: TargetFilter = { query: query.q, types: query.kind, minSizeArcmin: query.minSizeArcmin, maxSizeArcmin: query.maxSizeArcmin, faintestMag: query.faintestMag };
    const builtin: Hit[] = searchTargets(BUILTIN_TARGETS, filter).map((o) => ({ ...o, source: 'builtin', catalogueId: null, catalogueName: null }));
    // An imported copy of a built-in object (same designation or alias) is not listed twice.
    const builtinNames = new Set(builtin.flatMap((o) => [o.designation, ...o.aliases].map((d) => normaliseDesignation(d).toLowerCase())));
    const isBuiltin = (o: Hit) => [o.designation, ...o.aliases].some((d) => builtinNames.has(normaliseDesignation(d).toLowerCase()));
    const imported = (await catalogueHits(db, await readableCatalogues(db, userId), filter)).filter((o) => !isBuiltin(o));
    const hits = searchTargets([...builtin, ...imported], filter);
    let darkMinutes: ((o: Hit) => number) | null = null;
    let night: { siteId: string; siteName: string; date: string } | null = null;
    if (query.wellPlaced === '1' || query.siteId) {
      const row = query.siteId ? await findOwnSite(db, userId, query.siteId) : await findDefaultSite(db, userId);
      if (!row) throw new HttpError(404, 'no-site', 'Add a site first: "well placed" is judged from where you observe');
      const date = query.date ?? currentNightDate(row.timeZone);
      const screen = darkHoursScreen(row, computeNight(row, date), row.minAltitudeDeg);
      darkMinutes = (o) => screen(o.raDeg, o.decDeg);
      night = { siteId: row.id, siteName: row.name, date };
    }
    const withMinutes = (list: Hit[]): CatalogueSearchResult[] => list.map((o) => ({ ...o, darkMinutes: darkMinutes ? darkMinutes(o) : null }));
    let results: CatalogueSearchResult[];
    let total = hits.length;
    if (query.wellPlaced === '1') {
      const min = query.minDarkMinutes ?? 60;
      const placed = withMinutes(hits).filter((o) => (o.darkMinutes ?? 0) >= min);
      placed.sort((a, b) => (b.darkMinutes ?? 0) - (a.darkMinutes ?? 0));
      total = placed.length;
      results = placed.slice(0, query.limit);
    } else {
      results = withMinutes(hits.slice(0, query.limit));
    }
    res.json({ results, total, night });
  });
  return r;
}
