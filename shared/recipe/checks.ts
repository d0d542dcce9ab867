import { checkNode, type Emit, type Scope } from '@/shared/recipe/checks-node';
import type { CheckOptions, RecipeFinding } from '@/shared/recipe/checks-types';
import { CHECK_DEFAULTS } from '@/shared/recipe/defaults';
import { printablePath } from '@/shared/recipe/limits';
import { printableIndexes } from '@/shared/recipe/tree-read';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

export { RECIPE_CHECK_CODES, SEVERITY_ORDER, type CheckOptions, type FindingSeverity, type RecipeCheckCode, type RecipeFinding } from '@/shared/recipe/checks-types';

/** Light frames and dithers of one filter on one target (or one untargeted stage). */
interface DitherTally {
  firstNodeId: string;
  indexes: number[];
  filter: string;
  frames: number;
  dithers: number;
  openEnded: boolean;
  allNever: boolean;
}

interface Walk {
  opts: CheckOptions;
  findings: RecipeFinding[];
  tallies: Map<string, DitherTally>;
}

/**
 * Static checks of a recipe, before any ephemeris (recipe.md "Static checks"; trade-defaults.md
 * rules 3 and 11). Switched-off nodes and everything inside them are skipped, except for the
 * id check. Order: duplicate ids, then the per-node findings in document order, then dither
 * sanity per filter and target. Without a rig (or site) the checks that need one are skipped.
 */
export function checkRecipe(tree: RecipeTree, opts: CheckOptions = {}): RecipeFinding[] {
  const findings: RecipeFinding[] = [];
  findDuplicateIds(tree, findings);
  const walk: Walk = { opts, findings, tallies: new Map() };
  visitList(tree.children, [], { stage: null, explicitPointing: false, guided: false }, 1, false, walk);
  ditherFindings(walk);
  return findings;
}

function visitList(children: RecipeNode[], prefix: number[], scope: Scope, multiplier: number, openEnded: boolean, walk: Walk): void {
  children.forEach((node, i) => {
    if (!node.enabled) return;
    const indexes = [...prefix, i];
    const emit: Emit = (f) => walk.findings.push({ ...f, nodeId: node.id, path: printableIndexes(indexes) });
    checkNode(node, scope, walk.opts, emit);
    if (node.kind === 'stage') visitList(node.children, indexes, { stage: node, explicitPointing: false, guided: false }, multiplier, openEnded, walk);
    else if (node.kind === 'repeat') {
      const count = node.until?.count;
      const bounded = count !== undefined && Number.isInteger(count) && count >= 1;
      visitList(node.children, indexes, scope, bounded ? multiplier * count : multiplier, openEnded || !bounded, walk);
    } else if (node.kind === 'group') visitList(node.children, indexes, scope, multiplier, openEnded, walk);
    else if (node.kind === 'slew' && node.to.kind === 'radec') scope.explicitPointing = true;
    else if (node.kind === 'guide') scope.guided = true;
    else if (node.kind === 'expose') tally(node, indexes, scope, multiplier, openEnded, walk.tallies);
  });
}

function tally(node: Extract<RecipeNode, { kind: 'expose' }>, indexes: number[], scope: Scope, multiplier: number, openEnded: boolean, tallies: Map<string, DitherTally>): void {
  const target = scope.stage ? (scope.stage.targetId ?? scope.stage.id) : 'outside-stages';
  const key = `${target}\u0000${node.filter.trim().toLowerCase()}`;
  const frames = node.count * multiplier;
  const dithers = node.ditherEvery > 0 ? Math.floor(frames / node.ditherEvery) : 0;
  let t = tallies.get(key);
  if (!t) {
    t = { firstNodeId: node.id, indexes, filter: node.filter, frames: 0, dithers: 0, openEnded: false, allNever: true };
    tallies.set(key, t);
  }
  t.frames += frames;
  t.dithers += dithers;
  t.openEnded ||= openEnded;
  t.allNever &&= node.ditherEvery === 0;
}

/**
 * Dither sanity (trade-defaults.md rule 11: at least 12 dithers per filter; S13, common
 * practice): flagged when a denser cadence would give more dithers. Open-ended repeats have
 * no frame count before the dry run, so there only "never dither" is flagged.
 */
function ditherFindings(walk: Walk): void {
  const min = walk.opts.minDithersPerFilter ?? CHECK_DEFAULTS.minDithersPerFilter;
  for (const t of walk.tallies.values()) {
    const path = printableIndexes(t.indexes);
    const base = { code: 'dither-sanity' as const, severity: 'info' as const, nodeId: t.firstNodeId, path };
    if (t.openEnded) {
      if (t.allNever) walk.findings.push({ ...base, message: `${t.filter} frames are never dithered`, fix: `Dither every frame or every few frames: at least ${min} dithers per filter is common practice` });
      continue;
    }
    if (t.dithers >= min || t.dithers >= t.frames) continue;
    const every = Math.max(1, Math.floor(t.frames / min));
    walk.findings.push({ ...base, message: `Only ${t.dithers} dithers across ${t.frames} ${t.filter} frames; at least ${min} per filter is common practice`, fix: `Dither every ${every === 1 ? 'frame' : `${every} frames`}` });
  }
}

/** `duplicate-id` for every node or rule whose id occurred earlier in document order. */
function findDuplicateIds(tree: RecipeTree, findings: RecipeFinding[]): void {
  const seen = new Set<string>();
  const check = (id: string, path: (string | number)[], what: string) => {
    if (!seen.has(id)) return void seen.add(id);
    findings.push({ code: 'duplicate-id', severity: 'stop', nodeId: id, path: printablePath(path), message: `This ${what} has the same id as an earlier one`, fix: 'Give the copy a fresh id (duplicate steps instead of copying their ids)' });
  };
  const visit = (children: RecipeNode[], prefix: (string | number)[]) =>
    children.forEach((node, i) => {
      const path = [...prefix, i];
      check(node.id, path, node.kind);
      if (!('children' in node)) return;
      node.rules.forEach((rule, r) => check(rule.id, [...path, 'rules', r], 'rule'));
      visit(node.children, [...path, 'children']);
    });
  visit(tree.children, ['children']);
}
