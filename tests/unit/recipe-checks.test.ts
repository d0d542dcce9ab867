import { describe, expect, it } from 'vitest';
import { checkRecipe, type CheckOptions, type RecipeCheckCode } from '@/shared/recipe/checks';
import { createNode, type NodeParams } from '@/shared/recipe/factory';
import { sequentialIds } from '@/shared/recipe/ids';
import type { NodeKind, NodeOf, RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';

const newId = sequentialIds();
const TARGET = '00000000-0000-4000-8000-00000000aaaa';
const node = <K extends NodeKind>(kind: K, params: NodeParams<K> = {}): NodeOf<K> => createNode(kind, params, { newId });
const stage = (children: RecipeNode[], params: NodeParams<'stage'> = { targetId: TARGET }) => ({ ...node('stage', params), children });
const repeat = (until: NodeParams<'repeat'>['until'], children: RecipeNode[]) => ({ ...node('repeat', { until }), children });
const group = (children: RecipeNode[]) => ({ ...node('group'), children });
const tree = (...children: RecipeNode[]): RecipeTree => ({ children });
const expose = (params: NodeParams<'expose'> = {}) => node('expose', { filter: 'L', exposureS: 60, count: 20, ...params });

const rig: RigInput = defaultRigInput();
const site = { duskTempC: 10 };

function codes(t: RecipeTree, opts: CheckOptions = { rig, site }): RecipeCheckCode[] {
  return checkRecipe(t, opts).map((f) => f.code);
}

/** A clean stage: points at a target, guided, subs within limits. */
const goodStage = () => stage([node('slew'), node('centre'), node('focus'), node('guide'), expose()]);

describe('checkRecipe', () => {
  it('a sound recipe has no findings', () => {
    expect(checkRecipe(tree(node('cool'), goodStage(), node('warm'), node('park')), { rig, site })).toEqual([]);
  });

  it('findings carry code, severity, node id, path, message and fix', () => {
    const bad = expose({ filter: 'Y' });
    const [finding] = checkRecipe(tree(stage([node('guide'), bad])), { rig });
    expect(finding).toEqual({
      code: 'filter-missing',
      severity: 'stop',
      nodeId: bad.id,
      path: 'children[0].children[1]',
      message: 'Filter "Y" is not in the wheel of My rig',
      fix: 'Choose one of L, R, G, B, Ha, OIII, SII',
    });
  });

  describe('filter-missing (stop)', () => {
    it('flags expose, centre, focus and flats filters not in the wheel; suggests the slot of the same band', () => {
      const narrow = { ...rig, filterWheel: { ...rig.filterWheel, slots: [{ name: 'Astro Ha 7nm', band: 'Ha' as const, focusOffsetSteps: 0 }] } };
      const found = checkRecipe(tree(stage([node('guide'), expose({ filter: 'Ha' }), node('centre', { filter: 'L' }), node('focus', { filter: 'Ha' })]), node('flats', { filters: ['Ha'] })), { rig: narrow });
      expect(found.filter((f) => f.code === 'filter-missing').map((f) => f.fix)).toEqual([
        'Use "Astro Ha 7nm", the rig\'s Ha filter',
        'Choose one of Astro Ha 7nm',
        'Use "Astro Ha 7nm", the rig\'s Ha filter',
        'Use "Astro Ha 7nm", the rig\'s Ha filter',
      ]);
    });
    it('matches slot names regardless of case, and is skipped without a rig', () => {
      expect(codes(tree(stage([node('guide'), expose({ filter: 'ha' })])))).not.toContain('filter-missing');
      expect(codes(tree(stage([node('guide'), expose({ filter: 'Y' })])), {})).not.toContain('filter-missing');
    });
  });

  describe('no-target (stop)', () => {
    it('flags pointing steps outside a stage', () => {
      expect(codes(tree(expose(), node('centre'), node('rotate', { to: { positionAngleDeg: 10 } }), node('slew')), { rig: { ...rig, rotator: { ...rig.rotator, present: true } } })).toEqual(['no-target', 'no-target', 'no-target', 'no-target']);
    });
    it('flags them in a stage without a target, and a wait on the altitude outside a stage', () => {
      expect(codes(tree(stage([node('guide'), expose()], {})))).toEqual(['stage-no-target', 'no-target']);
      expect(codes(tree(node('wait', { until: { altitudeAboveDeg: 30 } })))).toEqual(['no-target']);
    });
    it('accepts an explicit slew to RA/Dec before them, a stage target or a stage framing', () => {
      expect(codes(tree(node('slew', { to: { kind: 'radec', raDeg: 10, decDeg: 41 } }), node('guide'), node('centre'), expose()))).toEqual([]);
      expect(codes(tree(stage([node('slew'), node('guide'), expose()])))).toEqual([]);
      const framed = stage([node('slew'), node('guide'), expose()], { framing: { raDeg: 10, decDeg: 41, positionAngleDeg: 0 } });
      expect(codes(tree(framed))).toEqual(['stage-no-target']);
    });
    it('an explicit slew does not stand in for the stage target of a slew-to-stage-target', () => {
      expect(codes(tree(node('slew', { to: { kind: 'radec', raDeg: 10, decDeg: 41 } }), node('slew')))).toEqual(['no-target']);
    });
  });

  describe('endless-repeat (stop)', () => {
    it('flags a repeat whose count is 0 or missing (an unvalidated draft)', () => {
      const zero = { ...repeat({ count: 3 }, [expose()]), until: { count: 0 } } as RecipeNode;
      const missing = { ...repeat({ count: 3 }, [expose()]), until: undefined } as unknown as RecipeNode;
      expect(codes(tree(stage([node('guide'), zero, missing])))).toEqual(['endless-repeat', 'endless-repeat']);
    });
    it('flags an altitude end outside a stage with a target, and a body where no time passes', () => {
      expect(codes(tree(repeat({ altitudeBelowDeg: 30 }, [node('wait', { until: { durationS: 60 } })])))).toEqual(['endless-repeat']);
      expect(codes(tree(repeat({ sunEvent: 'astronomical-dawn' }, [node('note'), group([node('note')])])))).toEqual(['endless-repeat']);
    });
    it('accepts counts, clock times, sun events and altitudes in a targeted stage', () => {
      expect(codes(tree(stage([node('guide'), repeat({ count: 3 }, [expose()]), repeat({ clock: '04:00' }, [expose()]), repeat({ sunEvent: 'astronomical-dawn' }, [expose()]), repeat({ altitudeBelowDeg: 30 }, [expose()])])))).toEqual([]);
    });
  });

  describe('setpoint-unreachable (warn)', () => {
    it('flags a set-point below dusk ambient minus the camera’s largest drop', () => {
      const found = checkRecipe(tree(node('cool', { setpointC: -25 })), { rig, site });
      expect(found.map((f) => [f.code, f.severity])).toEqual([['setpoint-unreachable', 'warn']]);
      expect(found[0]!.message).toBe('−25 °C is below what the camera reaches at dusk: 10 °C ambient − 30 °C = −20 °C');
      expect(found[0]!.fix).toBe('Set the set-point to −20 °C or warmer');
    });
    it('accepts a reachable set-point, and skips without a rig or a site', () => {
      expect(codes(tree(node('cool', { setpointC: -20 })))).toEqual([]);
      expect(codes(tree(node('cool', { setpointC: -25 })), { rig })).toEqual([]);
      expect(codes(tree(node('cool', { setpointC: -25 })), { site })).toEqual([]);
    });
  });

  describe('no-rotator (stop)', () => {
    const rotate = () => stage([node('rotate')]);
    it('flags a rotate step on a rig without a rotator', () => {
      expect(codes(tree(rotate()))).toEqual(['no-rotator']);
    });
    it('accepts it with a rotator, and skips without a rig', () => {
      expect(codes(tree(rotate()), { rig: { ...rig, rotator: { ...rig.rotator, present: true } } })).toEqual([]);
      expect(codes(tree(rotate()), {})).toEqual([]);
    });
  });

  describe('unguided-long (warn)', () => {
    it('flags subs over 120 s (common practice) with no guide step before them in the stage', () => {
      expect(codes(tree(stage([expose({ exposureS: 180 })])))).toEqual(['unguided-long']);
      expect(codes(tree(stage([expose({ exposureS: 180 }), node('guide')])))).toEqual(['unguided-long']);
      expect(codes(tree(node('guide'), stage([expose({ exposureS: 180 })])))).toEqual(['unguided-long']);
    });
    it('accepts 120 s or less, a guide step earlier in the stage (also inside a group), or a higher limit', () => {
      expect(codes(tree(stage([expose({ exposureS: 120 })])))).toEqual([]);
      expect(codes(tree(stage([group([node('guide')]), repeat({ count: 2 }, [expose({ exposureS: 300 })])])))).toEqual([]);
      expect(codes(tree(stage([expose({ exposureS: 180 })])), { unguidedLimitS: 200 })).toEqual([]);
    });
    it('suggests adding a guider when the rig has none', () => {
      const found = checkRecipe(tree(stage([expose({ exposureS: 180 })])), { rig: { ...rig, guider: { ...rig.guider, present: false } } });
      expect(found[0]!.fix).toBe('Keep subs at or below 120 s, or add a guider to the rig');
    });
  });

  describe('duplicate-id (stop)', () => {
    it('flags a node or rule that repeats an earlier id, even when switched off', () => {
      const a = node('park');
      const s = { ...stage([{ ...a, enabled: false }]), rules: [{ id: a.id, kind: 'recentre-on-drift' as const, driftArcmin: 2 }] };
      const found = checkRecipe(tree(a, s)).filter((f) => f.code === 'duplicate-id');
      expect(found.map((f) => f.path)).toEqual(['children[1].rules[0]', 'children[1].children[0]']);
    });
    it('is quiet when ids are unique', () => {
      expect(codes(tree(node('park'), node('park')))).toEqual([]);
    });
  });

  describe('empty-container (warn)', () => {
    it('flags an empty container and one whose steps are all switched off', () => {
      expect(codes(tree(group([])))).toEqual(['empty-container']);
      expect(checkRecipe(tree(group([{ ...node('park'), enabled: false }])))[0]!.message).toBe('Every step in this group is switched off');
    });
    it('is quiet for a container with a step, and for a switched-off empty one', () => {
      expect(codes(tree(group([node('park')])))).toEqual([]);
      expect(codes(tree({ ...group([]), enabled: false }))).toEqual([]);
    });
  });

  describe('darks-uncapped (info)', () => {
    it('reminds to cover the optics for every darks step', () => {
      const found = checkRecipe(tree(node('darks', { exposuresS: [300] })));
      expect(found.map((f) => [f.code, f.severity])).toEqual([['darks-uncapped', 'info']]);
      expect(found[0]!.fix).toContain('Cover the optics');
    });
    it('is quiet without darks', () => {
      expect(codes(tree(node('park')))).toEqual([]);
    });
  });

  describe('stage-no-target (warn)', () => {
    it('flags a stage without a target', () => {
      expect(codes(tree(stage([node('park')], {})))).toEqual(['stage-no-target']);
    });
    it('is quiet with a target', () => {
      expect(codes(tree(stage([node('park')])))).toEqual([]);
    });
  });

  describe('dither-sanity (info)', () => {
    it('flags fewer than 12 dithers per filter and target when a denser cadence would help (S13)', () => {
      const found = checkRecipe(tree(stage([node('guide'), expose({ count: 20, ditherEvery: 5 }), expose({ filter: 'R', count: 30, ditherEvery: 0 })])));
      expect(found.map((f) => f.message)).toEqual(['Only 4 dithers across 20 L frames; at least 12 per filter is common practice', 'Only 0 dithers across 30 R frames; at least 12 per filter is common practice']);
      expect(found.map((f) => f.fix)).toEqual(['Dither every frame', 'Dither every 2 frames']);
    });
    it('counts repeats and adds up the steps of one filter on one target', () => {
      const split = tree(stage([node('guide'), repeat({ count: 4 }, [expose({ count: 5, ditherEvery: 2 })]), expose({ count: 2, ditherEvery: 1 })]));
      expect(codes(split)).toEqual([]);
      const sparse = tree(stage([node('guide'), repeat({ count: 2 }, [expose({ count: 10, ditherEvery: 4 })])]));
      expect(codes(sparse)).toEqual(['dither-sanity']);
    });
    it('in open-ended repeats flags only never dithering; few frames dithered every frame pass', () => {
      expect(codes(tree(stage([node('guide'), repeat({ sunEvent: 'astronomical-dawn' }, [expose({ count: 1, ditherEvery: 3 })])])))).toEqual([]);
      expect(codes(tree(stage([node('guide'), repeat({ sunEvent: 'astronomical-dawn' }, [expose({ count: 1, ditherEvery: 0 })])])))).toEqual(['dither-sanity']);
      expect(codes(tree(stage([node('guide'), expose({ count: 5, ditherEvery: 1 })])))).toEqual([]);
    });
  });

  describe('focus-points-low (warn)', () => {
    it('flags a focus run of fewer than 5 points (practice)', () => {
      expect(codes(tree(node('focus', { points: 4 })))).toEqual(['focus-points-low']);
    });
    it('accepts 5 or more', () => {
      expect(codes(tree(node('focus', { points: 5 })))).toEqual([]);
    });
  });

  it('skips switched-off nodes and everything inside them', () => {
    expect(codes(tree({ ...stage([expose({ filter: 'Y', exposureS: 600 })], {}), enabled: false }, { ...node('focus', { points: 3 }), enabled: false }))).toEqual([]);
  });
});
