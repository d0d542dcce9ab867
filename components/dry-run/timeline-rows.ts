import type { DryRunResult, TimelineEvent, TimelineKind } from '@/shared/dry-run/types';

/** How the timeline's blocks are coloured: the shutter's time against each kind of overhead. */
export type EventGroup = 'expose' | 'pointing' | 'focus' | 'guide' | 'flip' | 'idle' | 'rig';

export const EVENT_GROUP: Record<TimelineKind, EventGroup> = {
  expose: 'expose',
  slew: 'pointing',
  centre: 'pointing',
  rotate: 'pointing',
  focus: 'focus',
  guide: 'guide',
  flip: 'flip',
  pause: 'idle',
  wait: 'idle',
  cool: 'rig',
  warm: 'rig',
  park: 'rig',
  flats: 'rig',
  darks: 'rig',
};

/** Legend order and words. */
export const EVENT_GROUPS: { group: EventGroup; label: string }[] = [
  { group: 'expose', label: 'Light frames' },
  { group: 'pointing', label: 'Slew · centre · rotate' },
  { group: 'focus', label: 'Focus' },
  { group: 'guide', label: 'Guider start' },
  { group: 'flip', label: 'Meridian flip' },
  { group: 'idle', label: 'Waiting' },
  { group: 'rig', label: 'Cooling · calibration · park' },
];

export const KIND_LABEL: Record<TimelineKind, string> = {
  cool: 'Cooling',
  warm: 'Warming',
  slew: 'Slew',
  centre: 'Centring',
  rotate: 'Rotation',
  focus: 'Focus',
  expose: 'Light frames',
  guide: 'Guider start',
  flip: 'Meridian flip',
  pause: 'Pause before the meridian',
  wait: 'Waiting',
  flats: 'Flats',
  darks: 'Darks',
  park: 'Park',
};

/** A timeline event with its place in the list and its instants as numbers. */
export type TimedEvent = TimelineEvent & { index: number; startMs: number; endMs: number };

export type GanttRow = {
  key: string;
  /** The stage's node id; null for the row of steps outside any stage. */
  stageId: string | null;
  label: string;
  detail: string;
  events: TimedEvent[];
  /** A stage that never started (e.g. its target never rose). */
  skipped: boolean;
};

export type StageNaming = {
  /** The stage's printable path in the recipe when no event tells it (`children[2]`). */
  pathOf: (stageId: string) => string | undefined;
  /** Row label and detail from the stage and the target its events point at. */
  nameOf: (stageId: string, targetId: string | null) => { label: string; detail: string };
};

export function timedEvents(result: Pick<DryRunResult, 'timeline'>): TimedEvent[] {
  return result.timeline.map((e, index) => ({ ...e, index, startMs: Date.parse(e.start), endMs: Date.parse(e.end) }));
}

const within = (path: string | null, prefix: string | undefined) => !!path && !!prefix && (path === prefix || path.startsWith(`${prefix}.`));

type StageSpan = { id: string; path: string | undefined; windows: { startMs: number; endMs: number }[] };

function stageSpans(result: DryRunResult, events: TimedEvent[], naming: StageNaming): StageSpan[] {
  const spans = new Map<string, StageSpan>();
  for (const s of result.totals.stageFinish) {
    const span = spans.get(s.nodeId) ?? { id: s.nodeId, path: events.find((e) => e.nodeId === s.nodeId)?.path ?? naming.pathOf(s.nodeId), windows: [] };
    if (s.start && s.end) span.windows.push({ startMs: Date.parse(s.start), endMs: Date.parse(s.end) });
    spans.set(s.nodeId, span);
  }
  return [...spans.values()];
}

/** The stage an event belongs to: by its path in the recipe, else by the stage's time window. */
function stageOf(e: TimedEvent, spans: StageSpan[]): string | null {
  const byPath = spans.find((s) => within(e.path, s.path));
  if (byPath) return byPath.id;
  const byTime = spans.find((s) => !s.path && s.windows.some((w) => e.startMs >= w.startMs && e.startMs < w.endMs));
  return byTime?.id ?? null;
}

/**
 * One row per stage in the order the stages ran (label: the target), plus a first row for the
 * steps outside stages (cooling, park…) when there are any.
 */
export function ganttRows(result: DryRunResult, naming: StageNaming): GanttRow[] {
  const events = timedEvents(result);
  const spans = stageSpans(result, events, naming);
  const byStage = new Map<string | null, TimedEvent[]>();
  for (const e of events) {
    const id = stageOf(e, spans);
    byStage.set(id, [...(byStage.get(id) ?? []), e]);
  }
  const rows: GanttRow[] = spans.map((s) => {
    const own = byStage.get(s.id) ?? [];
    // A wait at a stage's start still carries the previous pointing: trust frames, then slews.
    const targetId = (own.find((e) => e.kind === 'expose' && e.targetId) ?? own.find((e) => e.kind === 'slew' && e.targetId))?.targetId ?? null;
    return { key: s.id, stageId: s.id, ...naming.nameOf(s.id, targetId), events: own, skipped: s.windows.length === 0 };
  });
  const outside = byStage.get(null) ?? [];
  return outside.length ? [{ key: 'outside', stageId: null, label: 'Rig', detail: 'Not in a stage', events: outside, skipped: false }, ...rows] : rows;
}

const HOUR_MS = 3_600_000;
const PAD_MS = 10 * 60_000;
/** Dawn is shown when it comes at most this long after the last step. */
const DAWN_REACH_MS = 3 * HOUR_MS;

/** The drawn span: the first to the last step, widened to whole hours, reaching dawn when it is near. */
export function ganttSpan(events: readonly TimedEvent[], dawnMs: number | null): { startMs: number; endMs: number } | null {
  if (events.length === 0) return null;
  const first = Math.min(...events.map((e) => e.startMs));
  let last = Math.max(...events.map((e) => e.endMs));
  if (dawnMs !== null && dawnMs > last && dawnMs - last <= DAWN_REACH_MS) last = dawnMs;
  return { startMs: Math.floor((first - PAD_MS) / HOUR_MS) * HOUR_MS, endMs: Math.ceil((last + PAD_MS) / HOUR_MS) * HOUR_MS };
}

/** The first event of each meridian flip (a flip is recorded as several consecutive parts). */
export function flipStarts(events: readonly TimedEvent[]): TimedEvent[] {
  return events.filter((e, i) => e.kind === 'flip' && events[i - 1]?.kind !== 'flip');
}

/** When the recipe starts (its first step) and ends (the night's end, else its last step). */
export function runExtent(events: readonly TimedEvent[], nightEnd: string | null): { startMs: number; endMs: number } | null {
  if (events.length === 0) return null;
  const startMs = Math.min(...events.map((e) => e.startMs));
  const endMs = nightEnd ? Date.parse(nightEnd) : Math.max(...events.map((e) => e.endMs));
  return { startMs, endMs };
}

/** The band's span: the usual sunset − 1 h to sunrise + 1 h, widened to hold the whole run. */
export function bandSpanWithRun(base: { startMs: number; endMs: number }, run: { startMs: number; endMs: number } | null): { startMs: number; endMs: number } {
  if (!run) return base;
  const pad = 15 * 60_000;
  return { startMs: Math.min(base.startMs, run.startMs - pad), endMs: Math.max(base.endMs, run.endMs + pad) };
}

/**
 * A target's light frames as spans, joining blocks less than `joinMs` apart (dither, filter
 * change, a short refocus) so the altitude chart shows stretches rather than a comb.
 */
export function exposureSpans(events: readonly TimedEvent[], targetId: string, joinMs = 5 * 60_000): { startMs: number; endMs: number }[] {
  const spans: { startMs: number; endMs: number }[] = [];
  for (const e of events) {
    if (e.kind !== 'expose' || e.targetId !== targetId) continue;
    const last = spans[spans.length - 1];
    if (last && e.startMs - last.endMs <= joinMs) last.endMs = Math.max(last.endMs, e.endMs);
    else spans.push({ startMs: e.startMs, endMs: e.endMs });
  }
  return spans;
}

/** The targets the night points at, in the order it first reaches them. */
export function targetsInOrder(events: readonly TimedEvent[]): string[] {
  return [...new Set(events.filter((e) => e.targetId && e.kind !== 'warm' && e.kind !== 'park').map((e) => e.targetId as string))];
}

/**
 * Where a timeline wider than the screen opens: at now during the night it shows, else at the
 * first thing the rig does besides waiting and cooling (the first slew, usually).
 */
export function focusInstant(events: readonly TimedEvent[], span: { startMs: number; endMs: number }, nowMs: number): number {
  if (nowMs > span.startMs && nowMs < span.endMs) return nowMs;
  const busy = events.find((e) => EVENT_GROUP[e.kind] !== 'idle' && EVENT_GROUP[e.kind] !== 'rig');
  return busy?.startMs ?? span.startMs;
}
