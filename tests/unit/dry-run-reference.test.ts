import { beforeAll, describe, expect, it } from 'vitest';
import type { NodeParams } from '@/shared/recipe/factory';
import type { RecipeNode, RecipeRule } from '@/shared/recipe/types';
import { defaultRigInput } from '@/shared/rig/schema';
import { runDryRun, type DryRunInput, type DryRunResult } from '@/shared/dry-run';
import { recipeBuilder, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';
import { stepNight, type SteppedNight } from '@/tests/helpers/stepping-simulator';

/*
 * The engine (events found by search, frames run in blocks) against the naive stepping
 * simulator (one second at a time, the ephemeris primitives asked every second) over a whole
 * realistic night at the reference site on 2026-10-20 (Moon 72 % lit, setting at 02:12):
 * the Western Veil in Ha/OIII until it sinks below 40° (it crosses the meridian: a flip), M31
 * in LRGB until 02:45 with the Moon near it, then M42, which the stage waits for to clear 30°,
 * until astronomical dawn (a second flip), with temperature refocus rules on the first two.
 */
const [VEIL, , , M31, , , , M42] = Object.keys(REFERENCE_TARGETS) as [string, string, string, string, string, string, string, string];
const b = recipeBuilder(500);

function stage(targetId: string, window: NodeParams<'stage'>['window'], until: NodeParams<'repeat'>['until'], blocks: { filter: string; exposureS: number; count: number }[], rules: RecipeRule[]) {
  const frames = b.container('repeat', { until }, blocks.map((x) => b.node('expose', { ...x, ditherEvery: 2 })));
  const flip = b.node('meridian', { policy: { kind: 'flip', flipAfterMin: 5, refocus: true, recentre: true } });
  return { ...b.container('stage', { targetId, window }, [b.node('slew'), b.node('centre'), b.node('focus', { filter: blocks[0]!.filter }), b.node('guide'), flip, frames]), rules };
}

const refocus = (deltaC: number): RecipeRule[] => [{ id: b.newId(), kind: 'refocus-on-temperature', deltaC }];
const tree: { children: RecipeNode[] } = {
  children: [
    b.node('cool', { setpointC: -10 }),
    stage(VEIL, { notBefore: 'astronomical-dusk' }, { altitudeBelowDeg: 40 }, [{ filter: 'Ha', exposureS: 300, count: 3 }, { filter: 'OIII', exposureS: 300, count: 3 }], refocus(1)),
    stage(M31, { endBy: '02:45' }, { sunEvent: 'astronomical-dawn' }, [{ filter: 'L', exposureS: 120, count: 10 }, { filter: 'R', exposureS: 120, count: 4 }, { filter: 'G', exposureS: 120, count: 4 }, { filter: 'B', exposureS: 120, count: 4 }], refocus(0.5)),
    stage(M42, { endBy: 'astronomical-dawn' }, { sunEvent: 'astronomical-dawn' }, [{ filter: 'L', exposureS: 60, count: 20 }], []),
    b.node('warm'),
    b.node('park'),
  ],
};
const input: DryRunInput = { tree, rig: defaultRigInput(), site: REFERENCE_SITE, nightDate: '2026-10-20', targets: REFERENCE_TARGETS, darkLibrary: [] };

describe('dry run against the per-second stepping simulator (a whole realistic night)', () => {
  let engine: DryRunResult;
  let stepped: SteppedNight;
  beforeAll(() => {
    engine = runDryRun(input);
    stepped = stepNight(input);
  }, 60_000);

  it('plays the same steps in the same order, every one within a minute', () => {
    expect(engine.timeline.map((e) => `${e.kind}|${e.nodeId}|${e.frames ?? ''}`)).toEqual(stepped.events.map((e) => `${e.kind}|${e.nodeId}|${e.frames ?? ''}`));
    let worstS = 0;
    engine.timeline.forEach((e, i) => {
      const s = stepped.events[i]!;
      worstS = Math.max(worstS, Math.abs(Date.parse(e.start) - s.startMs) / 1000, Math.abs(Date.parse(e.end) - s.endMs) / 1000);
    });
    expect(worstS).toBeLessThanOrEqual(60);
    // in practice the two agree to about a second (the simulator's one-second grid)
    expect(worstS).toBeLessThan(2);
  });

  it('covers what the night is meant to exercise: two flips, a rise wait, altitude and dawn ends, rule refocuses', () => {
    const whats = engine.timeline.map((e) => e.what);
    expect(whats.filter((w) => w.startsWith('Meridian flip'))).toHaveLength(2);
    expect(whats.some((w) => w.startsWith('Wait for Orion Nebula to clear 30°'))).toBe(true);
    expect(whats.filter((w) => w.startsWith('Refocus (rule')).length).toBeGreaterThanOrEqual(3);
    expect(engine.timeline.length).toBeGreaterThan(60);
    expect(engine.totals.shutterOpenS).toBeGreaterThan(8 * 3600);
  });

  it('finishes each step within a minute of the simulator', () => {
    const span = (events: { nodeId: string | null; startMs: number; endMs: number }[]) => {
      const m = new Map<string, [number, number]>();
      for (const e of events) {
        const key = e.nodeId ?? '';
        const s = m.get(key);
        m.set(key, s ? [Math.min(s[0], e.startMs), Math.max(s[1], e.endMs)] : [e.startMs, e.endMs]);
      }
      return m;
    };
    const ours = span(engine.timeline.map((e) => ({ nodeId: e.nodeId, startMs: Date.parse(e.start), endMs: Date.parse(e.end) })));
    const theirs = span(stepped.events);
    expect([...ours.keys()].sort()).toEqual([...theirs.keys()].sort());
    for (const [key, [start, end]] of ours) {
      expect(Math.abs(start - theirs.get(key)![0])).toBeLessThanOrEqual(60_000);
      expect(Math.abs(end - theirs.get(key)![1])).toBeLessThanOrEqual(60_000);
    }
  });

  it('raises the same set of finding codes', () => {
    const codes = new Set(engine.findings.map((f) => f.code));
    expect([...codes].sort()).toEqual([...stepped.codes].sort());
    expect(codes).toEqual(new Set(['darks-missing', 'moon-near', 'focus-drift']));
  });
});
