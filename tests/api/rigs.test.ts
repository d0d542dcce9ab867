import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rig } from '@/db/schema';
import { defaultRigInput } from '@/shared/rig/schema';
import { ORIGIN, signUp, startHarness, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let other: TestUser;
beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h);
  other = await signUp(h);
});
afterAll(async () => h.close());

const rigCount = async (id: string) => (await h.db.select().from(rig).where(eq(rig.ownerId, id))).length;
const fresh = () => ({ ...defaultRigInput(), name: 'Refractor 106' });

describe('/api/rigs', () => {
  it('401 without a session for every route', async () => {
    const id = '00000000-0000-4000-8000-000000000000';
    for (const [m, p] of [['get', '/api/rigs'], ['post', '/api/rigs'], ['get', `/api/rigs/${id}`], ['put', `/api/rigs/${id}`], ['delete', `/api/rigs/${id}`]] as const) {
      expect((await request(h.app)[m](p).set('Origin', ORIGIN).send(fresh())).status, `${m} ${p}`).toBe(401);
    }
  });

  it('creates from a partial body with defaults filled in, then reads it back whole', async () => {
    const res = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name: 'Small refractor', optics: { focalLengthMm: 420, apertureMm: 70 } });
    expect(res.status).toBe(201);
    expect(res.body.rig.optics.focalLengthMm).toBe(420);
    expect(res.body.rig.filterWheel.slots.length).toBeGreaterThan(0);
    const back = await owner.agent.get(`/api/rigs/${res.body.rig.id}`);
    expect(back.body.rig).toEqual(res.body.rig);
  });

  it('400 with field paths for bad values and nothing stored', async () => {
    const before = await rigCount(owner.id);
    const bad = fresh();
    bad.optics.focalLengthMm = -5;
    bad.filterWheel.slots = [{ name: 'Ha', band: 'Ha', focusOffsetSteps: 0 }, { name: 'ha', band: 'Ha', focusOffsetSteps: 10 }];
    bad.rotator = { ...bad.rotator, present: true, minDeg: 10, maxDeg: 0 };
    const res = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send(bad);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['optics.focalLengthMm', 'filterWheel.slots.1.name', 'rotator.maxDeg']));
    expect(await rigCount(owner.id)).toBe(before);
  });

  it('refuses a foreign origin (403) and hides other users’ rigs (404)', async () => {
    const before = await rigCount(owner.id);
    expect((await owner.agent.post('/api/rigs').set('Origin', 'http://evil.example').send(fresh())).status).toBe(403);
    expect(await rigCount(owner.id)).toBe(before);
    const mine = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send(fresh());
    const id = mine.body.rig.id as string;
    expect((await other.agent.get(`/api/rigs/${id}`)).status).toBe(404);
    expect((await other.agent.put(`/api/rigs/${id}`).set('Origin', ORIGIN).send({ ...fresh(), version: 1 })).status).toBe(404);
    expect((await other.agent.delete(`/api/rigs/${id}`).set('Origin', ORIGIN)).status).toBe(404);
  });

  it('updates with the right version, 409 with the stored rig on a stale one, then deletes', async () => {
    const created = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send(fresh());
    const id = created.body.rig.id as string;
    const upd = await owner.agent.put(`/api/rigs/${id}`).set('Origin', ORIGIN).send({ ...fresh(), name: 'Renamed', version: 1 });
    expect(upd.status).toBe(200);
    expect(upd.body.rig).toMatchObject({ name: 'Renamed', version: 2 });
    const stale = await owner.agent.put(`/api/rigs/${id}`).set('Origin', ORIGIN).send({ ...fresh(), name: 'Lost', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current.name).toBe('Renamed');
    expect((await owner.agent.delete(`/api/rigs/${id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await owner.agent.get(`/api/rigs/${id}`)).status).toBe(404);
  });
});
