import { describe, expect, it } from 'vitest';
import { transitTime } from '@/shared/ephemeris/sky';
import type { NodeParams } from '@/shared/recipe/factory';
import type { RecipeNode, RecipeRule } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { runDryRun, type DryRunInput, type DryRunResult, type TimelineEvent } from '@/shared/dry-run';
import { recipeBuilder, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';

// M31 from the reference site on 2026-10-12: it crosses the meridian near 00:48 local (22:48 UTC).
// Default rig: German mount, tracks 15 min past the meridian, flips 300 s after it (mount setting).
const M31_ID = Object.keys(REFERENCE_TARGETS)[3]!;
const M31 = REFERENCE_TARGETS[M31_ID]!;
const TRANSIT = transitTime(M31.raDeg / 15, M31.decDeg, REFERENCE_SITE, new Date('2026-10-12T12:00:00Z')).getTime();
const MIN = 60_000;
const b = recipeBuilder(3000);
const rig = defaultRigInput();
const node = b.node;
const iso = (ms: number) => new Date(ms).toISOString().slice(0, 19) + 'Z';

function night(policy: RecipeNode[], opts: { rig?: RigInput; exposureS?: number; before?: RecipeNode[]; notBefore?: number; rules?: RecipeRule[] } = {}): DryRunInput {
  const window: NodeParams<'stage'>['window'] = { notBefore: iso(opts.notBefore ?? TRANSIT - 80 * MIN), endBy: iso(TRANSIT + 100 * MIN) };
  const frames = b.container('repeat', { until: { sunEvent: 'astronomical-dawn' } }, [node('expose', { filter: 'L', exposureS: opts.exposureS ?? 300, count: 1 })]);
  const stage = { ...b.container('stage', { targetId: M31_ID, window }, [...policy, node('slew'), ...(opts.before ?? []), node('centre'), node('guide'), frames]), rules: opts.rules ?? [] };
  return { tree: { children: [node('cool'), stage, node('warm'), node('park')] }, rig: opts.rig ?? rig, site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: [] };
}

const ms = (e: TimelineEvent, key: 'start' | 'end' = 'start') => Date.parse(e[key]);
const lights = (r: DryRunResult) => r.timeline.filter((e) => e.kind === 'expose' && (e.frames ?? 0) > 0);
const flips = (r: DryRunResult) => r.timeline.filter((e) => e.kind === 'flip');

describe('meridian handling on a German mount', () => {
  it('flip: west of the pier before, east after; flips once the hour angle passes 5 min, after the running frame', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip', flipAfterMin: 5, refocus: true, recentre: true } })]));
    const [slew, ...parts] = flips(r);
    expect(slew!.what).toMatch(/east side of the pier/);
    expect(slew!.pierSide).toBe('west');
    expect(parts.map((e) => e.pierSide)).toEqual(['east', 'east', 'east']);
    expect(parts.map((e) => e.what.split(':')[0])).toEqual(['Centre after the flip', 'Guiding restarts after the flip', 'Refocus after the flip']);
    // due 5 sidereal minutes past transit; the frame running then (300 s + download) finishes first
    expect(ms(slew!)).toBeGreaterThanOrEqual(TRANSIT + 5 * MIN / 1.0027379 - 1000);
    expect(ms(slew!)).toBeLessThan(TRANSIT + 5 * MIN + 320_000);
    for (const e of lights(r)) expect(e.pierSide).toBe(ms(e) < ms(slew!) ? 'west' : 'east');
    expect(lights(r).filter((e) => ms(e, 'end') <= ms(slew!)).every((e) => e.hourAngleH! < 5 / 60)).toBe(true);
    expect(r.findings.filter((f) => f.code === 'meridian-unhandled')).toEqual([]);
    // trade-defaults.md "flip cost" 3–12 min (sum of the parts)
    const costMin = flips(r).reduce((s, e) => s + ms(e, 'end') - ms(e), 0) / MIN;
    expect(costMin).toBeGreaterThan(3);
    expect(costMin).toBeLessThan(12);
  });

  it('flip without a rotator: the sky position angle turns 180°', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip' } })]));
    const flip = flips(r)[0]!;
    const before = lights(r).filter((e) => ms(e) < ms(flip));
    const after = lights(r).filter((e) => ms(e) > ms(flip));
    expect(new Set(before.map((e) => e.skyPaDeg))).toEqual(new Set([0]));
    expect(new Set(after.map((e) => e.skyPaDeg))).toEqual(new Set([180]));
    expect(flip.what).toMatch(/sky PA 0° → 180° \(turned 180°, no rotator restore\)/);
  });

  it('flip with a rotator and a rotate step matching the framing: the rotator restores PA 35°', () => {
    const withRotator: RigInput = { ...rig, rotator: { ...rig.rotator, present: true, minDeg: 0, maxDeg: 360 } };
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip' } })], { rig: withRotator, before: [node('rotate', { to: { matchFraming: true } })] }));
    const flipStart = ms(flips(r)[0]!);
    expect(flips(r).some((e) => e.what.startsWith('Rotator restores the framing after the flip: 180°'))).toBe(true);
    for (const e of lights(r)) expect(e.skyPaDeg).toBe(35);
    expect(lights(r).some((e) => ms(e) > flipStart && e.pierSide === 'east')).toBe(true);
  });

  it('pause-before: no frame runs past 10 min before the meridian; pause to the mount flip delay, then flip', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'pause-before', minutesBefore: 10 } })]));
    const pause = r.timeline.find((e) => e.kind === 'pause')!;
    const lastBefore = lights(r).filter((e) => ms(e) < ms(pause)).at(-1)!;
    expect(ms(lastBefore, 'end')).toBeLessThanOrEqual(TRANSIT - 10 * MIN / 1.0027379 + 1000);
    // the mount's flip delay: 300 s after the meridian
    expect(Math.abs(ms(pause, 'end') - (TRANSIT + 300_000))).toBeLessThan(1500);
    expect(flips(r)[0]!.start).toBe(pause.end);
    expect(lights(r).at(-1)!.pierSide).toBe('east');
    expect(lastBefore.pierSide).toBe('west');
  });

  it('end-stage: the stage ends rather than cross the meridian; the pier side never changes', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'end-stage' } })]));
    expect(flips(r)).toEqual([]);
    expect(new Set(lights(r).map((e) => e.pierSide))).toEqual(new Set(['west']));
    expect(ms(lights(r).at(-1)!, 'end')).toBeLessThanOrEqual(TRANSIT);
    expect(Date.parse(r.totals.stageFinish[0]!.end!)).toBeLessThanOrEqual(TRANSIT);
  });

  it('no policy: meridian-unhandled (stop); no frame runs past the mount limit (15 min)', () => {
    const r = runDryRun(night([]));
    expect(r.findings.filter((f) => f.code === 'meridian-unhandled')).toMatchObject([{ severity: 'stop' }]);
    expect(ms(lights(r).at(-1)!, 'end')).toBeLessThanOrEqual(TRANSIT + 15 * MIN / 1.0027379 + 1000);
    expect(flips(r)).toEqual([]);
  });

  it('rule 1: a 600 s sub that would pass the mount limit (11 min) is ended at the 10-min flip and lost', () => {
    const tight: RigInput = { ...rig, mount: { ...rig.mount, meridian: { trackPastMin: 11, flipDelayS: 300 } } };
    // the first frame starts about 3 min after the meridian (slew, centre, guide) and would end near +13 min
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip', flipAfterMin: 10 } })], { rig: tight, exposureS: 600, notBefore: TRANSIT - 1 * MIN }));
    const lost = r.timeline.find((e) => e.what.includes('frame ended at the flip'))!;
    expect(lost.end).toBe(flips(r)[0]!.start);
    expect(Math.abs(ms(lost, 'end') - (TRANSIT + 10 * MIN / 1.0027379))).toBeLessThan(1000);
    expect(r.totals.overheadByKind.lost).toBeGreaterThan(0);
    expect(r.findings.filter((f) => f.code === 'meridian-unhandled')).toMatchObject([{ severity: 'warn' }]);
    for (const e of lights(r).filter((x) => x.pierSide === 'west')) expect(ms(e, 'end')).toBeLessThanOrEqual(TRANSIT + 11 * MIN);
  });

  it('a flip set past the mount limit is a stop; the dry run flips at the limit', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip', flipAfterMin: 20 } })]));
    const unhandled = r.findings.filter((f) => f.code === 'meridian-unhandled');
    expect(unhandled.find((f) => f.severity === 'stop')!.message).toContain('stops tracking 15 min past');
    expect(ms(flips(r)[0]!)).toBeLessThanOrEqual(TRANSIT + 15 * MIN + 1000);
  });

  it('a slew after the meridian goes straight to the east side: no flip', () => {
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip' } })], { notBefore: TRANSIT + 20 * MIN }));
    expect(flips(r)).toEqual([]);
    expect(new Set(lights(r).map((e) => e.pierSide))).toEqual(new Set(['east']));
  });

  it('rule 2: a rule refocus waits out the 10 minutes before a flip; a focus step there is flagged', () => {
    const rules: RecipeRule[] = [{ id: b.newId(), kind: 'refocus-on-interval', every: { minutes: 20 } }];
    const r = runDryRun(night([node('meridian', { policy: { kind: 'flip', refocus: false } })], { rules }));
    const flipStart = ms(flips(r)[0]!);
    const ruleFocus = r.timeline.filter((e) => e.kind === 'focus');
    expect(ruleFocus.length).toBeGreaterThan(2);
    for (const e of ruleFocus) expect(flipStart - ms(e) < 0 || flipStart - ms(e) >= 10 * MIN - 1000).toBe(true);
    const late = runDryRun(night([node('meridian', { policy: { kind: 'flip' } })], { notBefore: TRANSIT - 4 * MIN, before: [node('focus')] }));
    expect(late.findings.filter((f) => f.code === 'focus-drift')).toMatchObject([{ severity: 'info', message: expect.stringContaining('before the meridian flip') }]);
  });

  it('other mounts have no pier side and never flip', () => {
    const altAz = runDryRun({ ...night([node('meridian', { policy: { kind: 'flip' } })]), rig: { ...rig, mount: { ...rig.mount, type: 'alt-az' } } });
    expect(flips(altAz)).toEqual([]);
    expect(new Set(lights(altAz).map((e) => e.pierSide))).toEqual(new Set([null]));
  });
});
