import type { DryRunInput, DryRunResult } from '@/shared/dry-run/types';
import { pathOf, walk } from '@/shared/recipe/tree-read';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { isoWithOffset } from '@/shared/time';
import type { PlanEstimate, PlanFilterTotal, PlanStageEstimate } from '@/shared/plan/estimate-schema';
import type { Plan } from '@/shared/plan/schema';

const round = (value: number, digits: number) => Number(value.toFixed(digits));
const local = (iso: string | null, timeZone: string) => (iso ? isoWithOffset(iso, timeZone) : null);

function nodesById(tree: RecipeTree): Map<string, RecipeNode> {
  const byId = new Map<string, RecipeNode>();
  walk(tree, (node) => void byId.set(node.id, node));
  return byId;
}

/** Frames and shutter-open seconds per filter in order of first use, from the expose events. */
function framesByFilter(events: DryRunResult['timeline'], nodes: Map<string, RecipeNode>): PlanFilterTotal[] {
  const byFilter = new Map<string, { frames: number; seconds: number }>();
  for (const e of events) {
    if (e.kind !== 'expose' || !e.filter || !e.frames) continue;
    const node = e.nodeId ? nodes.get(e.nodeId) : undefined;
    const t = byFilter.get(e.filter) ?? { frames: 0, seconds: 0 };
    t.frames += e.frames;
    t.seconds += node?.kind === 'expose' ? e.frames * node.exposureS : 0;
    byFilter.set(e.filter, t);
  }
  return [...byFilter].map(([filter, t]) => ({ filter, frames: t.frames, seconds: round(t.seconds, 1) }));
}

/**
 * The timeline summary: one row per stage that ran, with its start and end in the site's zone
 * and the light frames and shutter-open seconds it took per filter.
 */
export function stageSummary(result: DryRunResult, tree: RecipeTree, targets: DryRunInput['targets'], timeZone: string): PlanStageEstimate[] {
  const nodes = nodesById(tree);
  return result.totals.stageFinish.map((s) => {
    const path = pathOf(tree, s.nodeId)?.path ?? '';
    const node = nodes.get(s.nodeId);
    const designation = node?.kind === 'stage' && node.targetId ? targets[node.targetId]?.designation : undefined;
    const events = result.timeline.filter((e) => e.path !== null && (e.path === path || e.path.startsWith(`${path}.`)));
    return { nodeId: s.nodeId, path, name: node?.label || designation || 'Stage', start: local(s.start, timeZone), end: local(s.end, timeZone), frames: framesByFilter(events, nodes) };
  });
}

/** Shutter-open frames and seconds per filter over all targets, in order of first use. */
function integrationByFilter(result: DryRunResult, tree: RecipeTree): PlanFilterTotal[] {
  const order = framesByFilter(result.timeline, nodesById(tree)).map((f) => f.filter);
  const sums = new Map<string, { frames: number; seconds: number }>();
  for (const byFilter of Object.values(result.totals.integrationByTargetAndFilter)) {
    for (const [filter, t] of Object.entries(byFilter)) {
      const sum = sums.get(filter) ?? { frames: 0, seconds: 0 };
      sums.set(filter, { frames: sum.frames + t.frames, seconds: sum.seconds + t.seconds });
    }
  }
  const rank = (f: string) => (order.includes(f) ? order.indexOf(f) : order.length);
  return [...sums].sort(([a], [b]) => rank(a) - rank(b) || a.localeCompare(b)).map(([filter, t]) => ({ filter, frames: t.frames, seconds: round(t.seconds, 1) }));
}

/** The plan's `estimate` section from a dry run of its recipe (times in the site's zone). */
export function planEstimate(result: DryRunResult, input: DryRunInput, generatedAt: Date): PlanEstimate {
  const zone = input.site.timeZone;
  return {
    generatedAt: isoWithOffset(generatedAt, zone),
    nightDate: input.nightDate,
    nightEnd: local(result.totals.nightEnd, zone),
    efficiency: round(Math.min(1, Math.max(0, result.totals.efficiency)), 3),
    shutterOpenS: round(result.totals.shutterOpenS, 1),
    integrationByFilter: integrationByFilter(result, input.tree),
    stages: stageSummary(result, input.tree, input.targets, zone),
    findings: result.findings.map((f) => ({ code: f.code, severity: f.severity, time: local(f.time, zone), path: f.path, message: f.message, fix: f.fix })),
  };
}

/** What the dry-run engine needs, all from the plan: site, rig, targets; the night from `date` or the plan. */
export function planDryRunInput(plan: Plan, date?: string): DryRunInput {
  const targets: DryRunInput['targets'] = {};
  for (const t of plan.targets) targets[t.id] = { designation: t.designation, name: t.name, raDeg: t.raDeg, decDeg: t.decDeg, framings: t.framings };
  return { tree: { children: plan.recipe.children }, rig: plan.rig, site: plan.site, nightDate: date ?? plan.night.date, targets, darkLibrary: [] };
}
