import { describe, expect, it } from 'vitest';
import { applyDraft } from '@/components/recipes/node-editor/apply';
import { draftToInput, nodeToDraft } from '@/components/recipes/node-editor/draft';
import { createNode } from '@/shared/recipe/factory';
import { NODE_KINDS } from '@/shared/recipe/schema';
import type { NodeKind, RecipeNode } from '@/shared/recipe/types';

let n = 0;
const newId = () => `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`;
const make = <K extends NodeKind>(kind: K, params: Record<string, unknown> = {}) => createNode(kind, params as never, { newId });

function roundTrip(node: RecipeNode): RecipeNode {
  const result = applyDraft(nodeToDraft(node), node);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.node;
}

/** Nodes with every optional parameter set and every branch of every union. */
const VARIANTS: RecipeNode[] = [
  make('stage', {
    label: 'M31 core',
    enabled: false,
    targetId: newId(),
    framing: { raDeg: 10.684708, decDeg: 41.26875, positionAngleDeg: 35.5 },
    window: { notBefore: 'astronomical-dusk', endBy: '03:30', minAltitudeDeg: 30, maxMoonIlluminationPct: 60, minMoonSeparationDeg: 45 },
    children: [make('expose')],
    rules: [
      { id: newId(), kind: 'refocus-on-temperature', deltaC: 0.8 },
      { id: newId(), kind: 'refocus-on-interval', every: { minutes: 45 } },
      { id: newId(), kind: 'refocus-on-interval', every: { frames: 20 } },
      { id: newId(), kind: 'recentre-on-drift', driftArcmin: 1.5 },
    ],
  }),
  make('stage', { window: { notBefore: '2025-03-01T21:30:00+01:00' } }),
  make('repeat', { until: { count: 12 } }),
  make('repeat', { until: { clock: '04:15' } }),
  make('repeat', { until: { altitudeBelowDeg: 25.5 } }),
  make('group', { label: 'Narrowband block', children: [make('note')] }),
  make('cool', { setpointC: -15, maxRateCPerMin: 2.5 }),
  make('warm', { targetC: 5, maxRateCPerMin: 3 }),
  make('slew', { to: { kind: 'radec', raDeg: 83.8221, decDeg: -5.3911 } }),
  make('slew', { to: { kind: 'altaz', altDeg: 85, azDeg: 180.5 } }),
  make('centre', { filter: 'L', toleranceArcsec: 15 }),
  make('rotate', { to: { positionAngleDeg: 271.25 }, toleranceArcmin: 1 }),
  make('focus', { filter: 'Ha', points: 11, stepSize: 35, exposureS: 4 }),
  make('expose', { filter: 'OIII', exposureS: 0.5, count: 40, gain: 100, offset: 50, binning: 2, ditherEvery: 0 }),
  make('guide', { settlePx: 0.8, settleTimeS: 0, calibrate: false }),
  make('meridian', { policy: { kind: 'flip', flipAfterMin: 12, refocus: false, recentre: true } }),
  make('meridian', { policy: { kind: 'pause-before', minutesBefore: 3 } }),
  make('meridian', { policy: { kind: 'end-stage' } }),
  make('wait', { until: { clock: '22:05' } }),
  make('wait', { until: { altitudeAboveDeg: -5 } }),
  make('wait', { until: { durationS: 600 } }),
  make('flats', { source: 'sky', filters: ['L', 'R', 'G'], count: 25, targetAduPct: 35, matchFramingOf: { kind: 'stage', stageId: newId() } }),
  make('darks', { exposuresS: [300, 120, 0.25], count: 40, temperatureC: -20, gain: 120, offset: 30, binning: 1 }),
  make('note', { text: 'Check the dew heater\nbefore midnight.' }),
];

describe('nodeToDraft → applyDraft', () => {
  it.each(NODE_KINDS)('gives back a new %s node unchanged', (kind) => {
    const node = make(kind);
    expect(roundTrip(node)).toEqual(node);
  });

  it.each(VARIANTS.map((node) => [`${node.kind} ${JSON.stringify(node).slice(0, 60)}`, node] as const))('gives back %s unchanged', (_, node) => {
    expect(roundTrip(node)).toEqual(node);
  });

  it('covers every kind among the variants or the defaults', () => {
    expect(new Set(VARIANTS.map((v) => v.kind)).size).toBeGreaterThan(14);
  });
});

describe('nodeToDraft', () => {
  it('keeps numbers as text and names the union branch in a mode field', () => {
    const draft = nodeToDraft(make('repeat', { until: { altitudeBelowDeg: 30 } }));
    expect(draft.values['until.mode']).toBe('altitudeBelowDeg');
    expect(draft.values['until.altitudeBelowDeg']).toBe('30');
    expect(draft.values['until.sunEvent']).toBe('astronomical-dawn');
  });

  it('writes list parameters as comma lists', () => {
    expect(nodeToDraft(make('darks', { exposuresS: [300, 60] })).values.exposuresS).toBe('300, 60');
    expect(nodeToDraft(make('flats', { filters: ['Ha', 'OIII'] })).values.filters).toBe('Ha, OIII');
  });

  it('reads the window chooser from the value', () => {
    const values = nodeToDraft(make('stage', { window: { notBefore: 'nautical-dusk', endBy: '02:00' } })).values;
    expect([values['window.notBefore.mode'], values['window.endBy.mode']]).toEqual(['sun', 'clock']);
    expect(nodeToDraft(make('stage')).values['window.notBefore.mode']).toBe('none');
  });
});

describe('draftToInput', () => {
  it('leaves out blank optional fields and hidden branches', () => {
    const node = make('cool', { maxRateCPerMin: 2 });
    const draft = nodeToDraft(node);
    draft.values.maxRateCPerMin = ' ';
    draft.values.label = '  ';
    const { input } = draftToInput(draft, node);
    expect(input).not.toHaveProperty('maxRateCPerMin');
    expect(input).not.toHaveProperty('label');
  });

  it('switches a union branch by its mode field', () => {
    const node = make('repeat');
    const draft = nodeToDraft(node);
    draft.values['until.mode'] = 'count';
    draft.values['until.count'] = '8';
    const result = applyDraft(draft, node);
    expect(result.ok && result.node.kind === 'repeat' && result.node.until).toEqual({ count: 8 });
  });

  it('reads a decimal comma, a typographic minus and sexagesimal coordinates', () => {
    const node = make('slew', { to: { kind: 'radec', raDeg: 1, decDeg: 1 } });
    const draft = nodeToDraft(node);
    Object.assign(draft.values, { 'to.raDeg': '05:35:17.3', 'to.decDeg': '\u221205:23:28' });
    const result = applyDraft(draft, node);
    if (!result.ok || result.node.kind !== 'slew' || result.node.to.kind !== 'radec') throw new Error('expected a radec slew');
    expect(result.node.to.raDeg).toBeCloseTo(83.822, 3);
    expect(result.node.to.decDeg).toBeCloseTo(-5.391, 3);
    const cool = make('cool');
    const coolDraft = nodeToDraft(cool);
    coolDraft.values.setpointC = '\u22127,5';
    const cooled = applyDraft(coolDraft, cool);
    expect(cooled.ok && cooled.node.kind === 'cool' && cooled.node.setpointC).toBe(-7.5);
  });

  it('drops a flats match when its keep flag is cleared', () => {
    const node = make('flats', { matchFramingOf: { kind: 'framing', framingId: newId() } });
    const draft = nodeToDraft(node);
    expect(draft.values.matchFramingOf).toBe(true);
    draft.values.matchFramingOf = false;
    const result = applyDraft(draft, node);
    expect(result.ok && result.node.kind === 'flats' && result.node.matchFramingOf).toBeUndefined();
  });
});
