import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { site } from '@/db/schema';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let other: TestUser;
beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h);
  other = await signUp(h);
});
afterAll(async () => h.close());

const countSites = async (ownerId: string) => (await h.db.select().from(site).where(eq(site.ownerId, ownerId))).length;

describe('/api/sites', () => {
  it('answers 401 JSON without a session, for reads and writes', async () => {
    for (const [method, path] of [['get', '/api/sites'], ['post', '/api/sites'], ['get', '/api/sites/00000000-0000-4000-8000-000000000000'], ['put', '/api/sites/00000000-0000-4000-8000-000000000000'], ['delete', '/api/sites/00000000-0000-4000-8000-000000000000']] as const) {
      const res = await request(h.app)[method](path).set('Origin', ORIGIN).send(validSite);
      expect(res.status, `${method} ${path}`).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    }
  });

  it('creates a site, makes the first one the default, lists and reads it', async () => {
    const res = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
    expect(res.status).toBe(201);
    expect(res.body.site).toMatchObject({ ...validSite, isDefault: true, version: 1 });
    const list = await owner.agent.get('/api/sites');
    expect(list.body.sites.map((s: { id: string }) => s.id)).toContain(res.body.site.id);
    const one = await owner.agent.get(`/api/sites/${res.body.site.id}`);
    expect(one.body.site.name).toBe(validSite.name);
  });

  it('answers 400 with field errors for bad input and stores nothing', async () => {
    const before = await countSites(owner.id);
    const res = await owner.agent
      .post('/api/sites')
      .set('Origin', ORIGIN)
      .send({ ...validSite, name: '', latitudeDeg: 123, timeZone: 'Nowhere/Land', elevationM: 'high' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['elevationM', 'latitudeDeg', 'name', 'timeZone']);
    expect(await countSites(owner.id)).toBe(before);
  });

  it('answers 400 for a body that is not JSON', async () => {
    const res = await owner.agent.post('/api/sites').set('Origin', ORIGIN).set('Content-Type', 'application/json').send('{"name": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-json');
  });

  it('refuses a write from a foreign origin with 403 and stores nothing', async () => {
    const before = await countSites(owner.id);
    const res = await owner.agent.post('/api/sites').set('Origin', 'http://evil.example').send(validSite);
    expect(res.status).toBe(403);
    expect(await countSites(owner.id)).toBe(before);
  });

  it("hides another user's site (404) for read, update and delete", async () => {
    const mine = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'Private Ridge' });
    const id = mine.body.site.id as string;
    expect((await other.agent.get(`/api/sites/${id}`)).status).toBe(404);
    expect((await other.agent.put(`/api/sites/${id}`).set('Origin', ORIGIN).send({ ...validSite, version: 1 })).status).toBe(404);
    expect((await other.agent.delete(`/api/sites/${id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await owner.agent.get(`/api/sites/${id}`)).body.site.name).toBe('Private Ridge');
    expect((await other.agent.get('/api/sites/not-a-uuid')).status).toBe(404);
  });

  it('updates with the current version and refuses a stale one with 409 and the stored copy', async () => {
    const created = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'Version Hill' });
    const id = created.body.site.id as string;
    const first = await owner.agent.put(`/api/sites/${id}`).set('Origin', ORIGIN).send({ ...validSite, name: 'Version Hill East', version: 1 });
    expect(first.status).toBe(200);
    expect(first.body.site.version).toBe(2);
    const stale = await owner.agent.put(`/api/sites/${id}`).set('Origin', ORIGIN).send({ ...validSite, name: 'Lost edit', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version-conflict');
    expect(stale.body.error.current.name).toBe('Version Hill East');
    const [row] = await h.db.select().from(site).where(eq(site.id, id));
    expect(row!.name).toBe('Version Hill East');
  });

  it('keeps exactly one default site when another becomes the default', async () => {
    const u = await signUp(h);
    const a = await u.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'A' });
    const b = await u.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'B', isDefault: true });
    expect(a.body.site.isDefault).toBe(true);
    expect(b.body.site.isDefault).toBe(true);
    const list = (await u.agent.get('/api/sites')).body.sites as { name: string; isDefault: boolean }[];
    expect(list.filter((s) => s.isDefault).map((s) => s.name)).toEqual(['B']);
  });

  it('deletes a site', async () => {
    const created = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'Gone Soon' });
    const id = created.body.site.id as string;
    expect((await owner.agent.delete(`/api/sites/${id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await owner.agent.get(`/api/sites/${id}`)).status).toBe(404);
  });
});

describe('/api/sites/:id/horizon (CSV upload)', () => {
  it('stores a good profile and refuses a bad file by line, keeping the old profile', async () => {
    const created = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'Tree Line' });
    const id = created.body.site.id as string;
    const good = await owner.agent.put(`/api/sites/${id}/horizon?version=1`).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send('azimuth,altitude\n0,10\n90,25\n180,15\n270,5\n');
    expect(good.status).toBe(200);
    expect(good.body.site.horizon).toEqual([{ azDeg: 0, altDeg: 10 }, { azDeg: 90, altDeg: 25 }, { azDeg: 180, altDeg: 15 }, { azDeg: 270, altDeg: 5 }]);
    expect(good.body.site.version).toBe(2);
    const bad = await owner.agent.put(`/api/sites/${id}/horizon?version=2`).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send('0,10\n90,abc\n400,5\n');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid-csv');
    expect(bad.body.error.rows.map((r: { line: number }) => r.line)).toEqual([2, 3]);
    const after = await owner.agent.get(`/api/sites/${id}`);
    expect(after.body.site.horizon).toHaveLength(4);
    expect(after.body.site.version).toBe(2);
  });

  it('401 without a session, 400 without a version, 409 on a stale version', async () => {
    const created = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, name: 'Roof Edge' });
    const id = created.body.site.id as string;
    expect((await request(h.app).put(`/api/sites/${id}/horizon?version=1`).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send('0,10\n')).status).toBe(401);
    expect((await owner.agent.put(`/api/sites/${id}/horizon`).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send('0,10\n')).status).toBe(400);
    expect((await owner.agent.put(`/api/sites/${id}/horizon?version=7`).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send('0,10\n')).status).toBe(409);
  });

  it('rejects horizon points out of order in a JSON edit with a field error', async () => {
    const res = await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, horizon: [{ azDeg: 90, altDeg: 10 }, { azDeg: 45, altDeg: 10 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('horizon.1.azDeg');
  });
});
