import { eq, inArray } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { framing, rig, site, target } from '@/db/schema';
import { remapPlanTree, type Plan } from '@/shared/plan';
import type { RecipeTree } from '@/shared/recipe/types';
import { createRecipeIn, toRecipe } from './recipes';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** What of a plan the user already has: a site, a rig, targets (plan target id → user target id). */
export interface PlanMatches {
  site: { id: string; name: string } | null;
  rig: { id: string; name: string } | null;
  targets: Map<string, string>;
}

const fold = (text: string) => text.normalize('NFKC').trim().replace(/\s+/g, ' ').toLowerCase();
/** Coordinates within about 10 cm: the same place written by another account. */
const samePlace = (a: number, b: number) => Math.abs(a - b) < 1e-6;
const filterKey = (names: string[]) => names.map(fold).sort().join('\u0000');

/**
 * The user's rows that match the plan: a site by name and coordinates, a rig by name and the
 * filters in its wheel, targets by designation (case and spacing ignored).
 */
export async function findMatches(db: Database | Tx, ownerId: string, plan: Plan): Promise<PlanMatches> {
  const sites = await db.select({ id: site.id, name: site.name, lat: site.latitudeDeg, lon: site.longitudeDeg }).from(site).where(eq(site.ownerId, ownerId));
  const s = sites.find((x) => fold(x.name) === fold(plan.site.name) && samePlace(x.lat, plan.site.latitudeDeg) && samePlace(x.lon, plan.site.longitudeDeg));
  const rigs = await db.select({ id: rig.id, name: rig.name, spec: rig.spec }).from(rig).where(eq(rig.ownerId, ownerId));
  const wanted = filterKey(plan.rig.filterWheel.slots.map((slot) => slot.name));
  const r = rigs.find((x) => fold(x.name) === fold(plan.rig.name) && filterKey((x.spec.filterWheel?.slots ?? []).map((slot) => slot.name)) === wanted);
  const targets = new Map<string, string>();
  if (plan.targets.length > 0) {
    const mine = await db.select({ id: target.id, designation: target.designation }).from(target).where(eq(target.ownerId, ownerId));
    const byDesignation = new Map(mine.map((t) => [fold(t.designation), t.id]));
    for (const t of plan.targets) {
      const id = byDesignation.get(fold(t.designation));
      if (id) targets.set(t.id, id);
    }
  }
  return { site: s ? { id: s.id, name: s.name } : null, rig: r ? { id: r.id, name: r.name } : null, targets };
}

/** Plan framing id → the user's framing of the same name on a target they already had. */
async function matchFramings(tx: Tx, plan: Plan, matches: PlanMatches, framingIds: Map<string, string>): Promise<void> {
  const userTargetIds = [...new Set(matches.targets.values())];
  if (userTargetIds.length === 0) return;
  const theirs = await tx.select({ id: framing.id, targetId: framing.targetId, name: framing.name }).from(framing).where(inArray(framing.targetId, userTargetIds));
  for (const t of plan.targets) {
    const userTargetId = matches.targets.get(t.id);
    for (const f of t.framings) {
      const same = theirs.find((x) => x.targetId === userTargetId && fold(x.name) === fold(f.name));
      if (same) framingIds.set(f.id, same.id);
    }
  }
}

/** Creates the targets the user does not have, with their framings (fresh ids, remembered). */
async function createTargets(tx: Tx, ownerId: string, plan: Plan, matches: PlanMatches, framingIds: Map<string, string>): Promise<string[]> {
  const created: string[] = [];
  for (const t of plan.targets) {
    if (matches.targets.has(t.id)) continue;
    const { id: _planId, framings, ...facts } = t;
    const [row] = await tx.insert(target).values({ ...facts, ownerId, notes: '' }).returning({ id: target.id });
    matches.targets.set(t.id, row!.id);
    // A second plan target with the same designation reuses this one.
    for (const other of plan.targets) if (!matches.targets.has(other.id) && fold(other.designation) === fold(t.designation)) matches.targets.set(other.id, row!.id);
    created.push(t.designation);
    for (const f of framings) {
      const { id: planFramingId, ...values } = f;
      const [made] = await tx.insert(framing).values({ ...values, targetId: row!.id }).returning({ id: framing.id });
      framingIds.set(planFramingId, made!.id);
    }
  }
  return created;
}

export interface ImportOptions {
  createSite: boolean;
  createRig: boolean;
}

/**
 * Stores a validated plan for a user in one transaction: the recipe (its first revision), the
 * targets missing from their list, and the site and rig when they have no match and asked for
 * them (else the matching ones are linked). Any failure rolls everything back.
 */
export async function storeImport(db: Database, ownerId: string, plan: Plan, opts: ImportOptions) {
  return db.transaction(async (tx) => {
    const matches = await findMatches(tx, ownerId, plan);
    let siteId = matches.site?.id ?? null;
    if (!siteId && opts.createSite) {
      const existing = await tx.select({ id: site.id }).from(site).where(eq(site.ownerId, ownerId)).limit(1);
      const [row] = await tx.insert(site).values({ ...plan.site, isDefault: existing.length === 0, ownerId }).returning({ id: site.id });
      siteId = row!.id;
    }
    let rigId = matches.rig?.id ?? null;
    if (!rigId && opts.createRig) {
      const [row] = await tx.insert(rig).values({ ownerId, name: plan.rig.name, spec: plan.rig }).returning({ id: rig.id });
      rigId = row!.id;
    }
    const framingIds = new Map<string, string>();
    await matchFramings(tx, plan, matches, framingIds);
    const createdTargets = await createTargets(tx, ownerId, plan, matches, framingIds);
    const tree: RecipeTree = { children: remapPlanTree(plan.recipe.children, matches.targets, framingIds) };
    const row = await createRecipeIn(tx, { ownerId, name: plan.recipe.name, notes: plan.recipe.notes, rigId, siteId, tree });
    return {
      recipe: toRecipe(row),
      created: { site: siteId !== null && siteId !== matches.site?.id, rig: rigId !== null && rigId !== matches.rig?.id, targets: createdTargets },
      linked: { site: matches.site, rig: matches.rig },
    };
  });
}
