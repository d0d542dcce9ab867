import { describe, expect, it } from 'vitest';
import { flatCombos, flatsRecipeTree } from '@/shared/calibration/flats';
import type { StoredFrame } from '@/shared/calibration/types';
import { runDryRun, type DryRunInput, type TimelineEvent } from '@/shared/dry-run';
import { recipeTreeSchema, nodeSchema } from '@/shared/recipe/schema';
import { summarizeNode } from '@/shared/recipe/summary';
import { toTemplateTree } from '@/shared/recipe/template';
import type { NodeOf } from '@/shared/recipe/types';
import { cameraDownloadTimeS } from '@/shared/rig/optics';
import { defaultRigInput, rigInputSchema, type RigInput } from '@/shared/rig/schema';
import type { FlatCombo } from '@/shared/schemas/calibration-api';
import { recipeBuilder, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';
import { frameRecord, storedFrame } from './calibration-fixtures';

const NIGHT = '2026-01-15';
const light = (filter: string | null, rotatorAngleDeg: number | null, focuserPositionSteps: number | null, over: Partial<StoredFrame> = {}) => frameRecord({ frameType: 'light', filter, rotatorAngleDeg, focuserPositionSteps, nightDate: NIGHT, ...over });
const flat = (filter: string | null, rotatorAngleDeg: number | null, focuserPositionSteps: number | null, nightDate: string) => frameRecord({ frameType: 'flat', exposureS: 1, filter, rotatorAngleDeg, focuserPositionSteps, nightDate });

describe('flatCombos: the night’s (filter, rotator angle, focus) and the flats on record (flats valid while the train, focus, filter and rotator are unchanged: trade-defaults.md, S18)', () => {
  const lights = [
    light('Ha', 123.44, 15200),
    light('Ha', 123.36, 15200),
    light('Ha', 123.4, 15200),
    light('Ha', 303.4, 15200),
    light('OIII', 123.4, 15180),
    light('OIII', 123.4, 15180),
    light('L', null, null),
    light(null, 123.4, 15200),
    light('Ha', 123.4, 15200, { nightDate: '2026-01-16' }),
    frameRecord({ frameType: 'dark', nightDate: NIGHT, setTempC: -10 }),
  ];
  const flats = [
    flat('Ha', 123.8, 15201, '2026-01-16'), // 0.4° and 1 step off, next day: serves
    flat('Ha', 124.0, 15200, '2026-01-16'), // 0.6° off: no
    flat('Ha', 123.4, 15202, '2026-01-16'), // 2 steps off: no
    flat('ha', 123.4, 15200, '2026-01-18'), // 3 days later, filter case differs: serves
    flat('Ha', 123.4, 15200, '2026-01-19'), // 4 days later: no
    flat('Ha', 123.4, 15200, '2026-01-14'), // the night before: no
    flat('OIII', 123.0, 15179, NIGHT), // same night, 0.4° and 1 step: serves
    flat('L', null, null, NIGHT), // nulls match nulls
    flat('L', 0, null, NIGHT), // a rotator angle does not match none
    flat('Ha', 303.2, 15200, NIGHT), // serves the flipped-rotator combination
  ];
  const combos = flatCombos(lights, flats, NIGHT);

  it('groups the night’s lights by filter, rotator (0.1°) and focus, sorted, nulls last', () => {
    expect(combos).toEqual([
      { filter: 'Ha', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200, lightFrames: 3, flatFrames: 2, biasOnRecord: false },
      { filter: 'Ha', rotatorAngleDeg: 303.4, focuserPositionSteps: 15200, lightFrames: 1, flatFrames: 1, biasOnRecord: false },
      { filter: 'L', rotatorAngleDeg: null, focuserPositionSteps: null, lightFrames: 1, flatFrames: 1, biasOnRecord: false },
      { filter: 'OIII', rotatorAngleDeg: 123.4, focuserPositionSteps: 15180, lightFrames: 2, flatFrames: 1, biasOnRecord: false },
      { filter: null, rotatorAngleDeg: 123.4, focuserPositionSteps: 15200, lightFrames: 1, flatFrames: 0, biasOnRecord: false },
    ]);
  });

  it('wraps a rotator angle that rounds to 360° onto 0°, and matches flats across 0°', () => {
    const around = flatCombos([light('L', 359.97, 100), light('L', 0.02, 100)], [flat('L', 359.8, 100, NIGHT)], NIGHT);
    expect(around).toEqual([{ filter: 'L', rotatorAngleDeg: 0, focuserPositionSteps: 100, lightFrames: 2, flatFrames: 1, biasOnRecord: false }]);
  });

  it('reads the positions from FITS headers (ROTATANG, FOCUSPOS) through intake', () => {
    const spec = { type: 'Light Frame', dateObs: '2026-01-15T22:00:00', exposureS: 300, filter: 'Ha', rotatorAngleDeg: 87.46, focuserPositionSteps: 15200 };
    const fromFits = [storedFrame(spec), storedFrame({ ...spec, dateObs: '2026-01-15T22:05:00' })];
    const flatFits = storedFrame({ type: 'Flat Field', dateObs: '2026-01-16T08:00:00', exposureS: 1, filter: 'Ha', rotatorAngleDeg: 87.5, focuserPositionSteps: 15200 });
    expect(flatCombos(fromFits, [flatFits], NIGHT)).toEqual([{ filter: 'Ha', rotatorAngleDeg: 87.5, focuserPositionSteps: 15200, lightFrames: 2, flatFrames: 1, biasOnRecord: false }]);
  });
});

describe('the flats step’s recorded positions (matchFramingOf kind "positions")', () => {
  const id = () => crypto.randomUUID();
  const issues = (matchFramingOf: unknown) => {
    const r = nodeSchema.safeParse({ id: id(), kind: 'flats', filters: ['Ha'], matchFramingOf });
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };

  it('accepts a rotator angle, a focuser position or both', () => {
    expect(issues({ kind: 'positions', rotatorAngleDeg: 123.4 })).toEqual([]);
    expect(issues({ kind: 'positions', focuserPositionSteps: 15200 })).toEqual([]);
    expect(issues({ kind: 'positions', rotatorAngleDeg: 0, focuserPositionSteps: 0 })).toEqual([]);
  });

  it.each([
    [{ kind: 'positions' }, 'matchFramingOf: Give a rotator angle, a focuser position or both'],
    [{ kind: 'positions', rotatorAngleDeg: 360 }, 'matchFramingOf.rotatorAngleDeg: Rotator angle must be below 360°'],
    [{ kind: 'positions', rotatorAngleDeg: -0.1 }, 'matchFramingOf.rotatorAngleDeg: Rotator angle must be between 0 and 360°'],
    [{ kind: 'positions', focuserPositionSteps: 15200.5 }, 'matchFramingOf.focuserPositionSteps: Focuser position must be a whole number'],
    [{ kind: 'positions', focuserPositionSteps: 1_000_001 }, 'matchFramingOf.focuserPositionSteps: Focuser position must be between 0 and 1000000 steps'],
    [{ kind: 'place' }, 'matchFramingOf.kind: Match the framing of a stage, a recorded framing, or recorded rotator and focuser positions'],
  ])('%j → %s', (input, message) => {
    expect(issues(input)).toEqual([message]);
  });

  it('summarises as "at rotator 123.4°, focuser 15200"', () => {
    const node = nodeSchema.parse({ id: id(), kind: 'flats', filters: ['Ha'], count: 20, matchFramingOf: { kind: 'positions', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200 } });
    expect(summarizeNode(node)).toBe('Panel flats: Ha, 20 each, at rotator 123.4°, focuser 15200');
    const onlyFocus = nodeSchema.parse({ id: id(), kind: 'flats', filters: ['L'], count: 20, matchFramingOf: { kind: 'positions', focuserPositionSteps: 800 } });
    expect(summarizeNode(onlyFocus)).toBe('Panel flats: L, 20 each, at focuser 800');
  });

  it('is left out of a club template (positions belong to one rig)', () => {
    const flats = nodeSchema.parse({ id: id(), kind: 'flats', filters: ['Ha'], matchFramingOf: { kind: 'positions', rotatorAngleDeg: 10 } });
    expect(toTemplateTree({ children: [flats] }).tree.children[0]).not.toHaveProperty('matchFramingOf');
  });
});

describe('flatsRecipeTree', () => {
  const combos: FlatCombo[] = [
    { filter: 'Ha', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200, lightFrames: 3, flatFrames: 0, biasOnRecord: false },
    { filter: 'L', rotatorAngleDeg: null, focuserPositionSteps: null, lightFrames: 1, flatFrames: 0, biasOnRecord: false },
    { filter: 'OIII', rotatorAngleDeg: null, focuserPositionSteps: 15180, lightFrames: 2, flatFrames: 0, biasOnRecord: false },
    { filter: null, rotatorAngleDeg: 123.4, focuserPositionSteps: 15200, lightFrames: 4, flatFrames: 0, biasOnRecord: false },
  ];

  it('a note first, then one flats step per combination with a filter, returning to the recorded positions', () => {
    const tree = flatsRecipeTree(combos, 'panel', 25);
    expect(recipeTreeSchema.safeParse(tree).success).toBe(true);
    expect(tree.children.map((n) => n.kind)).toEqual(['note', 'flats', 'flats', 'flats']);
    const note = tree.children[0] as NodeOf<'note'>;
    expect(note.text).toMatch(/return the rotator and the focuser to the positions/);
    expect(note.text).toMatch(/optical train must be unchanged since the lights/);
    expect(note.text).toMatch(/4 light frames recorded no usable filter name/);
    expect(tree.children.slice(1)).toMatchObject([
      { kind: 'flats', filters: ['Ha'], count: 25, source: 'panel', matchFramingOf: { kind: 'positions', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200 } },
      { kind: 'flats', filters: ['L'], count: 25, source: 'panel' },
      { kind: 'flats', filters: ['OIII'], matchFramingOf: { kind: 'positions', focuserPositionSteps: 15180 } },
    ]);
    expect(tree.children[2]).not.toHaveProperty('matchFramingOf');
    expect((tree.children[3] as NodeOf<'flats'>).matchFramingOf).not.toHaveProperty('rotatorAngleDeg');
  });

  it('sky flats: the note points at the twilight window instead of the panel', () => {
    const tree = flatsRecipeTree(combos.slice(0, 1), 'sky', 20);
    const note = tree.children[0] as NodeOf<'note'>;
    expect(note.text).toMatch(/twilight window/);
    expect(note.text).not.toMatch(/no usable filter/);
    expect(tree.children[1]).toMatchObject({ source: 'sky', count: 20 });
  });
});

describe('dry run: flats at recorded positions', () => {
  const b = recipeBuilder(8000);
  const withRotator = (over: Partial<RigInput['rotator']> = {}): RigInput => rigInputSchema.parse({ ...defaultRigInput(), rotator: { present: true, minDeg: 0, maxDeg: 360, speedDegPerS: 5, skyOffsetDeg: 0, ...over } });
  const run = (rig: RigInput, matchFramingOf: NodeOf<'flats'>['matchFramingOf']) => {
    const node = b.node('flats', { filters: ['Ha'], count: 30, source: 'panel', matchFramingOf });
    const input: DryRunInput = { tree: { children: [node] }, rig, site: REFERENCE_SITE, nightDate: '2026-10-12', startTime: '2026-10-12T20:00:00Z', targets: REFERENCE_TARGETS, darkLibrary: [] };
    const events = runDryRun(input).timeline.filter((e) => e.nodeId === node.id);
    return Object.fromEntries(events.map((e) => [e.kind, seconds(e)]));
  };
  const seconds = (e: TimelineEvent) => (Date.parse(e.end) - Date.parse(e.start)) / 1000;
  // panel flats: count × (1 s + download) + one filter change of 3 s (trade-defaults.md rule 5, S21)
  const flatsS = (rig: RigInput) => 30 * (1 + cameraDownloadTimeS(rig.camera, 1)) + rig.filterWheel.changeTimeS;

  it('turns the rotator |Δ| / speed from 0° and moves the focuser once (5 s, common practice) before the flats', () => {
    const rig = withRotator();
    const t = run(rig, { kind: 'positions', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200 });
    expect(t.rotate).toBeCloseTo(123.4 / 5, 2);
    expect(t.focus).toBeCloseTo(5, 2);
    expect(t.flats).toBeCloseTo(flatsS(rig), 2);
  });

  it('takes the equivalent angle within travel nearest the rotator (300° on a −180…180° rotator is −60°: 60° of travel)', () => {
    const t = run(withRotator({ minDeg: -180, maxDeg: 180 }), { kind: 'positions', rotatorAngleDeg: 300 });
    expect(t.rotate).toBeCloseTo(60 / 5, 2);
    expect(t.focus).toBeUndefined();
  });

  it('without a rotator only the focuser moves; without positions neither', () => {
    const rig = defaultRigInput();
    expect(run(rig, { kind: 'positions', rotatorAngleDeg: 123.4, focuserPositionSteps: 15200 })).toEqual({ focus: expect.closeTo(5, 2), flats: expect.closeTo(flatsS(rig), 2) });
    expect(Object.keys(run(rig, undefined))).toEqual(['flats']);
  });
});
