/**
 * Bias sets: bias frames recorded through intake are grouped into sets of the dark library,
 * stale by the dark validity, removable by their owner only; the flats plan says per
 * combination whether fresh bias is on record at its lights' gain, offset and binning.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { darkLibrarySchema, flatsPlanSchema, type BiasLibrarySet } from '@/shared/schemas/calibration-api';
import type { CameraFrameSpec } from '@/tests/helpers/fits';
import { CAMERA, dateObs, frameFile, intakeOk, light, type IntakeFile } from './calibration-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;

/** A user with the test site (Europe/Zurich) as default. */
async function imager(): Promise<TestUser> {
  const u = await signUp(h);
  const res = await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
  expect(res.status).toBe(201);
  return u;
}

beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h.close());

/** YYYY-MM-DD `months` calendar months before today (UTC), on the 15th. */
function monthsAgo(months: number): string {
  const now = new Date();
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - months, 15)).toISOString().slice(0, 10);
}

/** `count` bias frames at the test camera's settings, one a minute from `start` (evening, so the night is the start's date). */
function biasFrames(prefix: string, start: string, count: number, extra: Partial<CameraFrameSpec> = {}): IntakeFile[] {
  return Array.from({ length: count }, (_, i) => frameFile(`${prefix}_${String(i + 1).padStart(4, '0')}.fits`, { type: 'Bias Frame', dateObs: dateObs(start, i), exposureS: 0.001, ...CAMERA, ...extra }));
}

async function library(u: TestUser) {
  const res = await u.agent.get('/api/calibration/dark-library');
  expect(res.status).toBe(200);
  return darkLibrarySchema.parse(res.body);
}

const removePath = (set: BiasLibrarySet) => `/api/calibration/dark-library/bias/${encodeURIComponent(set.id.replace(/^bias:/, ''))}`;

describe('bias sets in the dark library', () => {
  let u: TestUser;
  let other: TestUser;
  const old = monthsAgo(8);
  const recent = monthsAgo(1);
  beforeAll(async () => {
    u = await imager();
    other = await imager();
    const result = await intakeOk(u, [
      ...biasFrames('Bias_old', `${old}T19:00:00`, 3),
      ...biasFrames('Bias_new', `${recent}T19:00:00`, 4, { readoutMode: 'High Gain' }),
      ...biasFrames('Bias_warm', `${recent}T19:30:00`, 2, { setTempC: undefined, sensorTempC: undefined, gain: 100 }),
    ]);
    expect(result.recorded).toEqual({ light: 0, dark: 0, flat: 0, bias: 9 });
  });

  it('groups recorded bias frames into sets apart from the dark sets, with the dark validity', async () => {
    const lib = await library(u);
    expect(lib.sets).toEqual([]);
    expect(lib.biasSets.map((s) => [s.source, s.gain, s.offset, s.binning, s.readoutMode, s.temperatureC, s.frames, s.takenOn, s.stale])).toEqual([
      ['intake', 0, 50, 1, 'High Gain', -10, 4, recent, false],
      ['intake', 0, 50, 1, null, -10, 3, old, true],
      ['intake', 100, 50, 1, null, null, 2, recent, false],
    ]);
    expect(lib.biasSets.every((s) => s.id.startsWith('bias:'))).toBe(true);
    expect((await other.agent.get('/api/calibration/dark-library')).body.biasSets).toEqual([]);
  });

  it('follows the validity setting', async () => {
    expect((await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 12 })).status).toBe(200);
    expect((await library(u)).biasSets.map((s) => s.stale)).toEqual([false, false, false]);
    expect((await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 6 })).status).toBe(200);
    expect((await library(u)).biasSets.map((s) => s.stale)).toEqual([false, true, false]);
  });

  it('removes a set’s frames for its owner only; an unknown key or a dark route is 404', async () => {
    const [withMode] = (await library(u)).biasSets;
    const path = removePath(withMode!);
    const foreign = await other.agent.delete(path).set('Origin', ORIGIN);
    expect(foreign.status).toBe(404);
    expect(foreign.body.error.code).toBeDefined();
    // a bias key is no dark set's
    expect((await u.agent.delete(path.replace('/bias/', '/intake/')).set('Origin', ORIGIN)).status).toBe(404);
    expect((await u.agent.delete(`${path}x`).set('Origin', ORIGIN)).status).toBe(404);

    const gone = await u.agent.delete(path).set('Origin', ORIGIN);
    expect(gone.status).toBe(200);
    expect(gone.body).toEqual({ deleted: 4 });
    expect((await library(u)).biasSets.map((s) => s.frames)).toEqual([3, 2]);
    expect((await u.agent.delete(path).set('Origin', ORIGIN)).status).toBe(404);

    const [, noTemperature] = (await library(u)).biasSets;
    expect(noTemperature!.temperatureC).toBeNull();
    expect((await u.agent.delete(removePath(noTemperature!)).set('Origin', ORIGIN)).body).toEqual({ deleted: 2 });
    expect((await library(u)).biasSets.map((s) => s.frames)).toEqual([3]);
  });
});

describe('bias on record in the flats plan', () => {
  it('is false without matching fresh bias, true once a bias set at the lights’ gain, offset and binning is recorded', async () => {
    const u = await imager();
    const night = monthsAgo(1);
    await intakeOk(u, [
      light('L_0001.fits', { dateObs: `${night}T20:00:00`, exposureS: 120, filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
      light('R_0001.fits', { dateObs: `${night}T20:05:00`, exposureS: 120, filter: 'R', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200, binning: 2 }),
      // stale, and fresh at another gain: neither counts
      ...biasFrames('Bias_stale', `${monthsAgo(8)}T19:00:00`, 2),
      ...biasFrames('Bias_gain', `${night}T19:00:00`, 2, { gain: 100 }),
    ]);
    const plan = async () => flatsPlanSchema.parse((await u.agent.get(`/api/calibration/flats?night=${night}`)).body).combos.map((c) => [c.filter, c.biasOnRecord]);
    expect(await plan()).toEqual([
      ['L', false],
      ['R', false],
    ]);
    await intakeOk(u, biasFrames('Bias', `${night}T19:30:00`, 3));
    expect(await plan()).toEqual([
      ['L', true],
      ['R', false],
    ]);
  });
});
