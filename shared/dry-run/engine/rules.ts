import { RECIPE_DEFAULTS } from '@/shared/recipe/defaults';
import type { FilterSlot } from '@/shared/rig/schema';
import { ambientTempC } from '@/shared/dry-run/models/cooling';
import { driftArcmin } from '@/shared/dry-run/models/drift';
import { FOCUS_MODEL } from '@/shared/dry-run/models/focus';
import { flipSoon } from '@/shared/dry-run/engine/meridian';
import { centreNow, focusNow } from '@/shared/dry-run/engine/mount-steps';
import type { Ended, Scope, ScopedRule } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm, n } from '@/shared/dry-run/engine/text';

/**
 * Why a refocus is due now under the container rules, or null: `refocus-on-temperature`
 * (ambient from the dusk→dawn curve moved by ≥ deltaC since the last focus),
 * `refocus-on-interval` (minutes or light frames since the last focus). With no focus yet
 * tonight, any refocus rule asks for one.
 */
function refocusReason(sim: Sim, rules: ScopedRule[]): { reason: string; ownerId: string } | null {
  const last = sim.lastFocus;
  const nowC = ambientTempC(sim.sky.ambient, sim.t);
  for (const { rule, ownerId } of rules) {
    if (rule.kind === 'recentre-on-drift') continue;
    if (!last) return { reason: 'no focus yet tonight', ownerId };
    if (rule.kind === 'refocus-on-temperature' && Math.abs(nowC - last.tempC) >= rule.deltaC) return { reason: `${n(Math.abs(nowC - last.tempC))} °C since the last focus`, ownerId };
    if (rule.kind !== 'refocus-on-interval') continue;
    const { minutes, frames } = rule.every;
    if (minutes !== undefined && sim.t - last.ms >= minutes * 60_000) return { reason: `${n(minutes)} min since the last focus`, ownerId };
    if (frames !== undefined && last.frames >= frames) return { reason: `${frames} frames since the last focus`, ownerId };
  }
  return null;
}

/**
 * Rule actions before a light frame, inserted into the timeline: a refocus (postponed while a
 * flip is less than 10 minutes away, rule 2) and a re-centre once the modelled drift reaches
 * `driftArcmin` (drift.ts). Without a temperature rule, a change beyond 1 °C since the last
 * focus is `focus-drift`.
 */
export function ruleActions(sim: Sim, scope: Scope, slot: FilterSlot | undefined, flush: () => void): Ended | null {
  const refocus = refocusReason(sim, scope.rules);
  if (refocus && !flipSoon(sim, scope, sim.t)) {
    flush();
    const params = scope.stage?.focus ?? { points: RECIPE_DEFAULTS.focus.points, exposureS: RECIPE_DEFAULTS.focus.exposureS };
    const ended = focusNow(sim, scope, params, slot, refocus.ownerId, `Refocus (rule: ${refocus.reason})`);
    if (ended) return ended;
  }
  if (!scope.rules.some((r) => r.rule.kind === 'refocus-on-temperature')) checkFocusDrift(sim, scope);
  return recentre(sim, scope, flush);
}

function recentre(sim: Sim, scope: Scope, flush: () => void): Ended | null {
  if (sim.lastCentreMs === null || sim.pointing.kind !== 'radec') return null;
  const drift = driftArcmin((sim.t - sim.lastCentreMs) / 1000, sim.guiding);
  for (const { rule, ownerId } of scope.rules) {
    if (rule.kind !== 'recentre-on-drift' || drift < rule.driftArcmin) continue;
    flush();
    const centre = scope.stage?.centre ?? RECIPE_DEFAULTS.centre;
    return centreNow(sim, scope, { ...centre, errorArcsec: drift * 60 }, ownerId, `Re-centre (rule: ${n(drift)}′ drift)`);
  }
  return null;
}

function checkFocusDrift(sim: Sim, scope: Scope): void {
  const last = sim.lastFocus;
  if (!last) return;
  const moved = Math.abs(ambientTempC(sim.sky.ambient, sim.t) - last.tempC);
  if (moved <= FOCUS_MODEL.driftLimitC) return;
  const owner = scope.stage?.node.id ?? null;
  sim.out.finding({ code: 'focus-drift', severity: 'warn', ms: sim.t, nodeId: owner, message: `By ${hhmm(sim, sim.t)} the air temperature has changed by ${n(moved)} °C since the last focus at ${hhmm(sim, last.ms)}, with no refocus rule`, fix: 'Add a refocus-on-temperature rule (1 °C is usual) to the stage, or a focus step' });
}
