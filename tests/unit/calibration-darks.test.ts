import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { darkLibraryForDryRun, darksRecipeTree, groupDarkFrames, isDarkSetStale } from '@/shared/calibration/darks';
import { runDryRun, type DryRunInput } from '@/shared/dry-run';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeNode } from '@/shared/recipe/types';
import { defaultRigInput } from '@/shared/rig/schema';
import type { DarkLibrarySet, DarkToShoot } from '@/shared/schemas/calibration-api';
import { recipeBuilder, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';
import { frameRecord, storedFrame } from './calibration-fixtures';

const dark = (dateObs: string, over: Partial<Parameters<typeof storedFrame>[0]> = {}) =>
  storedFrame({ type: 'Dark Frame', dateObs, exposureS: 300, gain: 100, offset: 50, binning: 1, readoutMode: 'High Gain', setTempC: -10, sensorTempC: -10.2, ...over });

describe('groupDarkFrames', () => {
  // Nights in Europe/Berlin: 2026-03-14 evening to 2026-03-15 noon is the night of 2026-03-14.
  const frames = [
    dark('2026-03-14T22:00:00'),
    dark('2026-03-14T22:06:00'),
    dark('2026-03-15T01:00:00'),
    // no SET-TEMP: the sensor's −9.6 °C rounds to −10 °C and joins the set
    dark('2026-03-15T01:06:00', { setTempC: undefined, sensorTempC: -9.6 }),
    dark('2026-03-15T02:00:00', { setTempC: -20, sensorTempC: -20.1 }),
    dark('2026-03-15T02:10:00', { exposureS: 120 }),
    dark('2026-03-15T02:20:00', { readoutMode: 'Low Noise' }),
    dark('2026-03-15T02:30:00', { gain: undefined, offset: undefined }),
    dark('2026-04-02T21:00:00'),
    storedFrame({ type: 'Light Frame', dateObs: '2026-03-14T22:00:00', exposureS: 300, setTempC: -10 }),
    storedFrame({ type: 'Bias Frame', dateObs: '2026-03-14T22:00:00', setTempC: -10 }),
  ];
  // on 2026-09-20 the 6-month cutoff is 2026-03-20: the March sets are stale, the April one is not
  const sets = groupDarkFrames(frames, 6, '2026-09-20');

  it('makes one set per exposure, gain, offset, binning, readout mode, temperature (1 °C) and night; darks only', () => {
    expect(sets.map((s) => [s.temperatureC, s.exposureS, s.takenOn, s.readoutMode, s.gain, s.frames])).toEqual([
      [-20, 300, '2026-03-14', 'High Gain', 100, 1],
      [-10, 120, '2026-03-14', 'High Gain', 100, 1],
      [-10, 300, '2026-04-02', 'High Gain', 100, 1],
      [-10, 300, '2026-03-14', 'High Gain', null, 1],
      [-10, 300, '2026-03-14', 'High Gain', 100, 4],
      [-10, 300, '2026-03-14', 'Low Noise', 100, 1],
    ]);
    expect(sets.reduce((n, s) => n + s.frames, 0)).toBe(9);
  });

  it('describes each set as the API lists it, with a stable intake id', () => {
    expect(sets[4]).toEqual({ id: expect.stringMatching(/^intake:/), source: 'intake', version: null, exposureS: 300, gain: 100, offset: 50, binning: 1, readoutMode: 'High Gain', temperatureC: -10, frames: 4, takenOn: '2026-03-14', stale: true, notes: '' });
    expect(sets[2]).toMatchObject({ takenOn: '2026-04-02', stale: false });
    const again = groupDarkFrames([...frames].reverse(), 6, '2026-09-20');
    expect(again).toEqual(sets);
    expect(new Set(sets.map((s) => s.id)).size).toBe(sets.length);
  });

  it('skips a stored dark without any temperature (intake refuses such darks)', () => {
    expect(groupDarkFrames([frameRecord({ frameType: 'dark' })], 6, '2026-10-12')).toEqual([]);
  });
});

describe('isDarkSetStale: calendar months before the night (6 months default, S22; months are common practice)', () => {
  it.each([
    ['2026-04-12', 6, '2026-10-12', false, 'exactly 6 months old'],
    ['2026-04-11', 6, '2026-10-12', true, '6 months and 1 day'],
    ['2025-10-12', 12, '2026-10-12', false, 'exactly 12 months'],
    ['2025-10-11', 12, '2026-10-12', true, '12 months and 1 day'],
    ['2026-10-12', 1, '2026-10-12', false, 'taken today'],
    // 31 August − 6 months rolls over to 3 March, as the dry run's cutoff does
    ['2026-03-03', 6, '2026-08-31', false, 'month end, on the cutoff'],
    ['2026-03-02', 6, '2026-08-31', true, 'month end, before the cutoff'],
  ])('%s with %i months on %s → stale %s (%s)', (takenOn, months, today, stale) => {
    expect(isDarkSetStale(takenOn, months, today)).toBe(stale);
  });
});

describe('darkLibraryForDryRun: the library and the dry run agree', () => {
  const b = recipeBuilder(7000);
  const M31 = Object.keys(REFERENCE_TARGETS)[3]!;
  const stage = { ...b.container('stage', { targetId: M31, window: { notBefore: 'astronomical-dusk' } }, [b.node('slew'), b.node('guide'), b.node('meridian'), b.node('expose', { filter: 'L', exposureS: 120, count: 5 })]) };
  const tree = { children: [b.node('cool'), stage, b.node('warm'), b.node('park')] as RecipeNode[] };
  const set = (over: Partial<DarkLibrarySet>): DarkLibrarySet => ({ id: 'x', source: 'hand', version: 1, exposureS: 120, gain: 0, offset: 50, binning: 1, readoutMode: null, temperatureC: -10, frames: 30, takenOn: '2026-08-01', stale: false, notes: '', ...over });
  const codes = (sets: DarkLibrarySet[]) => {
    const input: DryRunInput = { tree, rig: defaultRigInput(), site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: darkLibraryForDryRun(sets) };
    return runDryRun(input).findings.map((f) => f.code).filter((c) => c.startsWith('darks'));
  };

  it('maps sets to the dry run’s shape (taken at noon UTC of the night, no readout mode when none)', () => {
    expect(darkLibraryForDryRun([set({ readoutMode: null })])).toEqual([{ exposureS: 120, gain: 0, offset: 50, binning: 1, temperatureC: -10, frames: 30, takenAt: '2026-08-01T12:00:00Z' }]);
    expect(darkLibraryForDryRun([set({ readoutMode: 'Standard' })])[0]!.readoutMode).toBe('Standard');
  });

  it('staleness at the 6-month boundary is the same in both', () => {
    for (const takenOn of ['2026-04-12', '2026-04-11']) {
      const stale = isDarkSetStale(takenOn, 6, '2026-10-12');
      expect(codes([set({ takenOn })])).toEqual(stale ? ['darks-stale'] : []);
    }
  });

  it('a set without a gain (null) covers only lights without one: the default rig’s lights take gain 0', () => {
    expect(codes([set({ gain: null })])).toEqual(['darks-missing']);
    expect(codes([set({ offset: null })])).toEqual(['darks-missing']);
    expect(codes([set({})])).toEqual([]);
  });
});

const toShoot = (over: Partial<DarkToShoot> = {}): DarkToShoot => ({ exposureS: 300, gain: 100, offset: 50, binning: 1, temperatureC: -10, ...over });
type Key = string;
const keyOf = (d: { exposureS: number; gain?: number | null; offset?: number | null; binning: number; temperatureC: number }): Key => [d.exposureS, d.gain ?? null, d.offset ?? null, d.binning, d.temperatureC].join('|');

/** Walks a darks recipe: each darks step's sets, checking it runs at the set-point of the cool step before it. */
function shotSets(children: RecipeNode[]): Key[] {
  const keys: Key[] = [];
  let setpoint: number | null = null;
  for (const n of children) {
    if (n.kind === 'cool') setpoint = n.setpointC;
    if (n.kind !== 'darks') continue;
    expect(n.temperatureC).toBe(setpoint);
    for (const exposureS of n.exposuresS) keys.push(keyOf({ ...n, exposureS }));
  }
  return keys;
}

describe('darksRecipeTree', () => {
  it('covers the optics first, cools per temperature (warmest first), one darks step per gain/offset/binning, warms at the end', () => {
    const tree = darksRecipeTree([toShoot({ exposureS: 300 }), toShoot({ exposureS: 60 }), toShoot({ exposureS: 300 }), toShoot({ temperatureC: -20, exposureS: 120 }), toShoot({ gain: null, offset: null })], 30);
    expect(recipeTreeSchema.safeParse(tree).success).toBe(true);
    expect(tree.children.map((n) => n.kind)).toEqual(['note', 'cool', 'darks', 'darks', 'cool', 'darks', 'warm']);
    const [note, cool] = tree.children;
    expect(note!.kind === 'note' && note.text).toMatch(/lens cap on or dust cover closed/);
    expect(cool).toMatchObject({ kind: 'cool', setpointC: -10 });
    expect(tree.children[2]).toMatchObject({ kind: 'darks', exposuresS: [60, 300], count: 30, gain: 100, offset: 50, binning: 1, temperatureC: -10 });
    expect(tree.children[3]).not.toHaveProperty('gain');
    expect(tree.children[5]).toMatchObject({ kind: 'darks', exposuresS: [120], temperatureC: -20 });
  });

  it('splits more than 50 exposures (the step’s limit) into several darks steps', () => {
    const many = Array.from({ length: 120 }, (_, i) => toShoot({ exposureS: i + 1 }));
    const steps = darksRecipeTree(many, 20).children.filter((n) => n.kind === 'darks');
    expect(steps.map((s) => s.kind === 'darks' && s.exposuresS.length)).toEqual([50, 50, 20]);
  });

  it('property: parses and shoots every requested set exactly once at its temperature', () => {
    const darkArb = fc.record({
      exposureS: fc.constantFrom(1, 30, 60, 120, 180, 300, 600),
      gain: fc.constantFrom(null, 0, 100, 139),
      offset: fc.constantFrom(null, 10, 50),
      binning: fc.integer({ min: 1, max: 4 }),
      temperatureC: fc.constantFrom(-25, -20, -15, -10, -5, 0, 5),
    });
    fc.assert(
      fc.property(fc.array(darkArb, { minLength: 1, maxLength: 60 }), fc.integer({ min: 1, max: 500 }), (darks, count) => {
        const tree = darksRecipeTree(darks, count);
        expect(recipeTreeSchema.safeParse(tree).success).toBe(true);
        const shot = shotSets(tree.children);
        expect(new Set(shot).size).toBe(shot.length);
        expect(new Set(shot)).toEqual(new Set(darks.map(keyOf)));
        expect(tree.children.every((n) => n.kind !== 'darks' || (n.count === count && n.exposuresS.length <= 50))).toBe(true);
        expect(tree.children[0]!.kind).toBe('note');
        expect(tree.children.at(-1)!.kind).toBe('warm');
      }),
      { numRuns: 150 },
    );
  });

  it('dry-runs as a cloudy-night recipe: its darks count as taken tonight', () => {
    const tree = darksRecipeTree([toShoot({ exposureS: 120, gain: 0, offset: 50 })], 30);
    const r = runDryRun({ tree, rig: defaultRigInput(), site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: [] });
    expect(r.timeline.filter((e) => e.kind === 'darks')).toHaveLength(1);
    expect(r.findings.filter((f) => f.severity === 'stop')).toEqual([]);
  });
});
