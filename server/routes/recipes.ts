import { and, asc, desc, eq, ilike, inArray, isNull, lt } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { dryRun, recipe, recipeRevision, rig, site, target } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { recipeCreateSchema, recipeListQuerySchema, recipeSaveSchema, type RecipeDetail, type RecipeListItem } from '@/shared/schemas/recipe-api';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { emptyRecipe, starterRecipe, copyRecipe } from '@/shared/recipe/starters';
import { countNodes } from '@/shared/recipe/tree';
import { targetIds, totals } from '@/shared/recipe/summary';
import type { RecipeTree } from '@/shared/recipe/types';
import { parseBody, parseId, parseQuery } from './validate';

type RecipeRow = typeof recipe.$inferSelect;
type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** Revisions kept per recipe; older ones are pruned on save. */
export const REVISIONS_KEPT = 100;

export function toRecipe(r: RecipeRow): RecipeDetail {
  return {
    id: r.id,
    name: r.name,
    notes: r.notes,
    rigId: r.rigId,
    siteId: r.siteId,
    tree: r.tree as RecipeTree,
    version: r.version,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    deletedAt: r.deletedAt?.toISOString() ?? null,
  };
}

/** The columns derived from a tree on every save (the list shows them without parsing trees). */
export function derived(tree: RecipeTree) {
  return { nodeCount: countNodes(tree), targetCount: targetIds(tree).length, plannedExposureS: totals(tree).lightShutterS };
}

async function ownRecipe(db: Database | Tx, ownerId: string, id: string, opts: { deleted?: boolean; lock?: boolean } = {}): Promise<RecipeRow> {
  const cond = and(eq(recipe.id, id), eq(recipe.ownerId, ownerId), opts.deleted ? undefined : isNull(recipe.deletedAt));
  const q = db.select().from(recipe).where(cond);
  const [row] = opts.lock ? await q.for('update') : await q;
  if (!row) throw notFound('No such recipe');
  return row;
}

/** A rig or site named by a recipe must be the user's own: a 400 field error otherwise. */
export async function checkLinks(db: Database | Tx, ownerId: string, links: { rigId: string | null; siteId: string | null }) {
  const fields: Record<string, string[]> = {};
  if (links.rigId && !(await db.select({ id: rig.id }).from(rig).where(and(eq(rig.id, links.rigId), eq(rig.ownerId, ownerId))))[0]) fields.rigId = ['No such rig'];
  if (links.siteId && !(await db.select({ id: site.id }).from(site).where(and(eq(site.id, links.siteId), eq(site.ownerId, ownerId))))[0]) fields.siteId = ['No such site'];
  if (Object.keys(fields).length) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields });
}

/** Stores the row's current version as a revision and prunes the oldest beyond REVISIONS_KEPT. */
export async function recordRevision(tx: Tx, row: RecipeRow) {
  await tx.insert(recipeRevision).values({ recipeId: row.id, version: row.version, name: row.name, notes: row.notes, tree: row.tree, nodeCount: row.nodeCount });
  await tx.delete(recipeRevision).where(and(eq(recipeRevision.recipeId, row.id), lt(recipeRevision.version, row.version - REVISIONS_KEPT + 1)));
}

/** What a new recipe is made of; `notes` defaults to none. */
export interface NewRecipe {
  ownerId: string;
  name: string;
  notes?: string;
  rigId: string | null;
  siteId: string | null;
  tree: RecipeTree;
}

/**
 * Stores a new recipe and its first revision inside the caller's transaction, for writes that
 * store more with it (a plan import, a template use). Rig and site must already be checked (with
 * `checkLinks` or the caller's own rules). The tree is parsed again, so no caller stores one the
 * schema refuses; the name is cut to the schema's 80 characters.
 */
export async function createRecipeIn(tx: Tx, values: NewRecipe): Promise<RecipeRow> {
  const tree = recipeTreeSchema.parse(values.tree);
  const [created] = await tx
    .insert(recipe)
    .values({ ...values, name: values.name.slice(0, 80), notes: values.notes ?? '', tree, ...derived(tree) })
    .returning();
  await recordRevision(tx, created!);
  return created!;
}

/** Stores a new recipe and its first revision in a transaction of its own (see `createRecipeIn`). */
export async function createRecipe(db: Database, values: NewRecipe): Promise<RecipeRow> {
  return db.transaction((tx) => createRecipeIn(tx, values));
}

/** The starting tree of a new recipe (see `recipeStartSchema`). */
async function startingTree(db: Database, ownerId: string, body: ReturnType<typeof recipeCreateSchema.parse>): Promise<{ tree: RecipeTree; name: string }> {
  const start = body.start;
  if (start.kind === 'tree') return { tree: start.tree, name: 'Imported recipe' };
  if (start.kind === 'copy') {
    const source = await ownRecipe(db, ownerId, start.recipeId);
    return { tree: copyRecipe(source.tree as RecipeTree), name: `Copy of ${source.name}`.slice(0, 80) };
  }
  if (start.kind === 'starter') {
    const [r] = body.rigId ? await db.select({ spec: rig.spec }).from(rig).where(and(eq(rig.id, body.rigId), eq(rig.ownerId, ownerId))) : [];
    const rows = start.targetIds.length ? await db.select({ id: target.id, name: target.designation }).from(target).where(and(eq(target.ownerId, ownerId), inArray(target.id, start.targetIds))) : [];
    if (rows.length !== new Set(start.targetIds).size) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { 'start.targetIds': ['No such target'] } });
    const ordered = start.targetIds.map((id) => rows.find((t) => t.id === id)!);
    const made = starterRecipe({ rig: (r?.spec as RigInput | undefined) ?? defaultRigInput(), targets: ordered });
    return { tree: made.tree, name: made.name };
  }
  return { tree: emptyRecipe().tree, name: 'New recipe' };
}

/** /api/recipes: the user's recipes, autosaved with version checks, with revisions and soft delete. */
export function recipesRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (req, res) => {
    const q = parseQuery(recipeListQuerySchema, req);
    const conds = [eq(recipe.ownerId, res.locals.user.id), isNull(recipe.deletedAt), q.q ? ilike(recipe.name, `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`) : undefined];
    const order = q.sort === 'name' ? asc(recipe.name) : q.sort === 'exposure' ? desc(recipe.plannedExposureS) : desc(recipe.updatedAt);
    const rows = await db
      .select({ r: recipe, rigName: rig.name, siteName: site.name })
      .from(recipe)
      .leftJoin(rig, eq(rig.id, recipe.rigId))
      .leftJoin(site, eq(site.id, recipe.siteId))
      .where(and(...conds))
      .orderBy(order)
      .limit(500);
    // The newest dry run of each recipe: its end time, and whether the recipe changed since.
    const latest = await db
      .selectDistinctOn([dryRun.recipeId], { recipeId: dryRun.recipeId, nightEnd: dryRun.nightEnd, recipeVersion: dryRun.recipeVersion })
      .from(dryRun)
      .where(eq(dryRun.ownerId, res.locals.user.id))
      .orderBy(dryRun.recipeId, desc(dryRun.createdAt));
    const lastRun = new Map(latest.map((d) => [d.recipeId, d]));
    const recipes: RecipeListItem[] = rows.map(({ r: x, rigName, siteName }) => ({
      id: x.id,
      name: x.name,
      rigId: x.rigId,
      rigName: rigName ?? null,
      siteId: x.siteId,
      siteName: siteName ?? null,
      nodeCount: x.nodeCount,
      targetCount: x.targetCount,
      plannedExposureS: x.plannedExposureS,
      lastDryRunEnd: lastRun.get(x.id)?.nightEnd?.toISOString() ?? null,
      lastDryRunStale: lastRun.has(x.id) ? lastRun.get(x.id)!.recipeVersion !== x.version : null,
      version: x.version,
      updatedAt: x.updatedAt.toISOString(),
      deletedAt: null,
    }));
    res.json({ recipes });
  });

  r.post('/', async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(recipeCreateSchema, req);
    await checkLinks(db, ownerId, body);
    const { tree, name } = await startingTree(db, ownerId, body);
    const row = await createRecipe(db, { ownerId, name: body.name ?? name, notes: body.notes, rigId: body.rigId, siteId: body.siteId, tree });
    res.status(201).json({ recipe: toRecipe(row) });
  });

  r.get('/:id', async (req, res) => {
    res.json({ recipe: toRecipe(await ownRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'))) });
  });

  r.put('/:id', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'recipe');
    const body = parseBody(recipeSaveSchema, req);
    await checkLinks(db, ownerId, body);
    const row = await db.transaction(async (tx) => {
      const current = await ownRecipe(tx, ownerId, id, { lock: true });
      if (current.version !== body.version) throw new HttpError(409, 'version-conflict', 'This recipe was changed elsewhere since you opened it', { current: toRecipe(current) });
      const [saved] = await tx
        .update(recipe)
        .set({ name: body.name, notes: body.notes, rigId: body.rigId, siteId: body.siteId, tree: body.tree, ...derived(body.tree), version: current.version + 1, updatedAt: new Date() })
        .where(eq(recipe.id, id))
        .returning();
      await recordRevision(tx, saved!);
      return saved!;
    });
    res.json({ recipe: toRecipe(row) });
  });

  // Soft delete: the recipe leaves lists and reads; POST /:id/restore brings it back (undo).
  r.delete('/:id', async (req, res) => {
    const row = await ownRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'));
    const [gone] = await db.update(recipe).set({ deletedAt: new Date() }).where(eq(recipe.id, row.id)).returning();
    res.json({ recipe: toRecipe(gone!) });
  });

  r.post('/:id/restore', async (req, res) => {
    const row = await ownRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'), { deleted: true });
    const [back] = await db.update(recipe).set({ deletedAt: null }).where(eq(recipe.id, row.id)).returning();
    res.json({ recipe: toRecipe(back!) });
  });

  r.get('/:id/revisions', async (req, res) => {
    const row = await ownRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'));
    const revs = await db
      .select({ version: recipeRevision.version, name: recipeRevision.name, nodeCount: recipeRevision.nodeCount, createdAt: recipeRevision.createdAt })
      .from(recipeRevision)
      .where(eq(recipeRevision.recipeId, row.id))
      .orderBy(desc(recipeRevision.version));
    res.json({ revisions: revs.map((v) => ({ ...v, createdAt: v.createdAt.toISOString() })) });
  });

  r.get('/:id/revisions/:version', async (req, res) => {
    const row = await ownRecipe(db, res.locals.user.id, parseId(req.params.id, 'recipe'));
    const version = Number(req.params.version);
    const [rev] = Number.isInteger(version) ? await db.select().from(recipeRevision).where(and(eq(recipeRevision.recipeId, row.id), eq(recipeRevision.version, version))) : [];
    if (!rev) throw notFound('No such revision');
    res.json({ revision: { version: rev.version, name: rev.name, notes: rev.notes, tree: rev.tree, nodeCount: rev.nodeCount, createdAt: rev.createdAt.toISOString() } });
  });

  // Restoring writes the old tree as a new version (history is never rewritten).
  r.post('/:id/revisions/:version/restore', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'recipe');
    const { version } = parseBody(recipeSaveSchema.pick({ version: true }), req);
    const row = await db.transaction(async (tx) => {
      const current = await ownRecipe(tx, ownerId, id, { lock: true });
      if (current.version !== version) throw new HttpError(409, 'version-conflict', 'This recipe was changed elsewhere since you opened it', { current: toRecipe(current) });
      const [rev] = await tx.select().from(recipeRevision).where(and(eq(recipeRevision.recipeId, id), eq(recipeRevision.version, Number(req.params.version))));
      if (!rev) throw notFound('No such revision');
      const tree = rev.tree as RecipeTree;
      const [saved] = await tx.update(recipe).set({ name: rev.name, notes: rev.notes, tree, ...derived(tree), version: current.version + 1, updatedAt: new Date() }).where(eq(recipe.id, id)).returning();
      await recordRevision(tx, saved!);
      return saved!;
    });
    res.json({ recipe: toRecipe(row) });
  });

  return r;
}
