import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import { createNode } from '@/shared/recipe/factory';
import { findSlotByBand } from '@/shared/recipe/filters';
import { cloneWithFreshIds, defaultNewId, type NewId } from '@/shared/recipe/ids';
import type { Recipe, RecipeNode, RecipeTree, StageNode } from '@/shared/recipe/types';
import type { FilterBand, RigInput } from '@/shared/rig/schema';

type StarterRig = Pick<RigInput, 'filterWheel' | 'rotator' | 'mount' | 'guider'>;

export interface StarterOptions {
  rig: StarterRig;
  targets: { id: string; name: string }[];
  name?: string;
  rigId?: string | null;
  siteId?: string | null;
  newId?: NewId;
}

/** An empty recipe to start from. */
export function emptyRecipe(name = 'New recipe'): Recipe {
  return { name, notes: '', rigId: null, siteId: null, tree: { children: [] } };
}

const BROADBAND: FilterBand[] = ['L', 'R', 'G', 'B'];
const NARROWBAND: FilterBand[] = ['Ha', 'OIII', 'SII'];

/**
 * The filters a starter exposes through: the wheel's LRGB slots when it has any, else its
 * narrowband slots, else every slot (Nightloom choice: broadband first, as most wheels hold it).
 */
export function starterFilters(rig: Pick<RigInput, 'filterWheel'>): string[] {
  for (const set of [BROADBAND, NARROWBAND]) {
    const names = set.map((band) => findSlotByBand(rig, band)?.name).filter((s): s is string => s !== undefined);
    if (names.length > 0) return names;
  }
  return rig.filterWheel.slots.map((s) => s.name);
}

/** One target's stage: slew, centre, rotate, focus, guide, meridian policy, then a repeat of subs. */
function starterStage(rig: StarterRig, targetId: string | null, filters: string[], newId: NewId): StageNode {
  const make = { newId, rig };
  const children: RecipeNode[] = [createNode('slew', {}, make), createNode('centre', {}, make)];
  if (rig.rotator.present) children.push(createNode('rotate', {}, make));
  children.push(createNode('focus', { filter: filters[0] }, make));
  if (rig.guider.present) children.push(createNode('guide', {}, make));
  if (rig.mount.type === 'german-equatorial') children.push(createNode('meridian', {}, make));
  const exposes = filters.map((filter) => createNode('expose', { filter }, make));
  children.push({ ...createNode('repeat', { until: { altitudeBelowDeg: 30 } }, make), children: exposes });
  const rules = [
    { id: newId(), kind: 'refocus-on-temperature' as const, deltaC: D.rules.refocusDeltaC },
    { id: newId(), kind: 'refocus-on-interval' as const, every: { minutes: D.rules.refocusEveryMinutes } },
  ];
  const window = { notBefore: 'astronomical-dusk', endBy: 'astronomical-dawn', minAltitudeDeg: 30 };
  return { ...createNode('stage', { targetId, window }, make), children, rules };
}

/**
 * A starting recipe for a rig and a list of targets: cool → one stage per target → warm →
 * park. Each stage slews to its target, centres, rotates to the framing (with a rotator),
 * focuses, guides (with a guider), sets a flip policy (German mounts) and repeats subs through
 * the rig's filters until the target sinks below 30° (S27); the stage ends by astronomical
 * dawn. Rules on each stage: refocus every 1 °C and every 60 min (practice; S14).
 * Without targets it holds one stage for the user to fill in.
 */
export function starterRecipe(opts: StarterOptions): Recipe {
  const newId = opts.newId ?? defaultNewId;
  const filters = starterFilters(opts.rig);
  const targets = opts.targets.length > 0 ? opts.targets : [{ id: null, name: '' }];
  const stages = targets.map((t) => starterStage(opts.rig, t.id, filters, newId));
  const children: RecipeNode[] = [createNode('cool', {}, { newId }), ...stages, createNode('warm', {}, { newId }), createNode('park', {}, { newId })];
  const names = opts.targets.map((t) => t.name).filter(Boolean);
  const name = opts.name ?? (names.length > 0 ? `Starter: ${names.join(', ')}`.slice(0, 80) : 'Starter recipe');
  return { name, notes: '', rigId: opts.rigId ?? null, siteId: opts.siteId ?? null, tree: { children } };
}

/**
 * A copy of a tree with fresh ids for every node and rule (e.g. a club template taken into
 * one's own recipes). References between copied nodes follow the copy.
 */
export function copyRecipe(tree: RecipeTree, newId: NewId = defaultNewId): RecipeTree {
  const idMap = new Map<string, string>();
  const renamed = tree.children.map((node) => cloneWithFreshIds(node, newId, idMap));
  // A second pass so references to stages copied later in the list follow too.
  return { ...tree, children: renamed.map((node) => cloneRefsOnly(node, idMap)) };
}

function cloneRefsOnly(node: RecipeNode, idMap: Map<string, string>): RecipeNode {
  if (node.kind === 'flats' && node.matchFramingOf?.kind === 'stage') {
    const stageId = idMap.get(node.matchFramingOf.stageId);
    return stageId ? { ...node, matchFramingOf: { kind: 'stage', stageId } } : node;
  }
  return 'children' in node ? { ...node, children: node.children.map((c) => cloneRefsOnly(c, idMap)) } : node;
}
