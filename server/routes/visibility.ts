import { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { HttpError } from '@/server/errors';
import { computeNight } from '@/shared/ephemeris/night';
import { targetVisibility } from '@/shared/ephemeris/visibility';
import { currentNightDate } from '@/shared/night-date';
import { nightDateSchema } from '@/shared/schemas/night';
import { findDefaultSite, findOwnSite, toSite } from './sites';
import { parseQuery } from './validate';

const querySchema = z.object({
  siteId: z.string().uuid('Not a site id').optional(),
  date: nightDateSchema.optional(),
  raDeg: z.coerce.number({ error: 'Right ascension must be a number' }).min(0, 'Right ascension is 0–360°').lt(360, 'Right ascension is 0–360°'),
  decDeg: z.coerce.number({ error: 'Declination must be a number' }).min(-90, 'Declination is −90–90°').max(90, 'Declination is −90–90°'),
});

/** GET /api/visibility: a position's altitude curve through a night at one of the user's sites. */
export function visibilityRouter(db: Database): Router {
  const r = Router();
  r.get('/', async (req, res) => {
    const q = parseQuery(querySchema, req);
    const userId = res.locals.user.id;
    const row = q.siteId ? await findOwnSite(db, userId, q.siteId) : await findDefaultSite(db, userId);
    if (!row) throw new HttpError(404, 'no-site', 'Add a site first: visibility is computed for where you observe');
    const night = computeNight(row, q.date ?? currentNightDate(row.timeZone));
    res.set('Cache-Control', 'private, max-age=300');
    res.json({ site: toSite(row), night, visibility: targetVisibility(q.raDeg, q.decDeg, row, night) });
  });
  return r;
}
