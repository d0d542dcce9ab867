import { and, asc, eq, inArray, isNull } from 'drizzle-orm';
import express, { Router, type Request, type RequestHandler } from 'express';
import { z, ZodError } from 'zod';
import type { Database } from '@/db/client';
import { framing, recipe, rig, target } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { buildPlan, exportPlan, importPlan, planPreview, PLAN_LIMITS, type Plan, type PlanTarget } from '@/shared/plan';
import { planFileName } from '@/shared/plan/file-name';
import { currentNightDate } from '@/shared/night-date';
import { targetIds } from '@/shared/recipe/summary';
import type { RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { nightDateSchema } from '@/shared/schemas/night';
import { findMatches, storeImport } from './plan-import';
import { findDefaultSite, findOwnSite } from './sites';
import { parseId, parseQuery } from './validate';

/** YAML arrives as text; anything larger than a plan may be is refused before it is read. */
const YAML_TYPES = ['text/yaml', 'application/yaml', 'application/x-yaml', 'text/x-yaml', 'text/plain'];
const readText = express.text({ type: YAML_TYPES, limit: PLAN_LIMITS.maxBytes });
const yamlBody: RequestHandler = (req, res, next) =>
  readText(req, res, (err?: { type?: string }) => next(err?.type === 'entity.too.large' ? new HttpError(413, 'too-large', `A plan is at most ${PLAN_LIMITS.maxBytes / 1048576} MB`) : err));

const exportQuerySchema = z.object({ date: nightDateSchema.optional(), estimate: z.enum(['0', '1']).default('0') });
const importQuerySchema = z.object({ createSite: z.enum(['0', '1']).default('0'), createRig: z.enum(['0', '1']).default('0') });

/** The request body as a plan, or a 400 with every problem by line, column and path. */
function planFrom(req: Request): Plan {
  if (typeof req.body !== 'string') throw new HttpError(415, 'unsupported-media-type', 'Send the plan as YAML text (Content-Type: text/yaml)');
  const result = importPlan(req.body);
  if (result.ok) return result.plan;
  const first = result.errors[0]!;
  const where = first.line !== null ? `line ${first.line}, column ${first.column}: ` : '';
  const message = result.errors.length === 1 ? `${where}${first.path ? `${first.path}: ` : ''}${first.message}` : `The plan has ${result.errors.length} problems; the first, ${where}${first.message}`;
  throw new HttpError(400, 'invalid-plan', message, { issues: result.errors });
}

/** The targets a tree points at, with framings oldest first; a 409 if one has been deleted. */
async function planTargets(db: Database, ownerId: string, tree: RecipeTree): Promise<PlanTarget[]> {
  const ids = targetIds(tree);
  const rows = ids.length ? await db.select().from(target).where(and(eq(target.ownerId, ownerId), inArray(target.id, ids))) : [];
  if (rows.length !== ids.length) throw new HttpError(409, 'missing-target', 'A stage points at a target that is no longer on your list: choose another target for it first');
  const frames = rows.length ? await db.select().from(framing).where(inArray(framing.targetId, ids)).orderBy(asc(framing.createdAt)) : [];
  return ids.map((id) => {
    const t = rows.find((r) => r.id === id)!;
    const own = frames.filter((f) => f.targetId === id).map((f) => ({ id: f.id, name: f.name, raDeg: f.raDeg, decDeg: f.decDeg, positionAngleDeg: f.positionAngleDeg, mosaicCols: f.mosaicCols, mosaicRows: f.mosaicRows, overlapPct: f.overlapPct }));
    return { id, designation: t.designation, aliases: t.aliases, name: t.name, type: t.type as PlanTarget['type'], raDeg: t.raDeg, decDeg: t.decDeg, majorArcmin: t.majorArcmin ?? 0, minorArcmin: t.minorArcmin, positionAngleDeg: t.positionAngleDeg, magnitude: t.magnitude, framings: own };
  });
}

/** GET /api/recipes/:id/plan?date=YYYY-MM-DD&estimate=1: the recipe as a YAML plan (a download). */
export function recipePlanRouter(db: Database): Router {
  const r = Router();
  r.get('/:id/plan', async (req, res) => {
    const ownerId = res.locals.user.id;
    const q = parseQuery(exportQuerySchema, req);
    const [row] = await db.select().from(recipe).where(and(eq(recipe.id, parseId(req.params.id, 'recipe')), eq(recipe.ownerId, ownerId), isNull(recipe.deletedAt)));
    if (!row) throw notFound('No such recipe');
    const siteRow = row.siteId ? await findOwnSite(db, ownerId, row.siteId) : await findDefaultSite(db, ownerId);
    if (!siteRow) throw new HttpError(404, 'no-site', 'Add a site first: a plan describes a night at a place');
    const [rigRow] = row.rigId ? await db.select().from(rig).where(and(eq(rig.id, row.rigId), eq(rig.ownerId, ownerId))) : [];
    const rigSpec: RigInput = rigRow ? { ...rigRow.spec, name: rigRow.name } : defaultRigInput();
    const tree = row.tree as RecipeTree;
    const nightDate = q.date ?? currentNightDate(siteRow.timeZone);
    let text: string;
    try {
      const plan = buildPlan({ recipe: { id: row.id, name: row.name, notes: row.notes, tree }, site: siteRow, rig: rigSpec, targets: await planTargets(db, ownerId, tree), nightDate, author: res.locals.user.name, generator: 'Nightloom', now: new Date(), withEstimate: q.estimate === '1' });
      text = exportPlan(plan);
    } catch (err) {
      if (!(err instanceof ZodError)) throw err;
      const issue = err.issues[0]!;
      throw new HttpError(409, 'unexportable', `This recipe cannot be written as a plan: ${issue.path.join('.')}: ${issue.message}`);
    }
    const filename = planFileName(row.name, nightDate);
    res.set('Content-Disposition', `attachment; filename="${filename}"; filename*=UTF-8''${encodeURIComponent(filename)}`);
    res.set('Cache-Control', 'no-store');
    res.type('text/yaml; charset=utf-8').send(text);
  });
  return r;
}

/** /api/plans: preview an uploaded plan against the user's account, and import it in one transaction. */
export function plansRouter(db: Database): Router {
  const r = Router();

  r.post('/preview', yamlBody, async (req, res) => {
    const plan = planFrom(req);
    const m = await findMatches(db, res.locals.user.id, plan);
    const preview = planPreview(plan, { siteId: m.site?.id ?? null, siteName: m.site?.name ?? null, rigId: m.rig?.id ?? null, rigName: m.rig?.name ?? null, targetOnList: (id) => m.targets.has(id) });
    res.json({ preview, errors: [] });
  });

  r.post('/import', yamlBody, async (req, res) => {
    const q = parseQuery(importQuerySchema, req);
    const plan = planFrom(req);
    const stored = await storeImport(db, res.locals.user.id, plan, { createSite: q.createSite === '1', createRig: q.createRig === '1' });
    res.status(201).json(stored);
  });

  return r;
}
