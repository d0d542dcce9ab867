import { describe, expect, it } from 'vitest';
import { curveBetween } from '@/components/dry-run/altitude-overlay';
import { makeNaming } from '@/components/dry-run/naming';
import { endVsDawn, formatHm, formatMinutes, formatSlack, formatSpanS, pointingFacts } from '@/components/dry-run/run-format';
import { blockBox, chartWidth, labelRows, msAt, tickEveryHours, xAt } from '@/components/dry-run/time-scale';
import { findingCounts, findingGroups, integrationRows, overheadRows } from '@/components/dry-run/totals-rows';
import { runDryRun, type DryRunFinding } from '@/shared/dry-run';
import { referenceInput } from '@/tests/helpers/dry-run-reference';

/* Figures and geometry of the dry-run screen; formats are Nightloom's own (24 h, h:mm, true minus). */

describe('durations and times', () => {
  it('formats shutter time as h:mm, rounded to the minute', () => {
    expect(formatHm(0)).toBe('0:00');
    expect(formatHm(29_700)).toBe('8:15');
    expect(formatHm(3_629)).toBe('1:00');
    expect(formatHm(3_631)).toBe('1:01');
  });

  it('keeps seconds only under ten minutes', () => {
    expect([formatSpanS(45), formatSpanS(380), formatSpanS(600), formatSpanS(7_500)]).toEqual(['45 s', '6 min 20 s', '10 min', '2 h 05 min']);
    expect(formatMinutes(185)).toBe('3 min');
  });

  it('sets the night’s end against astronomical dawn', () => {
    const dawn = '2026-10-13T04:03:30Z';
    expect(endVsDawn('2026-10-13T04:06:35Z', dawn)).toEqual({ tone: 'late', text: '3 min after dawn' });
    expect(endVsDawn('2026-10-13T03:00:00Z', dawn)).toEqual({ tone: 'ok', text: '1 h 04 min before dawn' });
    expect(endVsDawn('2026-10-13T04:03:40Z', dawn).text).toBe('Ends at dawn');
    expect(endVsDawn(null, dawn).tone).toBe('none');
  });

  it('signs the slack before a set time', () => {
    expect([formatSlack(5_666), formatSlack(-720), formatSlack(10)]).toEqual(['+1:34', '\u22120:12', '0:00']);
  });
});

describe('pointingFacts', () => {
  it('says where the telescope points and leaves out what is unknown', () => {
    const [event] = runDryRun(referenceInput()).timeline.filter((e) => e.kind === 'expose');
    const facts = pointingFacts({ ...event!, moonSepDeg: null, hourAngleH: -0.279 });
    expect(facts.map((f) => f.label)).toEqual(['Altitude', 'Airmass', 'Pier side', 'Hour angle', 'Sky PA', 'Filter', 'Frames']);
    expect(facts.find((f) => f.label === 'Hour angle')!.value).toBe('\u22120.28 h');
  });
});

describe('totals', () => {
  const totals = runDryRun(referenceInput()).totals;

  it('orders targets and filters as the night did, whatever order the stored keys came back in', () => {
    const shuffled = { ...totals, integrationByTargetAndFilter: Object.fromEntries(Object.entries(totals.integrationByTargetAndFilter).reverse()) };
    const order = { targets: Object.keys(totals.integrationByTargetAndFilter), filters: ['OIII', 'Ha', 'L', 'R', 'G', 'B'] };
    const rows = integrationRows(shuffled, (id) => id.slice(-4), order);
    expect(rows.map((r) => r.targetId)).toEqual(order.targets);
    expect(rows[0]!.filters.map((f) => f.filter)).toEqual(['OIII', 'Ha']);
    expect(rows.reduce((s, r) => s + r.seconds, 0)).toBeCloseTo(totals.shutterOpenS, 6);
  });

  it('lists overheads that took time, largest first', () => {
    const rows = overheadRows(totals);
    expect(rows.every((r) => r.seconds > 0)).toBe(true);
    expect(rows.map((r) => r.seconds)).toEqual([...rows.map((r) => r.seconds)].sort((a, b) => b - a));
    expect(rows.find((r) => r.kind === 'dither')!.label).toBe('Dither and settle');
  });
});

describe('findings', () => {
  const f = (severity: DryRunFinding['severity'], code: DryRunFinding['code'], time: string | null): DryRunFinding => ({ severity, code, time, nodeId: null, path: null, message: '', fix: '' });
  const list = [f('warn', 'moon-near', '2026-10-12T22:00:00Z'), f('info', 'darks-stale', null), f('stop', 'never-rises', null), f('warn', 'past-dawn', '2026-10-12T20:00:00Z'), f('stop', 'sun-near', '2026-10-12T17:00:00Z')];

  it('groups stop first, then by time with untimed last', () => {
    expect(findingGroups(list).map((g) => [g.severity, g.findings.map((x) => x.code)])).toEqual([
      ['stop', ['sun-near', 'never-rises']],
      ['warn', ['past-dawn', 'moon-near']],
      ['info', ['darks-stale']],
    ]);
    expect(findingCounts(list)).toEqual({ stop: 2, warn: 2, info: 1 });
  });

  it('names a step by its stage’s target and its summary, or by its path once it is gone', () => {
    const input = referenceInput();
    const targets = Object.entries(input.targets).map(([id, t]) => ({ id, ...t }));
    const naming = makeNaming(input.tree, targets);
    const stage = input.tree.children.find((n) => n.kind === 'stage')!;
    const expose = runDryRun(input).timeline.find((e) => e.kind === 'expose')!;
    expect(naming.stepLabel(expose.nodeId, expose.path)).toMatch(/^NGC 6960 › Ha \d+ × 45 s/);
    expect(naming.nameOf(stage.id, null)).toEqual({ label: 'NGC 6960', detail: 'Western Veil' });
    expect(naming.stepLabel('gone', 'children[9]')).toBe('Step at children[9]');
  });
});

describe('time scale', () => {
  const scale = { startMs: 0, endMs: 10 * 3_600_000, left: 20, right: 520 };

  it('maps instants to px and back', () => {
    expect(xAt(scale, 5 * 3_600_000)).toBe(270);
    expect(msAt(scale, 270)).toBe(5 * 3_600_000);
  });

  it('scrolls rather than squeeze an hour under the minimum', () => {
    expect(chartWidth(10 * 3_600_000, 300, 52)).toBe(520);
    expect(chartWidth(10 * 3_600_000, 900, 52)).toBe(900);
    expect(tickEveryHours(10 * 3_600_000, 300, 44)).toBe(2);
  });

  it('keeps a 20-second block visible and inside the axis', () => {
    expect(blockBox(scale, 0, 20_000, 14)).toEqual({ x: 20, width: 14 });
    expect(blockBox(scale, 3_600_000, 7_200_000, 2).width).toBe(50);
  });

  it('moves a label that would overlap to the next row', () => {
    expect(labelRows([10, 40, 200, 230, 250], 60)).toEqual([0, 1, 0, 1, 1]);
  });
});

describe('curveBetween', () => {
  it('cuts the altitude curve at both ends by linear interpolation', () => {
    const samples = [0, 10, 20, 30].map((m, i) => ({ t: new Date(m * 60_000).toISOString(), altDeg: i * 10 }));
    expect(curveBetween(samples, 5 * 60_000, 25 * 60_000)).toEqual([
      { ms: 300_000, altDeg: 5 },
      { ms: 600_000, altDeg: 10 },
      { ms: 1_200_000, altDeg: 20 },
      { ms: 1_500_000, altDeg: 25 },
    ]);
    expect(curveBetween(samples, 10, 5)).toEqual([]);
  });
});
