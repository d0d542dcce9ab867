import { and, desc, eq, isNull } from 'drizzle-orm';
import { Router, type Response } from 'express';
import type { Database } from '@/db/client';
import { dryRun, recipe } from '@/db/schema';
import { loadDryRunContext } from '@/server/dry-run-input';
import { notFound } from '@/server/errors';
import { runDryRun, scanNights, type DryRunResult } from '@/shared/dry-run';
import { dryRunRequestSchema, dryRunTreeRequestSchema, scanQuerySchema } from '@/shared/schemas/dry-run-api';
import type { RecipeTree } from '@/shared/recipe/types';
import { addDaysYmd } from '@/shared/time';
import { parseBody, parseId, parseQuery } from './validate';

type DryRunRow = typeof dryRun.$inferSelect;

const toDryRun = (row: DryRunRow, currentVersion: number) => ({
  id: row.id,
  recipeId: row.recipeId,
  recipeVersion: row.recipeVersion,
  nightDate: row.nightDate,
  siteId: row.siteId,
  rigId: row.rigId,
  createdAt: row.createdAt.toISOString(),
  stale: row.recipeVersion !== currentVersion,
  result: row.result as DryRunResult,
});

async function liveRecipe(db: Database, ownerId: string, id: string) {
  const [row] = await db.select().from(recipe).where(and(eq(recipe.id, id), eq(recipe.ownerId, ownerId), isNull(recipe.deletedAt)));
  if (!row) throw notFound('No such recipe');
  return row;
}

const counts = (result: DryRunResult) => ({
  stopCount: result.findings.filter((f) => f.severity === 'stop').length,
  warnCount: result.findings.filter((f) => f.severity === 'warn').length,
});

/** Recipe-scoped dry runs: run and store, read the latest, and scan a range of nights. */
export function recipeDryRunsRouter(db: Database): Router {
  const r = Router({ mergeParams: true });

  r.post('/:id/dry-runs', async (req, res) => {
    const ownerId = res.locals.user.id;
    const row = await liveRecipe(db, ownerId, parseId(req.params.id, 'recipe'));
    const body = parseBody(dryRunRequestSchema, req);
    const ctx = await loadDryRunContext(db, ownerId, row.tree as RecipeTree, {
      rigId: body.rigId === undefined ? row.rigId : body.rigId,
      siteId: body.siteId === undefined ? row.siteId : body.siteId,
      date: body.date,
      startTime: body.startTime,
    });
    const result = runDryRun(ctx.input);
    const [stored] = await db
      .insert(dryRun)
      .values({ recipeId: row.id, ownerId, recipeVersion: row.version, nightDate: ctx.input.nightDate, siteId: ctx.siteId, rigId: ctx.rigId, nightEnd: result.totals.nightEnd ? new Date(result.totals.nightEnd) : null, ...counts(result), result })
      .returning();
    res.status(201).json({ dryRun: toDryRun(stored!, row.version) });
  });

  r.get('/:id/dry-runs/latest', async (req, res) => {
    const row = await liveRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'));
    const [latest] = await db.select().from(dryRun).where(eq(dryRun.recipeId, row.id)).orderBy(desc(dryRun.createdAt)).limit(1);
    if (!latest) throw notFound('This recipe has not been dry-run yet');
    res.json({ dryRun: toDryRun(latest, row.version) });
  });

  // Best nights: one dry run per night, streamed as Server-Sent Events; closing the request cancels.
  r.get('/:id/scan', async (req, res) => {
    const ownerId = res.locals.user.id;
    const row = await liveRecipe(db, ownerId, parseId(req.params.id, 'recipe'));
    const q = parseQuery(scanQuerySchema, req);
    const ctx = await loadDryRunContext(db, ownerId, row.tree as RecipeTree, { rigId: q.rigId ?? row.rigId, siteId: q.siteId ?? row.siteId, date: q.from });
    await streamScan(res, req.on.bind(req), ctx.input, q.from, q.nights);
  });

  return r;
}

const SCAN_CHUNK = 7;

async function streamScan(res: Response, on: (event: 'close', fn: () => void) => unknown, input: Parameters<typeof scanNights>[0], from: string, nights: number) {
  let cancelled = false;
  on('close', () => {
    cancelled = true;
  });
  res.status(200).set({ 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache', Connection: 'keep-alive' });
  res.flushHeaders();
  const send = (event: string, data: unknown) => res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);
  for (let done = 0; done < nights && !cancelled; done += SCAN_CHUNK) {
    const count = Math.min(SCAN_CHUNK, nights - done);
    const part = scanNights(input, addDaysYmd(from, done), count);
    send('nights', { done: done + count, total: nights, nights: part });
    // Let the event loop serve other requests (and notice a cancel) between chunks.
    await new Promise((resolve) => setImmediate(resolve));
  }
  if (!cancelled) send('done', { total: nights });
  res.end();
}

/** POST /api/dry-runs: dry-run an unsaved tree (nothing is stored). */
export function treeDryRunRouter(db: Database): Router {
  const r = Router();
  r.post('/', async (req, res) => {
    const body = parseBody(dryRunTreeRequestSchema, req);
    const ctx = await loadDryRunContext(db, res.locals.user.id, body.tree, { rigId: body.rigId ?? null, siteId: body.siteId ?? null, date: body.date, startTime: body.startTime });
    res.json({ result: runDryRun(ctx.input) });
  });
  return r;
}
