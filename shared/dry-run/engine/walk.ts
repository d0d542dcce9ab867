import type { RecipeNode, RepeatNode } from '@/shared/recipe/types';
import { meridianGate } from '@/shared/dry-run/engine/meridian';
import { childScope, earliestDeadline, hasSkyFlats, scopedRules, type Deadline, type Ended, type Scope } from '@/shared/dry-run/engine/scope';
import { runStage } from '@/shared/dry-run/engine/stage';
import type { Sim } from '@/shared/dry-run/engine/state';
import { runStep } from '@/shared/dry-run/engine/steps';
import { hhmm } from '@/shared/dry-run/engine/text';

/** Loops without a count stop here whatever happens (the static limit on counts is 10,000). */
export const MAX_OPEN_ITERATIONS = 20_000;

const ENDLESS_FIX = 'Give the repeat an end that happens tonight: a count, a clock time, astronomical dawn, or an altitude the target really sinks below; or put it in a stage that ends by a time';

/** Runs a list of nodes in order; stops at the first that ends an enclosing container. */
export function runList(sim: Sim, children: RecipeNode[], scope: Scope): Ended | null {
  for (const node of children) {
    if (!node.enabled) continue;
    const ended = runNode(sim, node, scope);
    if (ended) return ended;
  }
  return null;
}

function runNode(sim: Sim, node: RecipeNode, scope: Scope): Ended | null {
  if (node.kind === 'stage') return runStage(sim, node, scope, runList);
  if (node.kind === 'repeat') return runRepeat(sim, node, scope);
  if (node.kind === 'group') return runList(sim, node.children, childScope(scope, { rules: scopedRules(node), skyFlats: scope.skyFlats || hasSkyFlats(node.children) }));
  return meridianGate(sim, scope) ?? runStep(sim, node, scope);
}

/**
 * A repeat loops until its count, or until its end condition holds (checked before every
 * iteration and, as a deadline, before every step inside: nothing starts that would end past it).
 * An end that never comes tonight with no enclosing window is `endless-repeat`; the loop is then
 * capped at the end of darkness. An iteration that takes no time ends the loop the same way.
 */
function runRepeat(sim: Sim, node: RepeatNode, scope: Scope): Ended | null {
  const own = repeatDeadline(sim, node, scope);
  const count = node.until.count;
  const inner = childScope(scope, { deadlines: own ? [own] : [], rules: scopedRules(node), openEnded: count === undefined || scope.openEnded, skyFlats: scope.skyFlats || hasSkyFlats(node.children) });
  const cap = count ?? MAX_OPEN_ITERATIONS;
  for (let i = 0; i < cap; i += 1) {
    if (own && sim.t >= own.at(sim.t)) return null;
    const before = sim.t;
    const ended = runList(sim, node.children, inner);
    if (ended) return ended.ownerId === node.id ? null : ended;
    if (sim.t === before && count === undefined) {
      sim.out.finding({ code: 'endless-repeat', severity: 'stop', ms: sim.t, nodeId: node.id, message: `This repeat makes no progress from ${hhmm(sim, sim.t)}: nothing inside takes time, so it would loop for ever`, fix: ENDLESS_FIX });
      return null;
    }
  }
  if (count === undefined) sim.out.finding({ code: 'endless-repeat', severity: 'stop', ms: sim.t, nodeId: node.id, message: `This repeat was stopped after ${cap} rounds`, fix: ENDLESS_FIX });
  return null;
}

/** The repeat's own end as a deadline (null for a count); unreachable ends get a cap and a finding. */
function repeatDeadline(sim: Sim, node: RepeatNode, scope: Scope): Deadline | null {
  const u = node.until;
  if (u.count !== undefined) return null;
  let at: ((ms: number) => number) | null = null;
  let why = '';
  if (u.clock !== undefined || u.sunEvent !== undefined) {
    const text = (u.clock ?? u.sunEvent)!;
    const ms = sim.sky.whenMs(text);
    if (ms !== null) at = () => ms;
    else why = `${text.replace('-', ' ')} does not happen tonight`;
  } else if (u.altitudeBelowDeg !== undefined) {
    const sky = scope.stage?.sky;
    const limit = u.altitudeBelowDeg;
    if (sky && sky.firstBelow(limit, false, sim.t) !== null) at = (ms) => sky.firstBelow(limit, false, ms) ?? Infinity;
    else why = sky ? `${scope.stage!.name} stays above ${limit}° all night` : 'it is not in a stage with a target';
  }
  if (at) return { ownerId: node.id, reason: 'until', at };
  const enclosing = earliestDeadline({ ...scope, deadlines: scope.deadlines.filter((d) => d.reason !== 'night') }, sim.t);
  if (enclosing && enclosing.at < sim.sky.spanEndMs) return null;
  sim.out.finding({ code: 'endless-repeat', severity: 'stop', ms: sim.t, nodeId: node.id, message: `This repeat never ends tonight: ${why}. The dry run stops it at the end of darkness`, fix: ENDLESS_FIX });
  const capMs = sim.sky.darkEndMs;
  return { ownerId: node.id, reason: 'cap', at: () => capMs };
}
