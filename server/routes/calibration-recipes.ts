import { and, asc, desc, eq, gte, lte } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { captureFrame } from '@/db/schema';
import { HttpError } from '@/server/errors';
import { loadBiasSets, toStoredFrame } from '@/server/dry-run-input';
import { darksRecipeTree } from '@/shared/calibration/darks';
import { FLAT_VALID_DAYS_AFTER, flatCombos, flatsRecipeTree } from '@/shared/calibration/flats';
import { darksRecipeRequestSchema, flatsRecipeRequestSchema } from '@/shared/schemas/calibration-api';
import { nightDateSchema } from '@/shared/schemas/night';
import { addDaysYmd } from '@/shared/time';
import { checkLinks, createRecipe } from './recipes';
import { parseBody, parseQuery } from './validate';

/** The night's (filter, rotator, focus) combinations with the flats and whether fresh bias is on record for each; [] without lights. */
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
  return flatCombos(lights.map(toStoredFrame), flats.map(toStoredFrame), nightDate, await loadBiasSets(db, ownerId));
}

/** /api/calibration: calibration recipes (darks for a cloudy night, flats matching a night's lights) and the flats a night needs. */
export function calibrationRecipesRouter(db: Database): Router {
  const r = Router();

  r.post('/darks-recipe', async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(darksRecipeRequestSchema, req);
    const rigId = body.rigId ?? null;
    await checkLinks(db, ownerId, { rigId, siteId: null });
    const tree = darksRecipeTree(body.darks, body.count ?? 30);
    const created = await createRecipe(db, { ownerId, name: body.name ?? 'Darks for a cloudy night', rigId, siteId: null, tree });
    res.status(201).json({ recipeId: created.id });
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
    const rigId = body.rigId ?? null;
    await checkLinks(db, ownerId, { rigId, siteId: null });
    const combos = await combosOfNight(db, ownerId, body.nightDate);
    if (combos.length === 0) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { nightDate: ['No light frames on record for that night'] } });
    const tree = flatsRecipeTree(combos, body.source, body.count ?? 25);
    const created = await createRecipe(db, { ownerId, name: `Flats for the night of ${body.nightDate}`, rigId, siteId: null, tree });
    res.status(201).json({ recipeId: created.id });
  });

  return r;
}
