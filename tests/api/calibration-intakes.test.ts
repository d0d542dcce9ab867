import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { intakeListSchema, type IntakeList, type IntakeSummary } from '@/shared/schemas/calibration-api';
import { cameraFrame } from '@/tests/helpers/fits';
import { asFile, CAMERA, darks, flat, frameCount, frameFile, intakeOk, light } from './calibration-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

/*
 * GET /api/calibration/intakes: the user's past imports, grouped from the frames, newest first
 * and paged; DELETE /api/calibration/intakes/:id removes one. Nights are evenings at the test
 * site (Europe/Zurich); frame values are synthetic.
 */

let h: Harness;
let a: TestUser;
let b: TestUser;
let firstId: string;
let secondId: string;
let foreignId: string;

async function imager(): Promise<TestUser> {
  const u = await signUp(h);
  const res = await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
  expect(res.status).toBe(201);
  return u;
}

async function listOf(u: TestUser, query = ''): Promise<IntakeList> {
  const res = await u.agent.get(`/api/calibration/intakes${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return intakeListSchema.parse(res.body);
}

/**
 * Four named objects in the lights (M 31 twice), an unnamed light, darks, flats (one with an
 * OBJECT card, which names no target) and a bias, over the nights of 12 to 15 Oct 2026.
 */
function firstImport() {
  return [
    light('M31_0001.fits', { dateObs: '2026-10-12T20:00:00', exposureS: 120, object: 'M 31', filter: 'L' }),
    light('M31_0002.fits', { dateObs: '2026-10-12T20:03:00', exposureS: 120, object: 'M 31', filter: 'L' }),
    light('NGC891_0001.fits', { dateObs: '2026-10-13T21:00:00', exposureS: 180, object: 'NGC 891', filter: 'L' }),
    light('M33_0001.fits', { dateObs: '2026-10-13T22:00:00', exposureS: 180, object: 'M 33', filter: 'L' }),
    light('M42_0001.fits', { dateObs: '2026-10-14T02:00:00', exposureS: 60, object: 'M 42', filter: 'L' }),
    light('test_0001.fits', { dateObs: '2026-10-14T02:30:00', exposureS: 5 }),
    ...darks('Dark_120s', '2026-10-13T04:30:00', 2),
    flat('Flat_L_0001.fits', { dateObs: '2026-10-13T05:40:00', filter: 'L', object: 'Panel' }),
    frameFile('Bias_0001.fits', { type: 'Bias Frame', dateObs: '2026-10-15T19:00:00', gain: CAMERA.gain, offset: CAMERA.offset }),
  ];
}

beforeAll(async () => {
  h = await startHarness();
  a = await imager();
  b = await imager();
  firstId = (await intakeOk(a, firstImport())).intakeId;
  // The second import repeats one light of the first: only its new frames count for it.
  const second = await intakeOk(a, [...darks('Dark_300s', '2026-11-01T20:00:00', 3, 300), firstImport()[0]!]);
  expect(second.duplicates).toBe(1);
  secondId = second.intakeId;
  foreignId = (await intakeOk(b, [light('B_0001.fits', { dateObs: '2026-10-20T20:00:00', exposureS: 60, object: 'IC 1396' })])).intakeId;
});
afterAll(async () => h.close());

describe('GET /api/calibration/intakes', () => {
  it('401 JSON without a session', async () => {
    const res = await request(h.app).get('/api/calibration/intakes');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBeDefined();
  });

  it('lists only the caller’s imports, newest first, with counts, nights and objects', async () => {
    const list = await listOf(a);
    expect(list.intakes.map((i) => i.intakeId)).toEqual([secondId, firstId]);
    expect(list.nextCursor).toBeNull();
    const [second, first] = list.intakes as [IntakeSummary, IntakeSummary];
    expect(first.frames).toEqual({ light: 6, dark: 2, flat: 1, bias: 1 });
    // The darks at 06:30 Zurich time still belong to the night of the 12th; the bias was shot on the evening of the 15th.
    expect([first.firstNight, first.lastNight]).toEqual(['2026-10-12', '2026-10-15']);
    // Lights' OBJECT names only (not the flat's), by name, three listed and all four counted.
    expect(first.objects).toEqual(['M 31', 'M 33', 'M 42']);
    expect(first.objectCount).toBe(4);
    expect(second.frames).toEqual({ light: 0, dark: 3, flat: 0, bias: 0 });
    expect([second.firstNight, second.lastNight]).toEqual(['2026-11-01', '2026-11-01']);
    expect(second.objects).toEqual([]);
    expect(second.objectCount).toBe(0);
    expect(Date.parse(second.importedAt)).toBeGreaterThanOrEqual(Date.parse(first.importedAt));
    const other = await listOf(b);
    expect(other.intakes.map((i) => i.intakeId)).toEqual([foreignId]);
    expect(other.intakes[0]!.objects).toEqual(['IC 1396']);
  });

  it('pages with limit and cursor without skipping or repeating imports made at the same instant', async () => {
    const c = await imager();
    const made: string[] = [];
    for (let i = 0; i < 3; i++) {
      made.push((await intakeOk(c, [asFile(`C_${i}.fits`, cameraFrame({ type: 'Light Frame', dateObs: `2026-09-0${i + 1}T20:00:00`, exposureS: 60, object: `Sh2-${i}` }))])).intakeId);
    }
    // One instant, to the microsecond, for all three: the order falls back to the id.
    await h.db.execute(sql`update capture_frame set created_at = '2026-09-10T08:00:00.123456Z' where owner_id = ${c.id}`);
    const seen: string[] = [];
    let cursor: string | null = null;
    for (let page = 0; page < 4; page++) {
      const list: IntakeList = await listOf(c, `?limit=1${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`);
      seen.push(...list.intakes.map((i) => i.intakeId));
      expect(list.intakes[0]?.importedAt).toBe('2026-09-10T08:00:00.123Z');
      cursor = list.nextCursor;
      if (!cursor) break;
    }
    expect(seen).toEqual([...made].sort().reverse());
    const two = await listOf(c, '?limit=2');
    expect(two.intakes).toHaveLength(2);
    expect(two.nextCursor).not.toBeNull();
  });

  it('bad query → 400 JSON with the field', async () => {
    for (const [q, field] of [
      ['limit=0', 'limit'],
      ['limit=101', 'limit'],
      ['limit=ten', 'limit'],
      ['limit=2.5', 'limit'],
      ['cursor=yesterday', 'cursor'],
      ['cursor=2026-09-10T08:00:00.123Z_not-an-id', 'cursor'],
    ] as const) {
      const res = await a.agent.get(`/api/calibration/intakes?${q}`);
      expect(res.status, q).toBe(400);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(Object.keys(res.body.error.fields), q).toEqual([field]);
    }
    const most = await a.agent.get('/api/calibration/intakes?limit=100');
    expect(most.status).toBe(200);
  });
});

describe('DELETE /api/calibration/intakes/:intakeId from the list', () => {
  it('another user’s import → 404 and nothing removed', async () => {
    const before = await frameCount(h.db, a.id);
    const res = await b.agent.delete(`/api/calibration/intakes/${firstId}`).set('Origin', ORIGIN);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
    expect(await frameCount(h.db, a.id)).toBe(before);
    expect((await listOf(a)).intakes.map((i) => i.intakeId)).toEqual([secondId, firstId]);
  });

  it('an unknown id → 404; removing one import leaves the other', async () => {
    const unknown = await a.agent.delete(`/api/calibration/intakes/${randomUUID()}`).set('Origin', ORIGIN);
    expect(unknown.status).toBe(404);
    const res = await a.agent.delete(`/api/calibration/intakes/${firstId}`).set('Origin', ORIGIN);
    expect(res.status).toBe(200);
    expect(res.body.deleted).toBe(10);
    expect((await listOf(a)).intakes.map((i) => i.intakeId)).toEqual([secondId]);
    expect(await frameCount(h.db, a.id)).toBe(3);
    expect((await listOf(b)).intakes).toHaveLength(1);
  });
});
