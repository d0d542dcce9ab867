import { Router } from 'express';
import type { Database } from '@/db/client';
import { HttpError } from '@/server/errors';
import { computeNight } from '@/shared/ephemeris/night';
import { currentNightDate } from '@/shared/night-date';
import { tonightQuerySchema } from '@/shared/schemas/night';
import { findDefaultSite, findOwnSite, toSite } from './sites';
import { parseQuery } from './validate';

/** GET /api/tonight?siteId&date: the night's sun and moon events at one of the user's sites. */
export function tonightRouter(db: Database): Router {
  const r = Router();
  r.get('/', async (req, res) => {
    const query = parseQuery(tonightQuerySchema, req);
    const userId = res.locals.user.id;
    const row = query.siteId ? await findOwnSite(db, userId, query.siteId) : await findDefaultSite(db, userId);
    if (!row) throw new HttpError(404, 'no-site', 'Add a site first: the night is computed for where you observe');
    const date = query.date ?? currentNightDate(row.timeZone);
    const night = computeNight(row, date);
    res.set('Cache-Control', 'private, max-age=300');
    res.json({ site: toSite(row), night });
  });
  return r;
}
