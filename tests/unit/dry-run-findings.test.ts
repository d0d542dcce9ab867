import { Body, Equator, Observer } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import type { NodeParams } from '@/shared/recipe/factory';
import type { RecipeNode, RecipeRule } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { runDryRun, type DarkSet, type DryRunFinding, type DryRunInput, type FindingCode } from '@/shared/dry-run';
import { recipeBuilder, REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';

// Scenarios at the reference site (46.93° N) on 2026-10-12 (new Moon, astronomical dusk 20:29,
// dawn 06:03 local) unless a test says otherwise. Target ids as in REFERENCE_TARGETS.
const [VEIL, , , M31, , HEART, , M42] = Object.keys(REFERENCE_TARGETS) as [string, string, string, string, string, string, string, string];
const b = recipeBuilder(1000);
const rig = defaultRigInput();
const node = b.node;
const stage = (targetId: string, children: RecipeNode[], window: NodeParams<'stage'>['window'] = { notBefore: 'astronomical-dusk' }, rules: RecipeRule[] = []) => ({ ...b.container('stage', { targetId, window }, children), rules });
const guided = (frames: RecipeNode[]) => [node('slew'), node('guide'), node('meridian', { policy: { kind: 'flip' } }), ...frames];
const L = (count = 5, exposureS = 120) => node('expose', { filter: 'L', exposureS, count });
const night = (children: RecipeNode[]) => [node('cool'), ...children, node('warm'), node('park')];
const input = (children: RecipeNode[], extra: Partial<DryRunInput> = {}): DryRunInput => ({ tree: { children }, rig, site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: [], ...extra });
const run = (i: DryRunInput) => runDryRun(i).findings;
const of = (findings: DryRunFinding[], code: FindingCode) => findings.filter((f) => f.code === code);

describe('dry run findings: each code provoked, and absent once fixed', () => {
  it('sun-near (stop): a daytime slew passing near the Sun; (warn) a slew with the Sun above −4°', () => {
    const observer = new Observer(REFERENCE_SITE.latitudeDeg, REFERENCE_SITE.longitudeDeg, REFERENCE_SITE.elevationM);
    const sun = Equator(Body.Sun, new Date('2026-10-12T14:00:00Z'), observer, false, true);
    const nearSun = () => [node('slew', { to: { kind: 'radec', raDeg: sun.ra * 15 + 10, decDeg: sun.dec } }), node('park')];
    const day = of(run(input(nearSun(), { startTime: '2026-10-12T14:00:00Z' })), 'sun-near');
    expect(day[0]).toMatchObject({ severity: 'stop', time: expect.stringMatching(/^2026-10-12T14:00/) });
    expect(day[0]!.message).toMatch(/from the Sun, inside the 30° avoidance angle/);
    const dusk = of(run(input([node('slew', { to: { kind: 'altaz', altDeg: 60, azDeg: 20 } }), node('park')], { startTime: '2026-10-12T16:50:00Z' })), 'sun-near');
    expect(dusk.map((f) => f.severity)).toEqual(['warn', 'warn']);
    // fixed: the same slews after dusk
    expect(of(run(input([node('wait', { until: { sunEvent: 'civil-dusk' } }), ...nearSun()])), 'sun-near')).toEqual([]);
  });

  it('below-horizon (stop): a slew under the horizon profile (15° at azimuth 270°)', () => {
    const at = (altDeg: number) => input([node('wait', { until: { sunEvent: 'astronomical-dusk' } }), node('slew', { to: { kind: 'altaz', altDeg, azDeg: 270 } }), node('park')]);
    expect(of(run(at(5)), 'below-horizon')).toMatchObject([{ severity: 'stop' }]);
    expect(of(run(at(20)), 'below-horizon')).toEqual([]);
  });

  it('never-rises (stop): a target at δ −70° from 47° N; absent for a target that rises', () => {
    const south = { ...REFERENCE_TARGETS, [VEIL]: { designation: 'X 1', name: 'Deep south', raDeg: 100, decDeg: -70 } };
    const recipe = night([stage(VEIL, guided([L()]))]);
    expect(of(run(input(recipe, { targets: south })), 'never-rises')).toMatchObject([{ severity: 'stop', message: expect.stringContaining('never rises') }]);
    expect(of(run(input(recipe)), 'never-rises')).toEqual([]);
  });

  it('daylight (warn/stop by band): broadband in nautical twilight warns, narrowband tolerates −12°', () => {
    const twilight = (filter: string) => input(night([stage(M31, guided([node('expose', { filter, exposureS: 60, count: 5 })]), { notBefore: 'nautical-dusk' })]));
    expect(of(run(twilight('L')), 'daylight')).toMatchObject([{ severity: 'warn' }]);
    expect(of(run(twilight('Ha')), 'daylight')).toEqual([]);
    // civil twilight is 6° brighter than the broadband limit or more: a stop
    const civil = input(night([stage(M31, guided([L(5, 60)]), { notBefore: 'civil-dusk' })]), { options: {} });
    expect(of(run(civil), 'daylight')[0]).toMatchObject({ severity: 'stop' });
    expect(of(run(input(night([stage(M31, guided([L(5, 60)]))]))), 'daylight')).toEqual([]);
  });

  it('low-altitude (warn): M42 never clears a 45° minimum (it culminates at 37.6°); fine at 30°', () => {
    const at = (minAltitudeDeg: number) => input(night([stage(M42, guided([L()]), { notBefore: '03:00', minAltitudeDeg })]));
    expect(of(run(at(45)), 'low-altitude')).toMatchObject([{ severity: 'warn', message: expect.stringContaining('the stage is skipped') }]);
    expect(of(run(at(30)), 'low-altitude')).toEqual([]);
  });

  it('moon-near (warn): broadband 72° from a 72 % Moon 5 days from full (wants 105°); narrowband wants 25°', () => {
    const moonNight = (filter: string) => input(night([stage(M31, guided([node('expose', { filter, exposureS: 120, count: 10 })]))]), { nightDate: '2026-10-20' });
    expect(of(run(moonNight('L')), 'moon-near')).toMatchObject([{ severity: 'warn', message: expect.stringMatching(/broadband frames want 104\.99°/) }]);
    expect(of(run(moonNight('Ha')), 'moon-near')).toEqual([]);
  });

  it('past-dawn (warn): frames running into the morning; absent with endBy astronomical dawn', () => {
    const frames = () => guided([node('expose', { filter: 'Ha', exposureS: 300, count: 200 })]);
    const late = run(input(night([stage(HEART, frames(), { notBefore: '03:00' })])));
    expect(of(late, 'past-dawn').map((f) => f.severity)).toContain('warn');
    expect(of(late, 'past-dawn')[0]!.message).toMatch(/runs past astronomical dawn/);
    expect(of(run(input(night([stage(HEART, frames(), { notBefore: '03:00', endBy: 'astronomical-dawn' })]))), 'past-dawn')).toEqual([]);
  });

  it('past-dawn (warn): a recipe that never parks', () => {
    const unparked = run(input([node('cool'), stage(M31, guided([L()])), node('warm')]));
    expect(of(unparked, 'past-dawn')[0]!.message).toMatch(/without parking/);
  });

  it('meridian-unhandled (stop): frames across the meridian on a German mount with no policy', () => {
    const frames = (policy: RecipeNode[]) => input(night([stage(M31, [node('slew'), node('guide'), ...policy, L(30, 300)], { notBefore: '22:30', endBy: '01:30' })]));
    expect(of(run(frames([])), 'meridian-unhandled')).toMatchObject([{ severity: 'stop' }]);
    expect(of(run(frames([node('meridian', { policy: { kind: 'flip' } })])), 'meridian-unhandled')).toEqual([]);
    // a fork mount never flips
    expect(of(run({ ...frames([]), rig: { ...rig, mount: { ...rig.mount, type: 'fork' } } }), 'meridian-unhandled')).toEqual([]);
  });

  it('not-cooled (warn): lights with no cool step; (warn) a set-point out of reach; absent with a cool step', () => {
    const lights = () => stage(M31, guided([L()]));
    expect(of(run(input([lights(), node('park')])), 'not-cooled')).toMatchObject([{ severity: 'warn' }]);
    const deep = of(run(input([node('cool', { setpointC: -25 }), lights(), node('warm'), node('park')])), 'not-cooled');
    expect(deep.map((f) => f.message).join()).toMatch(/reaches only −20 °C/);
    expect(of(run(input(night([lights()]))), 'not-cooled')).toEqual([]);
  });

  it('filter-missing (stop): a filter the wheel does not hold (static check, merged)', () => {
    const withFilter = (filter: string) => input(night([stage(M31, guided([node('expose', { filter, exposureS: 60, count: 3 })]))]));
    expect(of(run(withFilter('Y')), 'filter-missing')).toMatchObject([{ severity: 'stop', time: null }]);
    expect(of(run(withFilter('L')), 'filter-missing')).toEqual([]);
  });

  it('rotator-limit (stop): a PA with no angle inside 0–180° of travel; (info) exactly 180° from the framing', () => {
    const rotatorRig: RigInput = { ...rig, rotator: { ...rig.rotator, present: true, minDeg: 0, maxDeg: 180 } };
    const rotateTo = (pa: number, r = rotatorRig) => input(night([stage(M31, [node('slew'), node('rotate', { to: { positionAngleDeg: pa } }), node('guide'), L()])]), { rig: r });
    expect(of(run(rotateTo(270)), 'rotator-limit')).toMatchObject([{ severity: 'stop' }]);
    expect(of(run(rotateTo(90)), 'rotator-limit')).toEqual([]);
    // M31's framing has PA 35°: 215° is the same field upside down
    const fullTravel = { ...rotatorRig, rotator: { ...rotatorRig.rotator, maxDeg: 360 } };
    expect(of(run(rotateTo(215, fullTravel)), 'rotator-limit')).toMatchObject([{ severity: 'info', message: expect.stringContaining('exactly 180°') }]);
  });

  it('focus-drift (warn): hours of frames as the air cools, with no refocus rule; absent with the rule', () => {
    const long = (rules: RecipeRule[]) => input(night([stage(HEART, [node('slew'), node('focus'), node('guide'), node('meridian', { policy: { kind: 'flip', refocus: false } }), L(60, 300)], { notBefore: 'astronomical-dusk' }, rules)]));
    expect(of(run(long([])), 'focus-drift')).toMatchObject([{ severity: 'warn' }]);
    const fixed = runDryRun(long([{ id: b.newId(), kind: 'refocus-on-temperature', deltaC: 1 }]));
    expect(of(fixed.findings, 'focus-drift')).toEqual([]);
    expect(fixed.timeline.some((e) => e.kind === 'focus' && e.what.startsWith('Refocus (rule'))).toBe(true);
  });

  it('darks-missing / darks-stale (warn): by the library and its age (6 months, S22)', () => {
    const recipe = night([stage(M31, guided([L(5, 120)]))]);
    const set = (takenAt: string): DarkSet => ({ exposureS: 120, gain: 0, offset: 50, binning: 1, temperatureC: -10, frames: 30, takenAt });
    expect(of(run(input(recipe)), 'darks-missing')).toMatchObject([{ severity: 'warn' }]);
    const stale = run(input(recipe, { darkLibrary: [set('2026-02-01T00:00:00Z')] }));
    expect(of(stale, 'darks-missing')).toEqual([]);
    expect(of(stale, 'darks-stale')).toMatchObject([{ severity: 'warn' }]);
    const fresh = run(input(recipe, { darkLibrary: [set('2026-08-01T00:00:00Z')] }));
    expect([...of(fresh, 'darks-missing'), ...of(fresh, 'darks-stale')]).toEqual([]);
    // a set 1.5 °C off the set-point does not match (±1 °C: S17, S44); darks taken tonight do
    expect(of(run(input(recipe, { darkLibrary: [{ ...set('2026-08-01T00:00:00Z'), temperatureC: -8.5 }] })), 'darks-missing')).toHaveLength(1);
    const tonight = input([...recipe, node('darks', { exposuresS: [120], temperatureC: -10, gain: 0, offset: 50 })]);
    expect(of(run(tonight), 'darks-missing')).toEqual([]);
  });

  it('unguided-long (warn): 300 s subs with no guiding; absent with a guide step', () => {
    expect(of(run(input(night([stage(M31, [node('slew'), L(5, 300)])]))), 'unguided-long')).toMatchObject([{ severity: 'warn' }]);
    expect(of(run(input(night([stage(M31, [node('slew'), node('guide'), L(5, 300)])]))), 'unguided-long')).toEqual([]);
  });

  it('endless-repeat (stop): until a circumpolar target sinks below 10°; absent until astronomical dawn', () => {
    const repeat = (until: NodeParams<'repeat'>['until']) => input(night([stage(HEART, [node('slew'), node('guide'), node('meridian', { policy: { kind: 'flip' } }), b.container('repeat', { until }, [node('expose', { filter: 'Ha', exposureS: 300, count: 1 })])], { notBefore: 'astronomical-dusk', minAltitudeDeg: 15 })]));
    const endless = runDryRun(repeat({ altitudeBelowDeg: 10 }));
    expect(of(endless.findings, 'endless-repeat')).toMatchObject([{ severity: 'stop', message: expect.stringContaining('stays above 10°') }]);
    // the loop stops safely at the end of darkness
    expect(Date.parse(endless.totals.nightEnd!)).toBeLessThan(Date.parse(endless.sky.astronomicalDawn!) + 30 * 60_000);
    expect(of(run(repeat({ sunEvent: 'astronomical-dawn' })), 'endless-repeat')).toEqual([]);
  });

  it('endless-repeat (stop): an iteration that takes no time', () => {
    const idle = input(night([b.container('repeat', { until: { clock: '23:00' } }, [node('wait', { until: { clock: '21:00' } })])]));
    expect(of(run(idle), 'endless-repeat')).toMatchObject([{ severity: 'stop', message: expect.stringContaining('makes no progress') }]);
  });
});
