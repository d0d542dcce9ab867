import type { NodeOf } from '@/shared/recipe/types';
import type { Ended, Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { n, whenText } from '@/shared/dry-run/engine/text';
import { waitUntil } from '@/shared/dry-run/engine/wait';

/**
 * A wait: until a clock time or sun event (a fixed time: its slack is recorded), until the stage
 * target clears an altitude, or for a duration. Cut short by an enclosing deadline.
 */
export function runWait(sim: Sim, node: NodeOf<'wait'>, scope: Scope): Ended | null {
  const u = node.until;
  if (u.durationS !== undefined) return waitUntil(sim, scope, sim.t + u.durationS * 1000, node.id, `Wait ${n(u.durationS)} s`);
  if (u.altitudeAboveDeg !== undefined) {
    const stage = scope.stage;
    if (!stage) return null;
    const rise = stage.sky.firstAbove(u.altitudeAboveDeg, false, sim.t, sim.sky.spanEndMs);
    if (rise === null) {
      sim.out.finding({ code: 'low-altitude', severity: 'warn', ms: sim.t, nodeId: node.id, message: `${stage.name} does not reach ${n(u.altitudeAboveDeg)}° again tonight: the wait is skipped`, fix: 'Lower the altitude of the wait, or move it to when the target rises' });
      return null;
    }
    return waitUntil(sim, scope, rise, node.id, `Wait for ${stage.name} to clear ${n(u.altitudeAboveDeg)}°`);
  }
  const text = (u.clock ?? u.sunEvent)!;
  const at = sim.sky.whenMs(text);
  if (at === null) return null;
  sim.out.addSlack(node.id, at, sim.t);
  return waitUntil(sim, scope, at, node.id, `Wait for ${whenText(sim, text, at)}`);
}
