import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { RECIPE_DEFAULTS, defaultExposureS, defaultFlatAduPct } from '@/shared/recipe/defaults';
import { createNode } from '@/shared/recipe/factory';
import { isClockTime } from '@/shared/recipe/fields';
import { sequentialIds } from '@/shared/recipe/ids';
import { treeLimitIssues } from '@/shared/recipe/limits';
import { nodeSchema, recipeSchema, recipeTreeSchema } from '@/shared/recipe/schema';

const ids = sequentialIds(100);
const id = () => ids();

function issues(schema: z.ZodType, input: unknown): string[] {
  const r = schema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('nodeSchema defaults (trade-defaults.md)', () => {
  it('every node: enabled defaults to true, label optional', () => {
    const park = nodeSchema.parse({ id: id(), kind: 'park' });
    expect(park).toEqual({ id: park.id, kind: 'park', enabled: true });
  });

  it('cool: −10 °C (S1, S35); rate from the camera when empty', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'cool' })).toMatchObject({ setpointC: -10 });
    expect(nodeSchema.parse({ id: id(), kind: 'cool' })).not.toHaveProperty('maxRateCPerMin');
  });

  it('centre: 30″, 3 attempts, 5 s solves (practice)', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'centre' })).toMatchObject({ toleranceArcsec: 30, maxAttempts: 3, solveExposureS: 5 });
  });

  it('focus: 9 points × 5 s (practice)', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'focus' })).toMatchObject({ points: 9, exposureS: 5 });
  });

  it('expose: dither every frame (S13), bin 1, frame type light', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'expose', filter: 'L', exposureS: 180, count: 10 })).toMatchObject({ ditherEvery: 1, binning: 1, frameType: 'light' });
  });

  it('sub length by band: L 180 s, RGB 120 s, narrowband 300 s (S25, S4, S35)', () => {
    expect([defaultExposureS('L'), defaultExposureS('R'), defaultExposureS('G'), defaultExposureS('B')]).toEqual([180, 120, 120, 120]);
    expect([defaultExposureS('Ha'), defaultExposureS('OIII'), defaultExposureS('SII')]).toEqual([300, 300, 300]);
  });

  it('guide: settle 1.5 px for 10 s (practice; S4)', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'guide' })).toMatchObject({ settlePx: 1.5, settleTimeS: 10, calibrate: true });
  });

  it('meridian flip 5 min past (practice; S39), then recentre and refocus', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'meridian', policy: { kind: 'flip' } })).toMatchObject({ policy: { kind: 'flip', flipAfterMin: 5, refocus: true, recentre: true } });
  });

  it('flats and darks: 30 per set (S44, S18); flat level 50 % panel, 30 % sky', () => {
    expect(nodeSchema.parse({ id: id(), kind: 'flats', filters: ['L'] })).toMatchObject({ source: 'panel', count: 30 });
    expect(nodeSchema.parse({ id: id(), kind: 'darks', exposuresS: [300] })).toMatchObject({ count: 30, temperatureC: -10, binning: 1 });
    expect([defaultFlatAduPct('panel'), defaultFlatAduPct('sky')]).toEqual([50, 30]);
  });

  it('rules: refocus every 1 °C (practice; S14)', () => {
    const stage = nodeSchema.parse({ id: id(), kind: 'stage', rules: [{ id: id(), kind: 'refocus-on-temperature' }] });
    expect(stage).toMatchObject({ targetId: null, window: {}, children: [], rules: [{ deltaC: 1 }] });
    expect(RECIPE_DEFAULTS.rules.refocusEveryMinutes).toBe(60);
  });

  it('createNode builds every kind and parses to itself', () => {
    const kinds = ['stage', 'repeat', 'group', 'cool', 'warm', 'slew', 'centre', 'rotate', 'focus', 'expose', 'guide', 'meridian', 'wait', 'flats', 'darks', 'park', 'note'] as const;
    for (const kind of kinds) {
      const node = createNode(kind, {}, { newId: ids });
      expect(nodeSchema.parse(JSON.parse(JSON.stringify(node)))).toEqual(node);
    }
    expect(createNode('expose', { filter: 'Ha' }, { newId: ids })).toMatchObject({ exposureS: 300, count: 3 });
  });
});

describe('nodeSchema errors name the field', () => {
  const cases: [unknown, string][] = [
    [{ id: 'x', kind: 'park' }, 'id: Not a valid id (expected a uuid)'],
    [{ id: id(), kind: 'bogus' }, 'kind: Kind is one of stage, repeat, group'],
    [{ id: id(), kind: 'park', label: 'x'.repeat(81) }, 'label: A label has at most 80 characters'],
    [{ id: id(), kind: 'expose', filter: 'L', exposureS: -1, count: 1 }, 'exposureS: Exposure must be between 0.001 and 3600 s'],
    [{ id: id(), kind: 'expose', filter: 'L', exposureS: 60, count: 1.5 }, 'count: Frame count must be a whole number'],
    [{ id: id(), kind: 'repeat', until: {} }, 'until: Repeat until: give one of count, clock, altitudeBelowDeg, sunEvent'],
    [{ id: id(), kind: 'repeat', until: { count: 2, clock: '22:00' } }, 'until: Repeat until: give only one of count, clock, altitudeBelowDeg, sunEvent (found count and clock)'],
    [{ id: id(), kind: 'repeat', until: { count: 0 } }, 'until.count: Repeat count must be between 1 and 10000'],
    [{ id: id(), kind: 'repeat', until: { count: 'x' } }, 'until: Repeat until: count is not valid (Repeat count must be a number)'],
    [{ id: id(), kind: 'repeat', until: { clock: '25:00' } }, 'until: Repeat until: clock is not valid (Use a time as HH:MM'],
    [{ id: id(), kind: 'rotate', to: { positionAngleDeg: 10, matchFraming: true } }, 'to: Rotate to: give only one of positionAngleDeg, matchFraming'],
    [{ id: id(), kind: 'rotate', to: { positionAngleDeg: 360 } }, 'to.positionAngleDeg: Position angle must be below 360°'],
    [{ id: id(), kind: 'stage', window: { notBefore: 'dusk' } }, 'window.notBefore: Use a sun event (sunset, civil-dusk'],
    [{ id: id(), kind: 'stage', window: { endBy: '2025-02-30T05:00:00+01:00' } }, 'window.endBy: Not a calendar date'],
    [{ id: id(), kind: 'wait', until: { durationS: 0 } }, 'until.durationS: Duration must be between 1 and 86400 s'],
    [{ id: id(), kind: 'slew', to: { kind: 'radec', raDeg: 360, decDeg: 0 } }, 'to.raDeg: Right ascension must be below 360°'],
    [{ id: id(), kind: 'flats', filters: [] }, 'filters: Choose at least one filter'],
    [{ id: id(), kind: 'group', children: [{ id: id(), kind: 'note', text: ' ' }] }, 'children.0.text: Write the note'],
    [{ id: id(), kind: 'group', rules: [{ id: id(), kind: 'refocus-on-interval', every: { minutes: 60, frames: 10 } }] }, 'rules.0.every: Refocus every: give only one of minutes, frames'],
  ];
  it.each(cases)('%j', (input, expected) => {
    const found = issues(nodeSchema, input);
    expect(found.length).toBe(1);
    expect(found[0]).toContain(expected);
  });
});

describe('clock times', () => {
  it('accepts HH:MM and ISO 8601 with an offset, nothing else', () => {
    for (const ok of ['00:00', '23:59', '2025-03-01T21:30:00+01:00', '2025-03-01T21:30Z', '2025-03-01T21:30:00.5-05:00']) expect(isClockTime(ok)).toBe(true);
    for (const bad of ['24:00', '9:30', '2025-03-01T21:30:00', '2025-02-30T21:30Z', 'astronomical-dusk']) expect(isClockTime(bad)).toBe(false);
  });
});

describe('recipeTreeSchema limits (plan-format.md)', () => {
  const nest = (levels: number): unknown => {
    let node: Record<string, unknown> = { id: id(), kind: 'park' };
    for (let i = 0; i < levels - 1; i++) node = { id: id(), kind: 'group', children: [node] };
    return { children: [node] };
  };

  it('allows 8 levels and refuses 9, naming the path', () => {
    expect(recipeTreeSchema.safeParse(nest(8)).success).toBe(true);
    const errors = issues(recipeTreeSchema, nest(9));
    expect(errors).toEqual([`children.0.children.0.children.0.children.0.children.0.children.0.children.0.children.0.children.0: children[0]${'.children[0]'.repeat(8)} is nested 9 levels deep; a recipe allows at most 8`]);
  });

  it('allows 2000 nodes and refuses 2001', () => {
    const many = (n: number) => ({ children: Array.from({ length: n }, () => ({ id: id(), kind: 'park' })) });
    expect(recipeTreeSchema.safeParse(many(2000)).success).toBe(true);
    expect(issues(recipeTreeSchema, many(2001))).toEqual(['children: The recipe has 2001 steps and containers; at most 2000 are allowed']);
  });

  it('the limit check runs on raw input without recursion, e.g. before parsing an import', () => {
    expect(treeLimitIssues(nest(5000))[0]?.message).toContain('nested 9 levels deep');
    expect(treeLimitIssues('not a tree')).toEqual([]);
  });
});

describe('recipeSchema', () => {
  it('fills notes, rig and site; survives JSON', () => {
    const recipe = recipeSchema.parse({ name: ' Spring galaxies ', tree: { children: [] } });
    expect(recipe).toEqual({ name: 'Spring galaxies', notes: '', rigId: null, siteId: null, tree: { children: [] } });
    expect(issues(recipeSchema, { name: '', tree: { children: [] } })).toEqual(['name: Give the recipe a name']);
  });

  it('converts to JSON Schema (the plan schema is generated from it)', () => {
    const json = z.toJSONSchema(recipeSchema, { io: 'input' }) as { $defs?: Record<string, unknown> };
    expect(Object.keys(json.$defs ?? {})).toContain('RecipeNode');
  });
});
