import { summarizeNode } from '@/shared/recipe/summary';
import { countNodes, walk } from '@/shared/recipe/tree-read';
import type { RecipeNode } from '@/shared/recipe/types';
import type { Plan } from '@/shared/plan/schema';

/** One line of a recipe outline: how deep, what kind, the label and the step in words. */
export interface OutlineLine {
  depth: number;
  kind: RecipeNode['kind'];
  label: string | null;
  summary: string;
  enabled: boolean;
}

/** What the import screen shows before anything is stored. */
export interface PlanPreview {
  title: string;
  format: string;
  author: string;
  recipeName: string;
  nodeCount: number;
  nightDate: string;
  hasEstimate: boolean;
  /** The tree as lines (the first `OUTLINE_MAX`). */
  outline: OutlineLine[];
  targets: { designation: string; name: string; onYourList: boolean }[];
  site: { name: string; timeZone: string; latitudeDeg: number; longitudeDeg: number; matchId: string | null; matchName: string | null };
  rig: { name: string; filters: string[]; matchId: string | null; matchName: string | null };
}

export const OUTLINE_MAX = 300;

/** The recipe as indented lines in the trade's words (targets named by designation). */
export function planOutline(plan: Plan): OutlineLine[] {
  const names = new Map(plan.targets.map((t) => [t.id, t.designation]));
  const lines: OutlineLine[] = [];
  walk({ children: plan.recipe.children }, (node, info) => {
    if (lines.length >= OUTLINE_MAX) return 'stop';
    lines.push({ depth: info.depth, kind: node.kind, label: node.label || null, summary: summarizeNode(node, { targetName: (id) => names.get(id) }), enabled: node.enabled });
  });
  return lines;
}

/** The preview from a plan and what matched in the user's account. */
export function planPreview(plan: Plan, match: { siteId: string | null; siteName: string | null; rigId: string | null; rigName: string | null; targetOnList: (planTargetId: string) => boolean }): PlanPreview {
  return {
    title: plan.meta.title,
    format: plan.format,
    author: plan.meta.author,
    recipeName: plan.recipe.name,
    nodeCount: countNodes({ children: plan.recipe.children }),
    nightDate: plan.night.date,
    hasEstimate: plan.estimate !== undefined,
    outline: planOutline(plan),
    targets: plan.targets.map((t) => ({ designation: t.designation, name: t.name, onYourList: match.targetOnList(t.id) })),
    site: { name: plan.site.name, timeZone: plan.site.timeZone, latitudeDeg: plan.site.latitudeDeg, longitudeDeg: plan.site.longitudeDeg, matchId: match.siteId, matchName: match.siteName },
    rig: { name: plan.rig.name, filters: plan.rig.filterWheel.slots.map((s) => s.name), matchId: match.rigId, matchName: match.rigName },
  };
}

/**
 * The plan's tree with its references moved to the importing user's rows: stage targets (plan
 * target id → the user's target id) and flats that match a recorded framing (plan framing id →
 * the user's framing id). Node ids are kept: they are unique per tree, not per account.
 */
export function remapPlanTree(children: RecipeNode[], targetIds: ReadonlyMap<string, string>, framingIds: ReadonlyMap<string, string>): RecipeNode[] {
  return children.map((node): RecipeNode => {
    if (node.kind === 'stage') return { ...node, targetId: node.targetId === null ? null : (targetIds.get(node.targetId) ?? node.targetId), children: remapPlanTree(node.children, targetIds, framingIds) };
    if (node.kind === 'repeat' || node.kind === 'group') return { ...node, children: remapPlanTree(node.children, targetIds, framingIds) };
    if (node.kind === 'flats' && node.matchFramingOf?.kind === 'framing') {
      const framingId = framingIds.get(node.matchFramingOf.framingId) ?? node.matchFramingOf.framingId;
      return { ...node, matchFramingOf: { kind: 'framing', framingId } };
    }
    return node;
  });
}
