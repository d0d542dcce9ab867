import { describe, expect, it } from 'vitest';
import { createNode, type NodeParams } from '@/shared/recipe/factory';
import { sequentialIds } from '@/shared/recipe/ids';
import { summarizeNode, targetIds, totals } from '@/shared/recipe/summary';
import type { NodeKind, NodeOf, RecipeNode, RecipeTree } from '@/shared/recipe/types';

const newId = sequentialIds();
const node = <K extends NodeKind>(kind: K, params: NodeParams<K> = {}): NodeOf<K> => createNode(kind, params, { newId });
const M31 = '00000000-0000-4000-8000-00000000a031';
const M42 = '00000000-0000-4000-8000-00000000a042';
const names: Record<string, string> = { [M31]: 'M31' };
const targetName = (id: string) => names[id];
const s = (n: RecipeNode) => summarizeNode(n, { targetName });

describe('summarizeNode', () => {
  it('expose', () => {
    expect(s(node('expose', { filter: 'Ha', count: 10, exposureS: 300, gain: 100, ditherEvery: 2 }))).toBe('Ha 10 × 300 s, gain 100, bin 1, dither every 2');
    expect(s(node('expose', { filter: 'L', count: 5, exposureS: 180, offset: 50, binning: 2 }))).toBe('L 5 × 180 s, offset 50, bin 2, dither every frame');
    expect(s(node('expose', { filter: 'R', count: 1, exposureS: 0.5, ditherEvery: 0 }))).toBe('R 1 × 0.5 s, bin 1, no dither');
  });

  it('centre, rotate, focus, guide', () => {
    expect(s(node('centre'))).toBe('Centre within 30″, up to 3 tries');
    expect(s(node('centre', { maxAttempts: 1, filter: 'L' }))).toBe('Centre within 30″, up to 1 try with L');
    expect(s(node('rotate'))).toBe('Rotate to match the framing within 3′');
    expect(s(node('rotate', { to: { positionAngleDeg: 92.5 } }))).toBe('Rotate to PA 92.5° within 3′');
    expect(s(node('focus', { filter: 'L' }))).toBe('Focus with L: 9 points × 5 s, 50 steps apart');
    expect(s(node('guide'))).toBe('Guide, settle within 1.5 px for 10 s, calibrate first');
    expect(s(node('guide', { calibrate: false }))).toBe('Guide, settle within 1.5 px for 10 s');
  });

  it('cool, warm, slew, park, note', () => {
    expect(s(node('cool'))).toBe('Cool to −10 °C');
    expect(s(node('cool', { setpointC: -15, maxRateCPerMin: 2 }))).toBe('Cool to −15 °C at 2 °C/min');
    expect(s(node('warm'))).toBe('Warm to ambient');
    expect(s(node('warm', { targetC: 5 }))).toBe('Warm to 5 °C');
    expect(s(node('slew'))).toBe('Slew to the stage target');
    expect(s(node('slew', { to: { kind: 'radec', raDeg: 10.684708, decDeg: 41.26875 } }))).toBe('Slew to RA 00h42m44s, Dec +41°16′08″');
    expect(s(node('slew', { to: { kind: 'altaz', altDeg: 45, azDeg: 180 } }))).toBe('Slew to alt 45°, az 180°');
    expect(s(node('park'))).toBe('Park the mount');
    expect(s(node('note', { text: `Check dew heaters\nand the cables` }))).toBe('Check dew heaters');
    expect(s(node('note', { text: 'x'.repeat(70) }))).toBe(`${'x'.repeat(59)}…`);
  });

  it('meridian and wait', () => {
    expect(s(node('meridian'))).toBe('Flip 5 min past the meridian, then recentre and refocus');
    expect(s(node('meridian', { policy: { kind: 'flip', refocus: false, recentre: false } }))).toBe('Flip 5 min past the meridian');
    expect(s(node('meridian', { policy: { kind: 'pause-before', minutesBefore: 10 } }))).toBe('Pause 10 min before the meridian');
    expect(s(node('meridian', { policy: { kind: 'end-stage' } }))).toBe('End the stage at the meridian');
    expect(s(node('wait', { until: { clock: '22:30' } }))).toBe('Wait until 22:30');
    expect(s(node('wait', { until: { sunEvent: 'nautical-dusk' } }))).toBe('Wait until nautical dusk');
    expect(s(node('wait', { until: { altitudeAboveDeg: 30 } }))).toBe('Wait until the target is above 30°');
    expect(s(node('wait', { until: { durationS: 600 } }))).toBe('Wait 10 min');
    expect(s(node('wait', { until: { durationS: 5400 } }))).toBe('Wait 1 h 30 min');
    expect(s(node('wait', { until: { durationS: 90 } }))).toBe('Wait 90 s');
  });

  it('flats and darks', () => {
    expect(s(node('flats', { filters: ['L', 'R', 'G', 'B'] }))).toBe('Panel flats: L, R, G and B, 30 each');
    expect(s(node('flats', { source: 'sky', filters: ['Ha'], count: 20, targetAduPct: 30, matchFramingOf: { kind: 'stage', stageId: M31 } }))).toBe("Sky flats: Ha, 20 each at 30 %, matching a stage's framing");
    expect(s(node('darks', { exposuresS: [60, 300], gain: 100 }))).toBe('Darks 30 × 60 s and 300 s at −10 °C, gain 100, bin 1');
  });

  it('containers', () => {
    expect(s(node('stage', { targetId: M31, window: { notBefore: 'astronomical-dusk', minAltitudeDeg: 30 } }))).toBe('M31 · after astronomical dusk · above 30°');
    expect(s(node('stage', { targetId: M42, window: { endBy: '2025-03-02T04:30:00+01:00', maxMoonIlluminationPct: 50, minMoonSeparationDeg: 40 } }))).toBe('Target · end by 2025-03-02 04:30 · Moon ≤ 50 % · ≥ 40° from the Moon');
    expect(s(node('stage'))).toBe('No target');
    expect(s(node('stage', { targetId: M31, framing: { raDeg: 10.7, decDeg: 41.3, positionAngleDeg: 35 } }))).toBe('M31 · own framing, PA 35°');
    expect(s(node('repeat', { until: { sunEvent: 'astronomical-dawn' } }))).toBe('Repeat until astronomical dawn');
    expect(s(node('repeat', { until: { count: 5 } }))).toBe('Repeat 5 times');
    expect(s(node('repeat', { until: { count: 1 } }))).toBe('Repeat once');
    expect(s(node('repeat', { until: { clock: '04:30' } }))).toBe('Repeat until 04:30');
    expect(s(node('repeat', { until: { altitudeBelowDeg: 30 } }))).toBe('Repeat until the target sinks below 30°');
    expect(s({ ...node('group'), children: [node('park'), node('park')] })).toBe('Group of 2 steps');
  });
});

describe('totals', () => {
  const expose = (filter: string, count: number, exposureS: number) => node('expose', { filter, count, exposureS });

  it('sums shutter-open time per filter; a counted repeat multiplies', () => {
    const tree: RecipeTree = {
      children: [
        { ...node('stage', { targetId: M31 }), children: [{ ...node('repeat', { until: { count: 3 } }), children: [expose('L', 5, 180), expose('R', 2, 120)] }] },
        { ...node('stage', { targetId: M42 }), children: [expose('L', 10, 60), { ...expose('R', 99, 99), enabled: false }] },
        node('darks', { exposuresS: [60, 180], count: 10 }),
        node('flats', { filters: ['L', 'R'], count: 20 }),
      ],
    };
    const t = totals(tree);
    expect(t.lights).toEqual({ L: { frames: 25, shutterS: 3300 }, R: { frames: 6, shutterS: 720 } });
    expect(t.lightsByTarget[M31]).toEqual({ L: { frames: 15, shutterS: 2700 }, R: { frames: 6, shutterS: 720 } });
    expect(t.lightsByTarget[M42]).toEqual({ L: { frames: 10, shutterS: 600 } });
    expect([t.lightFrames, t.lightShutterS]).toEqual([31, 4020]);
    expect(t.darks).toEqual({ frames: 20, shutterS: 2400 });
    expect(t.flatFrames).toBe(40);
    expect([t.atLeast, t.openEndedRepeatIds]).toEqual([false, []]);
  });

  it('an open-ended repeat counts once and is flagged', () => {
    const open = { ...node('repeat', { until: { sunEvent: 'astronomical-dawn' } }), children: [expose('Ha', 2, 300)] };
    const t = totals({ children: [open] });
    expect(t.lights).toEqual({ Ha: { frames: 2, shutterS: 600 } });
    expect(t.lightsByTarget['']).toEqual({ Ha: { frames: 2, shutterS: 600 } });
    expect(t.openEndedRepeatIds).toEqual([open.id]);
    expect(t.atLeast).toBe(true);
  });
});

describe('targetIds', () => {
  it('lists stage targets once, in order of appearance', () => {
    const tree: RecipeTree = { children: [node('stage', { targetId: M42 }), { ...node('group'), children: [node('stage', { targetId: M31 }), node('stage', { targetId: M42 }), node('stage')] }] };
    expect(targetIds(tree)).toEqual([M42, M31]);
  });
});
