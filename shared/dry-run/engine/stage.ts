import { RECIPE_DEFAULTS } from '@/shared/recipe/defaults';
import type { RecipeNode, StageNode } from '@/shared/recipe/types';
import { childScope, hasSkyFlats, scopedRules, type Deadline, type Ended, type Scope, type StageCtx } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm, n, whenText } from '@/shared/dry-run/engine/text';
import { waitUntil } from '@/shared/dry-run/engine/wait';

type RunList = (sim: Sim, children: RecipeNode[], scope: Scope) => Ended | null;

/** Rule 6 (trade-defaults.md): warn when less than this many usable minutes remain. */
const MIN_USABLE_MIN = 60;

/** The stage's pointing: its own framing, else the target's first framing, else the target. */
function stageCtx(sim: Sim, node: StageNode): StageCtx | null {
  const target = node.targetId === null ? undefined : sim.input.targets[node.targetId];
  const framing = node.framing ?? target?.framings?.[0];
  const raDeg = framing?.raDeg ?? target?.raDeg;
  const decDeg = framing?.decDeg ?? target?.decDeg;
  if (raDeg === undefined || decDeg === undefined) return null;
  return {
    node,
    targetId: node.targetId,
    name: target ? target.name || target.designation : 'the stage framing',
    raDeg,
    decDeg,
    framingPaDeg: framing?.positionAngleDeg ?? 0,
    sky: sim.sky.target(raDeg, decDeg),
    limitDeg: node.window.minAltitudeDeg ?? sim.site.minAltitudeDeg,
    policy: null,
    policyNodeId: null,
    restoreRotation: false,
    focus: { points: RECIPE_DEFAULTS.focus.points, exposureS: RECIPE_DEFAULTS.focus.exposureS },
    centre: { ...RECIPE_DEFAULTS.centre },
    reported: new Set(),
  };
}

/**
 * A stage: waits for `notBefore`, then for its target to clear the minimum altitude and the
 * horizon profile; runs its steps with two deadlines (the window's `endBy`, and the target
 * sinking below its limit: nothing starts that would end past either; a running frame
 * finishes only if it fits). A target that never clears its limit in the window is skipped.
 */
export function runStage(sim: Sim, node: StageNode, scope: Scope, runList: RunList): Ended | null {
  const ctx = stageCtx(sim, node);
  if (!ctx) {
    if (node.targetId !== null) sim.out.finding({ code: 'no-target', severity: 'stop', ms: sim.t, nodeId: node.id, message: `The stage's target (${node.targetId}) is not in the target list`, fix: 'Choose a target from your list for the stage' });
    sim.out.addStageFinish(node.id, null, null);
    return null;
  }
  const before = notBefore(sim, node, scope);
  if (before) return finish(sim, node, null, before);
  const endByMs = node.window.endBy === undefined ? null : sim.sky.whenMs(node.window.endBy);
  const deadlines: Deadline[] = [{ ownerId: node.id, reason: 'altitude', at: (ms) => ctx.sky.firstBelow(ctx.limitDeg, true, ms) ?? Infinity }];
  if (endByMs !== null) deadlines.unshift({ ownerId: node.id, reason: 'window', at: () => endByMs });
  const risen = awaitTarget(sim, ctx, scope, endByMs);
  if (risen !== true) return finish(sim, node, null, risen);
  const startMs = sim.t;
  checkUsableTime(sim, ctx);
  const inner = childScope(scope, { stage: ctx, deadlines, rules: scopedRules(node), skyFlats: scope.skyFlats || hasSkyFlats(node.children) });
  const ended = runList(sim, node.children, inner);
  if (ended?.ownerId === node.id && ended.reason === 'altitude' && !ended.openEnded) {
    sim.out.finding({ code: 'low-altitude', severity: 'warn', ms: ended.atMs, nodeId: node.id, message: `${ctx.name} sinks below ${n(ctx.limitDeg)}° at ${hhmm(sim, ended.atMs)}: the stage ends before all its steps are done`, fix: 'Start the stage earlier, take fewer frames, or image until the target sinks (a repeat until its altitude)' });
  }
  return finish(sim, node, startMs, ended);
}

function finish(sim: Sim, node: StageNode, startMs: number | null, ended: Ended | null): Ended | null {
  sim.out.addStageFinish(node.id, startMs, startMs === null ? null : sim.t);
  return ended && ended.ownerId !== node.id ? ended : null;
}

/** Waits for the window's `notBefore` (a fixed time: its slack is recorded). */
function notBefore(sim: Sim, node: StageNode, scope: Scope): Ended | null {
  if (node.window.notBefore === undefined) return null;
  const ms = sim.sky.whenMs(node.window.notBefore);
  if (ms === null) return null;
  sim.out.addSlack(node.id, ms, sim.t);
  return waitUntil(sim, scope, ms, node.id, `Wait for ${whenText(sim, node.window.notBefore, ms)} (stage window)`);
}

/**
 * True once the target is above its limit (after waiting for it to rise); otherwise the stage
 * is skipped: `never-rises` when it never clears the horizon tonight, `low-altitude` when it
 * does not clear the minimum altitude before the window or the night ends.
 */
function awaitTarget(sim: Sim, ctx: StageCtx, scope: Scope, endByMs: number | null): true | Ended | null {
  const { sky, limitDeg, name, node } = ctx;
  if (sky.marginDeg(sim.t, limitDeg, true) >= 0) return true;
  const untilMs = Math.min(endByMs ?? Infinity, sim.sky.spanEndMs);
  const rise = sky.firstAbove(limitDeg, true, sim.t, untilMs);
  if (rise !== null) {
    const ended = waitUntil(sim, scope, rise, node.id, `Wait for ${name} to clear ${n(limitDeg)}°`);
    return ended ?? true;
  }
  const night = sim.sky.night;
  const from = night.sunset ? Date.parse(night.sunset) : sim.sky.spanStartMs;
  const to = night.sunrise ? Date.parse(night.sunrise) : sim.sky.spanEndMs;
  if (sky.firstAbove(0, true, from, to) === null) {
    sim.out.finding({ code: 'never-rises', severity: 'stop', ms: sim.t, nodeId: node.id, message: `${name} never rises above the horizon tonight: the stage is skipped`, fix: 'Choose a target that is up tonight, or move the stage to a season when it is' });
  } else {
    sim.out.finding({ code: 'low-altitude', severity: 'warn', ms: sim.t, nodeId: node.id, message: `${name} does not clear ${n(limitDeg)}° (minimum altitude or horizon) from ${hhmm(sim, sim.t)} before the stage's end: the stage is skipped`, fix: 'Move the stage to when the target is high, lower the minimum altitude, or choose another target' });
  }
  return null;
}

/** Rule 6: warn when less than 60 minutes remain before the target sinks or darkness ends. */
function checkUsableTime(sim: Sim, ctx: StageCtx): void {
  const sinks = ctx.sky.firstBelow(ctx.limitDeg, true, sim.t) ?? Infinity;
  const usableMin = (Math.min(sinks, sim.sky.darkEndMs) - sim.t) / 60_000;
  if (usableMin >= MIN_USABLE_MIN) return;
  const why = sinks < sim.sky.darkEndMs ? `before it sinks below ${n(ctx.limitDeg)}°` : 'before darkness ends';
  sim.out.finding({ code: 'low-altitude', severity: 'warn', ms: sim.t, nodeId: ctx.node.id, message: `Only ${Math.max(0, Math.round(usableMin))} usable minutes of ${ctx.name} remain from ${hhmm(sim, sim.t)} ${why}`, fix: 'Start the stage earlier, or give the time to a target that is higher now' });
}
