import { describe, expect, it } from 'vitest';
import { makeNaming } from '@/components/dry-run/naming';
import { bandSpanWithRun, exposureSpans, flipStarts, focusInstant, ganttRows, ganttSpan, runExtent, targetsInOrder, timedEvents } from '@/components/dry-run/timeline-rows';
import { runDryRun, type DryRunResult, type TimelineEvent } from '@/shared/dry-run';
import { referenceInput, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';

/*
 * The dry-run screen's timeline rows (components/dry-run/timeline-rows.ts). The layout rules are
 * Nightloom's own: one lane per stage, a first lane for steps outside stages, spans widened to
 * whole hours. The realistic case is the engine's reference night (tests/helpers).
 */

const HOUR = 3_600_000;
const T0 = Date.parse('2026-10-12T18:00:00Z');
const at = (min: number) => new Date(T0 + min * 60_000).toISOString();

function ev(kind: TimelineEvent['kind'], from: number, to: number, path: string | null, extra: Partial<TimelineEvent> = {}): TimelineEvent {
  return { start: at(from), end: at(to), nodeId: extra.nodeId ?? null, path, kind, what: kind, altDeg: null, azDeg: null, hourAngleH: null, pierSide: null, airmass: null, moonSepDeg: null, skyPaDeg: null, targetId: null, ...extra };
}

function result(timeline: TimelineEvent[], stageFinish: DryRunResult['totals']['stageFinish']): DryRunResult {
  const reference = runDryRun(referenceInput());
  return { ...reference, timeline, totals: { ...reference.totals, stageFinish } };
}

const naming = makeNaming(undefined, [{ id: 't1', designation: 'M 31', name: 'Andromeda Galaxy', raDeg: 10.68, decDeg: 41.27 }]);

describe('ganttRows', () => {
  const timeline = [
    ev('cool', 0, 7, 'children[0]', { nodeId: 'cool' }),
    ev('wait', 7, 60, 'children[1]', { nodeId: 'stage-a' }),
    ev('slew', 60, 61, 'children[1].children[0]', { targetId: 't1' }),
    ev('expose', 61, 120, 'children[1].children[1].children[0]', { targetId: 't1' }),
    ev('expose', 120, 180, 'children[10].children[0]', { targetId: 't1' }),
    ev('park', 180, 181, 'children[2]', { targetId: 't1' }),
  ];
  const stages = [
    { nodeId: 'stage-a', start: at(60), end: at(120) },
    { nodeId: 'stage-b', start: null, end: null },
  ];

  it('puts a stage’s events on its lane by path, and the rest on a first "Rig" lane', () => {
    const rows = ganttRows(result(timeline, stages), naming);
    expect(rows.map((r) => r.label)).toEqual(['Rig', 'M 31', 'Stage']);
    expect(rows[0]!.detail).toBe('Not in a stage');
    expect(rows[0]!.events.map((e) => e.kind)).toEqual(['cool', 'expose', 'park']);
    expect(rows[1]!.events.map((e) => e.kind)).toEqual(['wait', 'slew', 'expose']);
    expect(rows[1]!.detail).toBe('Andromeda Galaxy');
  });

  it('does not take `children[10]` for a step of `children[1]`', () => {
    const rows = ganttRows(result(timeline, stages), naming);
    expect(rows[1]!.events.some((e) => e.path === 'children[10].children[0]')).toBe(false);
  });

  it('marks a stage that never started as skipped', () => {
    const rows = ganttRows(result(timeline, stages), naming);
    expect(rows[2]).toMatchObject({ stageId: 'stage-b', skipped: true, events: [] });
    expect(rows[1]!.skipped).toBe(false);
  });

  it('falls back to the stage’s time window when no path tells the stage', () => {
    const rows = ganttRows(result([ev('expose', 70, 80, null, { targetId: 't1' })], stages), naming);
    expect(rows.map((r) => r.label)).toEqual(['M 31', 'Stage']);
    expect(rows[0]!.events).toHaveLength(1);
  });

  it('places every event of the reference night exactly once, eight stage lanes after the Rig lane', () => {
    const reference = runDryRun(referenceInput());
    const names = makeNaming(referenceInput().tree, Object.entries(REFERENCE_TARGETS).map(([id, t]) => ({ id, ...t })));
    const rows = ganttRows(reference, names);
    expect(rows).toHaveLength(9);
    expect(rows[0]!.label).toBe('Rig');
    expect(rows.slice(1).map((r) => r.label)).toEqual(['NGC 6960', 'NGC 7000', 'NGC 281', 'M31', 'M33', 'IC 1805', 'M45', 'M42']);
    expect(rows.flatMap((r) => r.events.map((e) => e.index)).sort((a, b) => a - b)).toEqual(reference.timeline.map((_, i) => i));
  });
});

describe('ganttSpan and runExtent', () => {
  const events = timedEvents({ timeline: [ev('cool', 5, 10, null), ev('expose', 10, 430, null)] });

  it('widens the span to whole hours with ten minutes to spare', () => {
    expect(ganttSpan(events, null)).toEqual({ startMs: T0 - HOUR, endMs: T0 + 8 * HOUR });
  });

  it('reaches dawn when it comes less than three hours after the last step, not otherwise', () => {
    expect(ganttSpan(events, T0 + 9 * HOUR)!.endMs).toBe(T0 + 10 * HOUR);
    expect(ganttSpan(events, T0 + 11 * HOUR)!.endMs).toBe(T0 + 8 * HOUR);
  });

  it('has nothing to draw for an empty night', () => {
    expect(ganttSpan([], null)).toBeNull();
    expect(runExtent([], null)).toBeNull();
  });

  it('opens a wide timeline at now during its night, else at the first slew', () => {
    const night = timedEvents({ timeline: [ev('cool', 0, 7, null), ev('wait', 7, 60, null), ev('slew', 60, 61, null), ev('expose', 61, 90, null)] });
    const span = { startMs: T0 - HOUR, endMs: T0 + 3 * HOUR };
    expect(focusInstant(night, span, T0 + 2 * HOUR)).toBe(T0 + 2 * HOUR);
    expect(focusInstant(night, span, T0 + 9 * HOUR)).toBe(T0 + HOUR);
  });

  it('ends the run at the night’s end when there is one', () => {
    expect(runExtent(events, at(440))).toEqual({ startMs: T0 + 5 * 60_000, endMs: T0 + 440 * 60_000 });
    expect(bandSpanWithRun({ startMs: T0, endMs: T0 + HOUR }, { startMs: T0 + 600_000, endMs: T0 + 2 * HOUR })).toEqual({ startMs: T0 - 300_000, endMs: T0 + 2 * HOUR + 900_000 });
  });
});

describe('flips and exposure spans', () => {
  const events = timedEvents({
    timeline: [
      ev('expose', 0, 10, null, { targetId: 't1' }),
      ev('expose', 11, 20, null, { targetId: 't1' }),
      ev('flip', 20, 21, null, { targetId: 't1' }),
      ev('flip', 21, 23, null, { targetId: 't1' }),
      ev('expose', 40, 50, null, { targetId: 't1' }),
      ev('expose', 50, 60, null, { targetId: 't2' }),
      ev('park', 60, 61, null, { targetId: 't2' }),
    ],
  });

  it('marks a flip once, at its first part', () => {
    expect(flipStarts(events).map((e) => e.index)).toEqual([2]);
  });

  it('joins a target’s frames less than five minutes apart', () => {
    expect(exposureSpans(events, 't1').map((s) => [(s.startMs - T0) / 60_000, (s.endMs - T0) / 60_000])).toEqual([
      [0, 20],
      [40, 50],
    ]);
  });

  it('lists the targets in the order the night reaches them, leaving out where the mount parks', () => {
    expect(targetsInOrder(events)).toEqual(['t1', 't2']);
    expect(targetsInOrder(timedEvents({ timeline: [ev('park', 0, 1, null, { targetId: 't9' })] }))).toEqual([]);
  });
});
