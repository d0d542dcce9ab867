import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import { bandOfFilter, findSlotByName, resolveFilter } from '@/shared/recipe/filters';
import { defaultNewId, type NewId } from '@/shared/recipe/ids';
import { copyRecipe } from '@/shared/recipe/starters';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

/*
 * Club templates are rig-agnostic trees. Filter references name a band ("Ha", "L") or, for a
 * filter of no standard band, the filter's own name; numbers that only make sense on one rig
 * (gain, offset, cooler rates, focuser step size, recorded rotator and focuser positions) are not copied; stages lose the publisher's
 * target id and keep, at most, a suggested target (designation and coordinates) beside the tree.
 */

type Wheel = Pick<RigInput, 'filterWheel'>;

/** The publisher's target of a stage, offered to whoever uses the template. */
export interface SuggestedTarget {
  designation: string;
  name: string;
  raDeg: number;
  decDeg: number;
}

export interface TemplateSnapshot {
  tree: RecipeTree;
  /** Filter references of the template, in order of first use. */
  bands: string[];
  /** Keyed by the template's stage id. */
  suggestedTargets: Record<string, SuggestedTarget>;
}

function omit<T extends object>(node: T, keys: string[]): T {
  const out = { ...node } as Record<string, unknown>;
  for (const k of keys) delete out[k];
  return out as T;
}

/** Rewrites every filter reference of a node (expose, centre, focus, flats) with `map`. */
function mapNodeFilters(node: RecipeNode, map: (ref: string) => string): RecipeNode {
  switch (node.kind) {
    case 'expose':
      return { ...node, filter: map(node.filter) };
    case 'centre':
    case 'focus':
      return node.filter === undefined ? node : { ...node, filter: map(node.filter) };
    case 'flats':
      return { ...node, filters: [...new Set(node.filters.map(map))] };
    default:
      return node;
  }
}

/** A node without its rig-specific numbers and the publisher's own references. */
function stripRigNumbers(node: RecipeNode): RecipeNode {
  switch (node.kind) {
    case 'expose':
    case 'darks':
      return omit(node, ['gain', 'offset']);
    case 'cool':
    case 'warm':
      return omit(node, ['maxRateCPerMin']);
    case 'focus':
      return { ...node, stepSize: D.focus.stepSize };
    case 'flats':
      // A recorded framing is the publisher's; recorded rotator and focuser positions are their rig's.
      return node.matchFramingOf?.kind === 'framing' || node.matchFramingOf?.kind === 'positions' ? omit(node, ['matchFramingOf']) : node;
    case 'stage':
      return { ...node, targetId: null };
    default:
      return node;
  }
}

/** The filter references of a tree, in order of first use. */
export function filterRefsOf(tree: RecipeTree): string[] {
  const refs = new Set<string>();
  const visit = (node: RecipeNode) => {
    mapNodeFilters(node, (ref) => (refs.add(ref), ref));
    if ('children' in node) node.children.forEach(visit);
  };
  tree.children.forEach(visit);
  return [...refs];
}

/**
 * A user's tree made rig-agnostic: filters by band (through the rig's slot bands, else the
 * name's spelling), rig numbers dropped, targets cleared. `targetOf` looks up a stage's target
 * to keep as a suggestion; without it targets are left open.
 */
export function toTemplateTree(tree: RecipeTree, opts: { rig?: Wheel | null; targetOf?: (id: string) => SuggestedTarget | undefined } = {}): TemplateSnapshot {
  const suggestedTargets: Record<string, SuggestedTarget> = {};
  const toBand = (ref: string) => {
    const band = bandOfFilter(ref, opts.rig ?? undefined);
    return band === 'custom' ? ref.trim() : band;
  };
  const visit = (node: RecipeNode): RecipeNode => {
    if (node.kind === 'stage' && node.targetId && opts.targetOf) {
      const t = opts.targetOf(node.targetId);
      if (t) suggestedTargets[node.id] = t;
    }
    const own = stripRigNumbers(mapNodeFilters(node, toBand));
    return 'children' in own ? ({ ...own, children: own.children.map(visit) } as RecipeNode) : own;
  };
  const out = { ...tree, children: tree.children.map(visit) };
  return { tree: out, bands: filterRefsOf(out), suggestedTargets };
}

export interface UseOptions {
  /** The rig the copy is for; null keeps the band names as filter names. */
  rig: Wheel | null;
  /** Band (template reference) → the user's filter name, overriding the automatic match. */
  bandMap?: Record<string, string>;
  /** Template stage id → the user's target id (null: left open). */
  targetIds?: Record<string, string | null>;
  newId?: NewId;
}

export interface UseResult {
  tree: RecipeTree;
  /** Template references with no filter in the rig and no `bandMap` entry. */
  unmapped: string[];
  /** `bandMap` entries naming no slot of the rig. */
  badMappings: string[];
}

/** A user's copy of a template tree: fresh ids, bands mapped to the rig's filters, targets set. */
export function fromTemplateTree(tree: RecipeTree, opts: UseOptions): UseResult {
  const unmapped = new Set<string>();
  const badMappings = new Set<string>();
  const bandMap = opts.bandMap ?? {};
  const map = (ref: string) => {
    const chosen = Object.hasOwn(bandMap, ref) ? bandMap[ref] : undefined;
    if (chosen !== undefined) {
      const slot = opts.rig ? findSlotByName(opts.rig, chosen) : undefined;
      if (opts.rig && !slot) badMappings.add(ref);
      return slot?.name ?? chosen;
    }
    if (!opts.rig) return ref;
    const slot = resolveFilter(opts.rig, ref);
    if (!slot) unmapped.add(ref);
    return slot?.name ?? ref;
  };
  const targets = opts.targetIds ?? {};
  const visit = (node: RecipeNode): RecipeNode => {
    let own = mapNodeFilters(node, map);
    if (own.kind === 'stage' && Object.hasOwn(targets, own.id)) own = { ...own, targetId: targets[own.id] ?? null };
    return 'children' in own ? ({ ...own, children: own.children.map(visit) } as RecipeNode) : own;
  };
  const mapped = { ...tree, children: tree.children.map(visit) };
  return { tree: copyRecipe(mapped, opts.newId ?? defaultNewId), unmapped: [...unmapped], badMappings: [...badMappings] };
}

/** Ids of every stage of a tree (the keys `targetIds` may use). */
export function stageIdsOf(tree: RecipeTree): string[] {
  const out: string[] = [];
  const visit = (node: RecipeNode) => {
    if (node.kind === 'stage') out.push(node.id);
    if ('children' in node) node.children.forEach(visit);
  };
  tree.children.forEach(visit);
  return out;
}
