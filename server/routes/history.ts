import { and, asc, eq, inArray, isNull } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { captureFrame, captureShare, framing, member, recipe, rig, target } from '@/db/schema';
import { forbidden, HttpError, notFound } from '@/server/errors';
import { toStoredFrame } from '@/server/dry-run-input';
import { continueExposures, continueStage, mostUsedExposures } from '@/shared/calibration/continue';
import { recordedFramingsWithLights } from '@/shared/calibration/framings';
import { historySummary, linkLight, objectHistory, targetHistory } from '@/shared/calibration/history';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import { createNode } from '@/shared/recipe/factory';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { captureShareSchema, continueRequestSchema } from '@/shared/schemas/calibration-api';
import { createRecipe, derived, recordRevision, toRecipe } from './recipes';
import { findDefaultSite } from './sites';
import { parseBody, parseId } from './validate';

/** The user's targets with aliases and framings, as history links lights to them. */
export async function historyTargets(db: Database, ownerId: string): Promise<HistoryTargetRef[]> {
  const rows = await db.select().from(target).where(eq(target.ownerId, ownerId)).orderBy(asc(target.designation));
  const frames = rows.length ? await db.select().from(framing).where(inArray(framing.targetId, rows.map((t) => t.id))).orderBy(asc(framing.createdAt)) : [];
  return rows.map((t) => ({
    id: t.id,
    designation: t.designation,
    name: t.name,
    aliases: t.aliases,
    raDeg: t.raDeg,
    decDeg: t.decDeg,
    framings: frames.filter((f) => f.targetId === t.id).map((f) => ({ id: f.id, raDeg: f.raDeg, decDeg: f.decDeg, positionAngleDeg: f.positionAngleDeg })),
  }));
}

/** Every light frame the user recorded, oldest first. */
export async function ownLights(db: Database, ownerId: string): Promise<StoredFrame[]> {
  const rows = await db.select().from(captureFrame).where(and(eq(captureFrame.ownerId, ownerId), eq(captureFrame.frameType, 'light'))).orderBy(asc(captureFrame.takenAt));
  return rows.map(toStoredFrame);
}

/** Club ids each of the user's targets is shared with. */
async function sharesOf(db: Database, ownerId: string, targetId?: string): Promise<Map<string, string[]>> {
  const rows = await db
    .select({ targetId: captureShare.targetId, organizationId: captureShare.organizationId })
    .from(captureShare)
    .where(and(eq(captureShare.ownerId, ownerId), targetId ? eq(captureShare.targetId, targetId) : undefined))
    .orderBy(asc(captureShare.createdAt));
  const out = new Map<string, string[]>();
  for (const r of rows) out.set(r.targetId, [...(out.get(r.targetId) ?? []), r.organizationId]);
  return out;
}

/** One of the user's targets (404 for anyone else's), all their targets, and the lights linked to this one. */
async function targetWithLights(db: Database, ownerId: string, id: string) {
  const refs = await historyTargets(db, ownerId);
  const ref = refs.find((t) => t.id === id);
  if (!ref) throw notFound('No such target');
  const lights = (await ownLights(db, ownerId)).filter((f) => linkLight(f, refs) === id);
  return { ref, lights };
}

/** /api/history: what the user has captured, per target; "continue this target"; sharing with clubs. */
export function historyRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const ownerId = res.locals.user.id;
    const [lights, refs, shares] = [await ownLights(db, ownerId), await historyTargets(db, ownerId), await sharesOf(db, ownerId)];
    res.json({ targets: historySummary(lights, refs, shares) });
  });

  r.get('/targets/:id', async (req, res) => {
    const ownerId = res.locals.user.id;
    const { ref, lights } = await targetWithLights(db, ownerId, parseId(req.params.id, 'target'));
    const shares = await sharesOf(db, ownerId, ref.id);
    // `lights` are already this target's (linked among all targets): no second linking pass.
    res.json(targetHistory(ref, lights, shares.get(ref.id) ?? [], [ref]));
  });

  // Lights no target matched, by their OBJECT text (the rows of GET / with a null targetId).
  r.get('/objects/:label', async (req, res) => {
    const ownerId = res.locals.user.id;
    const label = String(req.params.label).trim().slice(0, 200);
    const history = objectHistory(label, await ownLights(db, ownerId), await historyTargets(db, ownerId));
    if (history.target.frames === 0) throw notFound('No lights with that object name');
    res.json(history);
  });

  r.post('/targets/:id/continue', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'target');
    const body = parseBody(continueRequestSchema, req);
    if (body.recipeId && body.version === undefined) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { version: ['Send the version of the recipe you saw'] } });
    const { ref, lights } = await targetWithLights(db, ownerId, id);
    const recorded = recordedFramingsWithLights(lights, ref.framings).find((r) => r.framing.key === body.framingKey);
    if (!recorded) throw notFound('That recorded framing is no longer in the history');
    const chosen = recorded.framing;
    const exposures = mostUsedExposures(recorded.lights);

    const [into] = body.recipeId ? await db.select().from(recipe).where(and(eq(recipe.id, body.recipeId), eq(recipe.ownerId, ownerId), isNull(recipe.deletedAt))) : [];
    if (body.recipeId && !into) throw notFound('No such recipe');
    const rigRows = await db.select({ id: rig.id, spec: rig.spec }).from(rig).where(eq(rig.ownerId, ownerId)).orderBy(asc(rig.createdAt));
    const rigRow = (into?.rigId ? rigRows.find((x) => x.id === into.rigId) : undefined) ?? rigRows[0];
    const spec: RigInput = rigRow?.spec ?? defaultRigInput();
    const stage = continueStage(ref.id, ref.designation, chosen, body.positionAngleDeg, exposures, spec);
    const skipped = continueExposures(exposures, spec).skipped;

    if (into) {
      await db.transaction(async (tx) => {
        const [current] = await tx.select().from(recipe).where(and(eq(recipe.id, into.id), eq(recipe.ownerId, ownerId), isNull(recipe.deletedAt))).for('update');
        if (!current) throw notFound('No such recipe');
        if (current.version !== body.version) throw new HttpError(409, 'version-conflict', 'This recipe was changed elsewhere since you opened it', { current: toRecipe(current) });
        const tree = recipeTreeSchema.parse({ children: [...(current.tree as RecipeTree).children, stage] });
        const [saved] = await tx.update(recipe).set({ tree, ...derived(tree), version: current.version + 1, updatedAt: new Date() }).where(eq(recipe.id, current.id)).returning();
        await recordRevision(tx, saved!);
      });
      res.status(201).json({ recipeId: into.id, skippedFilters: skipped });
      return;
    }
    const siteRow = await findDefaultSite(db, ownerId);
    const tree: RecipeTree = { children: [createNode('cool', {}), stage, createNode('warm', {}), createNode('park', {})] };
    const created = await createRecipe(db, { ownerId, name: `Continue ${ref.designation}`, rigId: rigRow?.id ?? null, siteId: siteRow?.id ?? null, tree });
    res.status(201).json({ recipeId: created.id, skippedFilters: skipped });
  });

  // Sharing is explicit and per club: only the target's summary (never frames) is shown there.
  r.post('/targets/:id/shares', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'target');
    const { organizationId } = parseBody(captureShareSchema, req);
    const [own] = await db.select({ id: target.id }).from(target).where(and(eq(target.id, id), eq(target.ownerId, ownerId)));
    if (!own) throw notFound('No such target');
    const [membership] = await db.select({ id: member.id }).from(member).where(and(eq(member.userId, ownerId), eq(member.organizationId, organizationId)));
    if (!membership) throw forbidden('You can share only with a club you are a member of');
    await db.insert(captureShare).values({ ownerId, targetId: id, organizationId }).onConflictDoNothing();
    res.json({ sharedWith: (await sharesOf(db, ownerId, id)).get(id) ?? [] });
  });

  r.delete('/targets/:id/shares/:organizationId', async (req, res) => {
    const ownerId = res.locals.user.id;
    const id = parseId(req.params.id, 'target');
    const [own] = await db.select({ id: target.id }).from(target).where(and(eq(target.id, id), eq(target.ownerId, ownerId)));
    if (!own) throw notFound('No such target');
    await db.delete(captureShare).where(and(eq(captureShare.targetId, id), eq(captureShare.ownerId, ownerId), eq(captureShare.organizationId, req.params.organizationId)));
    res.json({ sharedWith: (await sharesOf(db, ownerId, id)).get(id) ?? [] });
  });

  return r;
}
