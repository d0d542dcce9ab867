import { emit } from '@/shared/dry-run/engine/act';
import { earliestDeadline, type Ended, type Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';

/**
 * Idles until `untilMs` (an idle `wait` or meridian `pause` event). A wait that would run past
 * the earliest deadline stops there, and the deadline's owner ends.
 */
export function waitUntil(sim: Sim, scope: Scope, untilMs: number, nodeId: string | null, what: string, kind: 'wait' | 'pause' = 'wait'): Ended | null {
  if (untilMs <= sim.t) return null;
  const earliest = earliestDeadline(scope, sim.t);
  if (earliest && earliest.at < untilMs) {
    emit(sim, kind, (Math.max(earliest.at, sim.t) - sim.t) / 1000, nodeId, `${what} (cut short: the ${earliest.deadline.reason === 'altitude' ? 'target sinks' : 'window ends'} first)`);
    return { ownerId: earliest.deadline.ownerId, reason: earliest.deadline.reason, openEnded: scope.openEnded, atMs: sim.t };
  }
  emit(sim, kind, (untilMs - sim.t) / 1000, nodeId, what);
  return null;
}
