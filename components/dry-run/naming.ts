import type { StageNaming } from '@/components/dry-run/timeline-rows';
import { summarizeNode } from '@/shared/recipe/summary';
import { printableIndexes, walk } from '@/shared/recipe/tree-read';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

export type TargetFacts = { id: string; designation: string; name: string; raDeg: number; decDeg: number };

export type Naming = StageNaming & {
  /** "NGC 7000" (or the name when there is no designation). */
  targetLabel: (targetId: string) => string;
  /** The common name under the designation, '' when none. */
  targetName: (targetId: string) => string;
  /** "NGC 7000 › L 5 × 180 s" for a step, from the recipe as it is now; the path when the step is gone. */
  stepLabel: (nodeId: string | null, path: string | null) => string;
  /** The target a stage of the recipe points at, if any. */
  stageTarget: (stageId: string) => string | null;
};

type Placed = { node: RecipeNode; path: string; stageTargetId: string | null };

function placeNodes(tree: RecipeTree | undefined): Map<string, Placed> {
  const placed = new Map<string, Placed>();
  if (!tree) return placed;
  const stageTarget = new Map<string, string | null>();
  walk(tree, (node, info) => {
    const inherited = info.parent ? (stageTarget.get(info.parent.id) ?? null) : null;
    const own = node.kind === 'stage' ? node.targetId : inherited;
    stageTarget.set(node.id, own);
    placed.set(node.id, { node, path: printableIndexes(info.indexes), stageTargetId: own });
  });
  return placed;
}

/** Display names for the dry run's ids, from the recipe tree and the user's targets. */
export function makeNaming(tree: RecipeTree | undefined, targets: readonly TargetFacts[] | undefined): Naming {
  const byId = new Map((targets ?? []).map((t) => [t.id, t]));
  const placed = placeNodes(tree);
  const targetLabel = (id: string) => {
    const t = byId.get(id);
    return t ? t.designation || t.name : 'Target';
  };
  const targetName = (id: string) => {
    const t = byId.get(id);
    return t && t.designation && t.name !== t.designation ? t.name : '';
  };
  return {
    targetLabel,
    targetName,
    pathOf: (stageId) => placed.get(stageId)?.path,
    stageTarget: (stageId) => {
      const node = placed.get(stageId)?.node;
      return node?.kind === 'stage' ? node.targetId : null;
    },
    nameOf: (stageId, eventTargetId) => {
      const p = placed.get(stageId);
      // The recipe knows the stage's target; the events only tell it for a stage that is gone since.
      const targetId = (p?.node.kind === 'stage' ? p.node.targetId : null) ?? eventTargetId;
      const label = p?.node.label || (targetId ? targetLabel(targetId) : 'Stage');
      const detail = targetId ? (p?.node.label ? targetLabel(targetId) : targetName(targetId)) : p ? 'Own pointing' : 'No longer in the recipe';
      return { label, detail };
    },
    stepLabel: (nodeId, path) => {
      const p = nodeId ? placed.get(nodeId) : undefined;
      if (!p) return path ? `Step at ${path}` : 'The whole recipe';
      const own = p.node.label || summarizeNode(p.node, { targetName: targetLabel });
      const stage = p.stageTargetId && p.node.kind !== 'stage' ? `${targetLabel(p.stageTargetId)} › ` : '';
      return `${stage}${own}`;
    },
  };
}
