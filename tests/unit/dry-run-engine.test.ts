import { describe, expect, it } from 'vitest';
import type { NodeParams } from '@/shared/recipe/factory';
import { altAzOf } from '@/shared/ephemeris/sky';
import { nodeAt } from '@/shared/recipe/tree-read';
import type { RecipeNode, RecipeRule } from '@/shared/recipe/types';
import { defaultRigInput } from '@/shared/rig/schema';
import { dryRunResultSchema, runDryRun, scanNights, type DryRunInput, type DryRunResult } from '@/shared/dry-run';
import { recipeBuilder, referenceInput, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';

const [, , , M31, , HEART] = Object.keys(REFERENCE_TARGETS) as [string, string, string, string, string, string];
const b = recipeBuilder(5000);
const node = b.node;
const rig = defaultRigInput();
const input = (children: RecipeNode[], extra: Partial<DryRunInput> = {}): DryRunInput => ({ tree: { children }, rig, site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: [], ...extra });
const stage = (targetId: string, children: RecipeNode[], window: NodeParams<'stage'>['window'] = { notBefore: 'astronomical-dusk' }, rules: RecipeRule[] = []) => ({ ...b.container('stage', { targetId, window }, children), rules });
const L = (count: number, exposureS = 120) => node('expose', { filter: 'L', exposureS, count });
const frames = (r: DryRunResult) => r.timeline.filter((e) => e.kind === 'expose').reduce((s, e) => s + (e.frames ?? 0), 0);

describe('runDryRun: the reference night (8 stages, > 1,000 frames, ~10 h of darkness)', () => {
  const r = runDryRun(referenceInput());

  it('matches the API schema', () => {
    expect(dryRunResultSchema.safeParse(r).success).toBe(true);
  });

  it('takes over 1,000 frames in a small timeline, every stage finishing in order', () => {
    expect(frames(r)).toBeGreaterThan(1000);
    expect(r.timeline.length).toBeGreaterThan(100);
    expect(r.timeline.length).toBeLessThan(400);
    expect(r.totals.stageFinish).toHaveLength(8);
    const ends = r.totals.stageFinish.map((s) => Date.parse(s.end!));
    expect([...ends].sort((x, y) => x - y)).toEqual(ends);
    expect(r.sky.darkHours).toBeGreaterThan(9.5);
  });

  it('accounts for every second: elapsed = shutter-open + overheads + idle, with no gaps between events', () => {
    const overhead = Object.values(r.totals.overheadByKind).reduce((s, x) => s + x, 0);
    expect(Math.abs(r.totals.shutterOpenS + overhead + r.totals.idleS - r.totals.elapsedS)).toBeLessThan(2);
    for (let i = 1; i < r.timeline.length; i += 1) expect(Math.abs(Date.parse(r.timeline[i]!.start) - Date.parse(r.timeline[i - 1]!.end))).toBeLessThanOrEqual(1);
    // trade-defaults.md rule 9: 65–90 % typical (the reference night idles 1.6 h between cooling at sunset and dusk)
    expect(r.totals.efficiency).toBeGreaterThan(0.6);
    expect(r.totals.efficiency).toBeLessThan(0.9);
    expect(r.totals.efficiency).toBeCloseTo(r.totals.shutterOpenS / r.totals.elapsedS, 3);
  });

  it('integration by target and filter adds up to the shutter-open time; events carry their node paths', () => {
    const sum = Object.values(r.totals.integrationByTargetAndFilter).flatMap((byFilter) => Object.values(byFilter)).reduce((s, t) => s + t.seconds, 0);
    expect(sum).toBeCloseTo(r.totals.shutterOpenS, 0);
    const tree = referenceInput().tree;
    for (const e of r.timeline.filter((x) => x.path !== null)) {
      const indexes = [...e.path!.matchAll(/\[(\d+)\]/g)].map((m) => Number(m[1]));
      expect(nodeAt(tree, indexes)?.id).toBe(e.nodeId);
    }
  });

  it('records the slack before fixed times and the darks the lights need', () => {
    expect(r.totals.slackBeforeFixed).toHaveLength(8);
    expect(r.totals.slackBeforeFixed[0]!.slackS).toBeGreaterThan(3600);
    expect(r.darksNeeded.map((d) => d.exposureS).sort()).toEqual([20, 45]);
    expect(r.darksNeeded.every((d) => !d.covered && d.temperatureC === -10 && d.binning === 1)).toBe(true);
    expect(r.totals.dawn).toBe(r.sky.astronomicalDawn);
    expect(Date.parse(r.totals.nightEnd!)).toBeGreaterThan(Date.parse(r.totals.dawn!));
  });
});

describe('runDryRun: windows, repeats and rules', () => {
  it('starts at sunset by default, or at the given start time', () => {
    const one = runDryRun(input([node('cool')]));
    expect(Date.parse(one.timeline[0]!.start)).toBe(Date.parse(one.sky.sunset!));
    const later = runDryRun(input([node('cool')], { startTime: '2026-10-12T19:00:00Z' }));
    expect(later.timeline[0]!.start).toBe('2026-10-12T19:00:00.000Z');
  });

  it('endBy ends the stage: a frame starts only if it ends by then', () => {
    const r = runDryRun(input([node('cool'), stage(M31, [node('slew'), node('guide'), L(100, 300)], { notBefore: 'astronomical-dusk', endBy: '22:00' })]));
    const endBy = Date.parse('2026-10-12T20:00:00Z');
    const last = r.timeline.filter((e) => e.kind === 'expose').at(-1)!;
    expect(Date.parse(last.end)).toBeLessThanOrEqual(endBy);
    expect(Date.parse(last.end)).toBeGreaterThan(endBy - 320_000);
  });

  it('a repeat until the target sinks stops before a frame would end below the altitude', () => {
    const r = runDryRun(input([node('cool'), stage(HEART, [node('slew'), node('guide'), node('meridian', { policy: { kind: 'flip' } }), b.container('repeat', { until: { altitudeBelowDeg: 50 } }, [L(1, 300)])], { notBefore: '03:00' })]));
    const last = r.timeline.filter((e) => e.kind === 'expose').at(-1)!;
    const heart = REFERENCE_TARGETS[HEART]!;
    const altAt = (ms: number) => altAzOf(heart.raDeg / 15, heart.decDeg, REFERENCE_SITE, new Date(ms)).altitudeDeg;
    expect(altAt(Date.parse(last.end))).toBeGreaterThanOrEqual(50);
    // one more frame (dither + 300 s + download) would have ended below 50°
    expect(altAt(Date.parse(last.end) + 313_000)).toBeLessThan(50);
  });

  it('repeats by count and until a clock time', () => {
    const counted = runDryRun(input([node('cool'), stage(M31, [node('slew'), node('guide'), b.container('repeat', { until: { count: 3 } }, [L(2, 60)])])]));
    expect(frames(counted)).toBe(6);
    const clocked = runDryRun(input([node('cool'), stage(M31, [node('slew'), node('guide'), b.container('repeat', { until: { clock: '22:30' } }, [L(1, 60)])])]));
    const last = clocked.timeline.filter((e) => e.kind === 'expose').at(-1)!;
    expect(Date.parse(last.end)).toBeLessThanOrEqual(Date.parse('2026-10-12T20:30:00Z'));
    expect(Date.parse(last.end)).toBeGreaterThan(Date.parse('2026-10-12T20:28:00Z'));
  });

  it('refocus-on-interval by frames and recentre-on-drift insert steps into the timeline', () => {
    const rules: RecipeRule[] = [
      { id: b.newId(), kind: 'refocus-on-interval', every: { frames: 10 } },
      { id: b.newId(), kind: 'recentre-on-drift', driftArcmin: 0.5 },
    ];
    const r = runDryRun(input([node('cool'), stage(M31, [node('slew'), node('focus'), node('guide'), node('meridian', { policy: { kind: 'flip' } }), L(40, 60)], undefined, rules)]));
    const refocus = r.timeline.filter((e) => e.what.startsWith('Refocus (rule: 10 frames'));
    expect(refocus).toHaveLength(3);
    // 0.5′ at 1′/h guided (common practice): a re-centre every 30 min
    const recentre = r.timeline.filter((e) => e.what.startsWith('Re-centre (rule'));
    expect(recentre.length).toBeGreaterThanOrEqual(1);
    expect(r.timeline.some((e) => e.kind === 'guide' && e.what === 'Guiding restarts')).toBe(true);
  });

  it('dusk sky flats wait for the Sun at −4° and must fit before −10°', () => {
    const flats = (count: number) => runDryRun(input([node('flats', { source: 'sky', filters: ['L', 'R', 'G'], count }), node('park')], { startTime: '2026-10-12T16:40:00Z' }));
    const ok = flats(20);
    const wait = ok.timeline.find((e) => e.kind === 'wait')!;
    expect(wait.what).toMatch(/dusk sky-flat window/);
    expect(ok.findings.filter((f) => f.code === 'daylight')).toEqual([]);
    expect(flats(200).findings.filter((f) => f.code === 'daylight')).toMatchObject([{ severity: 'warn', message: expect.stringContaining('sky flats need') }]);
  });
});

describe('scanNights', () => {
  it('dry-runs consecutive nights and reports integration and finding counts with progress', () => {
    const calls: number[] = [];
    const nights = scanNights(referenceInput(), '2026-10-10', 5, (done) => calls.push(done));
    expect(nights.map((n) => n.date)).toEqual(['2026-10-10', '2026-10-11', '2026-10-12', '2026-10-13', '2026-10-14']);
    expect(calls).toEqual([1, 2, 3, 4, 5]);
    for (const n of nights) {
      expect(n.integrationS).toBeGreaterThan(6 * 3600);
      expect(n.usableIntegrationS).toBeLessThanOrEqual(n.integrationS);
      expect(n.findings.warn).toBeGreaterThan(0);
      expect(n.codes).toContain('darks-missing');
    }
  });
});
