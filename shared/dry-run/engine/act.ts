import { OVERHEAD_KINDS } from '@/shared/dry-run/result-schema';
import { fits, type Ended, type Scope } from '@/shared/dry-run/engine/scope';
import { pointingFields } from '@/shared/dry-run/engine/pointing';
import type { Sim } from '@/shared/dry-run/engine/state';
import type { OverheadKind, TimelineEvent, TimelineKind } from '@/shared/dry-run/types';

export interface EventExtra {
  filter?: string;
  frames?: number;
  /** Where the time went; default: all of it to the event's kind (waits and pauses are idle). */
  overhead?: Partial<Record<OverheadKind, number>>;
  /** Pointing fields taken at this instant (default: the start). */
  fieldsAtMs?: number;
}

const iso = (ms: number) => new Date(Math.round(ms)).toISOString();
const isOverhead = (kind: string): kind is OverheadKind => (OVERHEAD_KINDS as readonly string[]).includes(kind);

/** Records an event from `startMs` to `endMs` without moving the clock (blocks of frames). */
export function recordSpan(sim: Sim, kind: TimelineKind, startMs: number, endMs: number, nodeId: string | null, what: string, extra: EventExtra = {}): void {
  if (endMs <= startMs) return;
  const path = nodeId === null ? null : (sim.paths.get(nodeId) ?? null);
  const event: TimelineEvent = { start: iso(startMs), end: iso(endMs), nodeId, path, kind, what, ...pointingFields(sim, extra.fieldsAtMs ?? startMs) };
  if (extra.filter !== undefined) event.filter = extra.filter;
  if (extra.frames !== undefined) event.frames = extra.frames;
  sim.out.timeline.push(event);
  if (extra.overhead) for (const [k, s] of Object.entries(extra.overhead)) sim.out.addOverhead(k as OverheadKind, s);
  else if (isOverhead(kind)) sim.out.addOverhead(kind, (endMs - startMs) / 1000);
}

/** Records an event of `durationS` starting now and moves the clock to its end (nothing when zero). */
export function emit(sim: Sim, kind: TimelineKind, durationS: number, nodeId: string | null, what: string, extra: EventExtra = {}): void {
  if (durationS <= 0) return;
  const end = sim.t + durationS * 1000;
  recordSpan(sim, kind, sim.t, end, nodeId, what, extra);
  sim.t = end;
}

/** Like `emit`, after checking that the action ends by every deadline; returns who ends it otherwise. */
export function act(sim: Sim, scope: Scope, kind: TimelineKind, durationS: number, nodeId: string | null, what: string, extra: EventExtra = {}): Ended | null {
  const ended = fits(scope, sim.t, durationS);
  if (ended) return ended;
  emit(sim, kind, durationS, nodeId, what, extra);
  return null;
}
