/**
 * The flats recipe made from a night's lights, played by the dry run: sky flats against the dusk
 * twilight window, and recorded rotator angles against the rig's rotator travel.
 */
import { Body, Observer, SearchAltitude } from 'astronomy-engine';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dryRunResultSchema, type DryRunResult } from '@/shared/dry-run';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { NodeOf } from '@/shared/recipe/types';
import { dateObs, intakeOk, light } from './calibration-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let u: TestUser;

beforeAll(async () => {
  h = await startHarness();
  u = await signUp(h);
  expect((await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite)).status).toBe(201);
});
afterAll(async () => h.close());

/** The evening the flats are dry-run on (the calibration tests' M31 night). */
const DATE = '2026-10-12';

/**
 * When the Sun sinks through `altDeg` on the evening of DATE at the test site: astronomy-engine's
 * SearchAltitude (geometric altitude, as the twilight definitions and the dry run use it).
 */
function sunDescendsThrough(altDeg: number): number {
  const observer = new Observer(validSite.latitudeDeg, validSite.longitudeDeg, validSite.elevationM);
  const found = SearchAltitude(Body.Sun, observer, -1, new Date(`${DATE}T12:00:00Z`), 1, altDeg);
  if (!found) throw new Error(`The Sun does not reach ${altDeg}°`);
  return found.date.getTime();
}

// trade-defaults.md "sky-flat window": dusk Sun −4° to −10° (practice; S19, S20).
const opensMs = sunDescendsThrough(-4);
const closesMs = sunDescendsThrough(-10);
/** The dry run's Sun and the reference agree within a second here; a minute of slack keeps the checks about the window. */
const EPHEMERIS_SLACK_MS = 60_000;

/**
 * One sky-flats step of `count` flats (trade-defaults.md rule 5: count × (exposure + download),
 * plus a filter change): 3 s exposure (S21, ≥3 s with a mechanical shutter), download of the
 * default rig's 6248 × 4176 px 16-bit sensor over USB 3 = 2 B × px ÷ 250 MB/s + 0.3 s (S7), and
 * the default 3 s filter change (RIG_DEFAULTS).
 */
function skyFlatsStepS(count: number): number {
  const downloadS = (2 * 6248 * 4176) / 250e6 + 0.3;
  return count * (3 + downloadS) + 3;
}

/** Lights of one night, one per (filter, rotator angle), three minutes apart from 20:00 UTC. */
async function lightsOfNight(night: string, combos: { filter: string; rotatorAngleDeg: number; focuserPositionSteps?: number }[]) {
  const files = combos.map((c, i) => light(`${night}_${c.filter}_${c.rotatorAngleDeg}.fits`, { dateObs: dateObs(`${night}T20:00:00`, i * 3), exposureS: 120, object: 'M 31', ...c }));
  const res = await intakeOk(u, files);
  expect(res.recorded.light).toBe(combos.length);
}

/** POST /api/calibration/flats-recipe, then the recipe's flats steps in tree order. */
async function flatsRecipe(body: { nightDate: string; source: 'panel' | 'sky'; count?: number; rigId?: string }) {
  const made = await u.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send(body);
  expect(made.status, JSON.stringify(made.body)).toBe(201);
  const recipeId = made.body.recipeId as string;
  const tree = recipeTreeSchema.parse((await u.agent.get(`/api/recipes/${recipeId}`)).body.recipe.tree);
  const steps = tree.children.filter((n): n is NodeOf<'flats'> => n.kind === 'flats');
  return { recipeId, steps };
}

async function dryRun(recipeId: string): Promise<DryRunResult> {
  const res = await u.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({ date: DATE });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return dryRunResultSchema.parse(res.body.dryRun.result);
}

const flatsEvents = (r: DryRunResult) => r.timeline.filter((e) => e.kind === 'flats');
const withCode = (r: DryRunResult, code: string) => r.findings.filter((f) => f.code === code);

describe('sky flats from the flats recipe against the dusk window (Sun −4° to −10°)', () => {
  it('two combinations of 25 fit the window: they wait for it to open and end well before it closes, no window finding', async () => {
    await lightsOfNight('2026-10-05', [
      { filter: 'L', rotatorAngleDeg: 90 },
      { filter: 'R', rotatorAngleDeg: 90 },
    ]);
    const { recipeId, steps } = await flatsRecipe({ nightDate: '2026-10-05', source: 'sky' });
    expect(steps.map((s) => [s.filters, s.source, s.count, s.matchFramingOf])).toEqual([
      [['L'], 'sky', 25, { kind: 'positions', rotatorAngleDeg: 90 }],
      [['R'], 'sky', 25, { kind: 'positions', rotatorAngleDeg: 90 }],
    ]);
    const r = await dryRun(recipeId);
    expect(withCode(r, 'daylight')).toEqual([]);
    // The run starts at sunset (Sun −0.83°), before the window: the first step waits for −4°.
    const wait = r.timeline.find((e) => e.kind === 'wait' && e.nodeId === steps[0]!.id);
    expect(wait?.what).toBe('Wait for the dusk sky-flat window (Sun at −4°)');
    const events = flatsEvents(r);
    expect(events.map((e) => e.nodeId)).toEqual(steps.map((s) => s.id));
    const startMs = Date.parse(events[0]!.start);
    const endMs = Date.parse(events.at(-1)!.end);
    expect(Math.abs(startMs - opensMs)).toBeLessThan(EPHEMERIS_SLACK_MS);
    expect((endMs - startMs) / 1000).toBeCloseTo(2 * skyFlatsStepS(25), 0);
    expect(endMs).toBeLessThan(closesMs - EPHEMERIS_SLACK_MS);
  });

  it('6 filters × 3 rotator angles, 40 each, overrun the window: the first step past its close raises one `daylight`', async () => {
    const filters = ['L', 'R', 'G', 'B', 'Ha', 'OIII'];
    const angles = [0, 120, 240];
    await lightsOfNight('2026-10-06', filters.flatMap((filter) => angles.map((rotatorAngleDeg) => ({ filter, rotatorAngleDeg }))));
    const { recipeId, steps } = await flatsRecipe({ nightDate: '2026-10-06', source: 'sky', count: 40 });
    expect(steps).toHaveLength(18);
    // The premise: 18 × 143 s ≈ 43 min against a window of ≈ 35 min on this evening. (At 25 flats,
    // 18 steps need ≈ 27 min and fit: the default rig has no rotator, so turning costs nothing.)
    expect(18 * skyFlatsStepS(40) * 1000).toBeGreaterThan(closesMs - opensMs + 5 * EPHEMERIS_SLACK_MS);

    const r = await dryRun(recipeId);
    const late = withCode(r, 'daylight');
    expect(late.length).toBeGreaterThan(0);
    for (const f of late) {
      expect(f.severity).toBe('warn');
      expect(f.message).toMatch(/^These sky flats need \d+ (min|s) from \d\d:\d\d, but the dusk window \(Sun −4° to −10°\) has \d+ (min|s) left$/);
      expect(f.fix).toBe('Take fewer flats or filters per twilight, start them as the window opens, or use a panel');
    }
    // One finding per twilight window, on the first step that overruns it (every later one does too).
    expect(late).toHaveLength(1);
    const firstLate = steps.findIndex((s) => s.id === late[0]!.nodeId);
    expect(firstLate).toBeGreaterThan(0);
    // …and it is the first step whose flats end after the Sun passes −10°.
    const ends = new Map(flatsEvents(r).map((e) => [e.nodeId, Date.parse(e.end)]));
    expect(ends.get(steps[firstLate]!.id)!).toBeGreaterThan(closesMs - EPHEMERIS_SLACK_MS);
    expect(ends.get(steps[firstLate - 1]!.id)!).toBeLessThan(closesMs + EPHEMERIS_SLACK_MS);
    expect(withCode(r, 'rotator-limit')).toEqual([]);
  });
});

describe('flats at recorded rotator angles against the rotator travel', () => {
  let rigId: string;
  beforeAll(async () => {
    const rig = await u.agent
      .post('/api/rigs')
      .set('Origin', ORIGIN)
      .send({ name: 'Refractor with a short cable wrap', rotator: { present: true, minDeg: 0, maxDeg: 270 } });
    expect(rig.status, JSON.stringify(rig.body)).toBe(201);
    rigId = rig.body.rig.id;
    // Lights at 120° (inside the travel) and at 300° (the camera turned by hand past it).
    await lightsOfNight('2026-10-07', [
      { filter: 'L', rotatorAngleDeg: 120, focuserPositionSteps: 15200 },
      { filter: 'L', rotatorAngleDeg: 300, focuserPositionSteps: 15200 },
    ]);
  });

  it('an angle outside 0°–270° stops the flats step (`rotator-limit`); the one inside turns the rotator', async () => {
    const { recipeId, steps } = await flatsRecipe({ nightDate: '2026-10-07', source: 'panel', rigId });
    expect(steps.map((s) => s.matchFramingOf)).toEqual([
      { kind: 'positions', rotatorAngleDeg: 120, focuserPositionSteps: 15200 },
      { kind: 'positions', rotatorAngleDeg: 300, focuserPositionSteps: 15200 },
    ]);
    const r = await dryRun(recipeId);
    const limits = withCode(r, 'rotator-limit');
    expect(limits).toEqual([
      expect.objectContaining({
        severity: 'stop',
        nodeId: steps[1]!.id,
        message: 'Rotator angle 300° is outside its travel (0° to 270°)',
        fix: 'Widen the travel limits if the cables allow, or turn the camera by hand for these flats',
      }),
    ]);
    // From 0° (the rotator's start within travel) to 120° at the default 5 °/s.
    const turn = r.timeline.find((e) => e.kind === 'rotate' && e.nodeId === steps[0]!.id);
    expect(turn?.what).toBe('Rotator to 120° for flats: 120°');
    expect((Date.parse(turn!.end) - Date.parse(turn!.start)) / 1000).toBeCloseTo(120 / 5, 3);
  });

  it('the same steps on a rig without a rotator raise nothing: the angle is set by hand', async () => {
    const { recipeId } = await flatsRecipe({ nightDate: '2026-10-07', source: 'panel' });
    const r = await dryRun(recipeId);
    expect(withCode(r, 'rotator-limit')).toEqual([]);
    expect(r.timeline.filter((e) => e.kind === 'rotate')).toEqual([]);
  });
});
