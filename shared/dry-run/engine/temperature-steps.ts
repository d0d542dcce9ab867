import type { NodeOf } from '@/shared/recipe/types';
import { ambientTempC, planCoolDown, temperatureChangeS } from '@/shared/dry-run/models/cooling';
import { act } from '@/shared/dry-run/engine/act';
import type { Ended, Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm, n } from '@/shared/dry-run/engine/text';

/**
 * Cools the sensor toward the set-point at the step's (or the camera's) rate, no colder than the
 * ambient of the moment minus the camera's largest drop; `not-cooled` when the set-point is out
 * of reach (rule 3). An uncooled camera (largest drop 0) skips the step.
 */
export function runCool(sim: Sim, node: NodeOf<'cool'>, scope: Scope): Ended | null {
  const cooling = sim.rig.camera.cooling;
  if (cooling.maxDeltaBelowAmbientC === 0) return null;
  const ambient = ambientTempC(sim.sky.ambient, sim.t);
  const plan = planCoolDown(sim.sensorC, node.setpointC, ambient, cooling.maxDeltaBelowAmbientC, node.maxRateCPerMin ?? cooling.rateCPerMin);
  const ended = act(sim, scope, 'cool', plan.durationS, node.id, `Cool from ${n(sim.sensorC)} °C to ${n(plan.reachedC)} °C`);
  if (ended) return ended;
  if (!plan.reachable) {
    sim.out.finding({ code: 'not-cooled', severity: 'warn', ms: sim.t, nodeId: node.id, message: `At ${hhmm(sim, sim.t)} the camera reaches only ${n(plan.reachedC)} °C (ambient ${n(ambient)} °C − ${n(cooling.maxDeltaBelowAmbientC)} °C), not the set-point ${n(node.setpointC)} °C`, fix: `Set the set-point to ${n(Math.ceil(plan.reachedC))} °C or warmer, with darks at that temperature` });
  }
  Object.assign(sim, { sensorC: plan.reachedC, cooled: true, setpointC: plan.reachedC });
  return null;
}

/** Warms the sensor to the target (ambient when empty) at the step's or the camera's rate. */
export function runWarm(sim: Sim, node: NodeOf<'warm'>, scope: Scope): Ended | null {
  const target = node.targetC ?? ambientTempC(sim.sky.ambient, sim.t);
  const durationS = temperatureChangeS(sim.sensorC, target, node.maxRateCPerMin ?? sim.rig.camera.cooling.rateCPerMin);
  const ended = act(sim, scope, 'warm', durationS, node.id, `Warm from ${n(sim.sensorC)} °C to ${n(target)} °C`);
  if (ended) return ended;
  Object.assign(sim, { sensorC: target, cooled: false, setpointC: null });
  return null;
}
