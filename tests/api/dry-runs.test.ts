import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dryRunResultSchema } from '@/shared/dry-run';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let other: TestUser;
let recipeId: string;
let recipeBody: Record<string, unknown>;

beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h);
  other = await signUp(h);
  await owner.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
  const rig = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name: 'Test rig' });
  // M31, published J2000 position (e.g. SIMBAD).
  const t = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ designation: 'M31', name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.6847, decDeg: 41.2689, majorArcmin: 178 });
  const made = await owner.agent.post('/api/recipes').set('Origin', ORIGIN).send({ rigId: rig.body.rig.id, start: { kind: 'starter', targetIds: [t.body.target.id] } });
  recipeId = made.body.recipe.id;
  recipeBody = made.body.recipe;
});
afterAll(async () => h.close());

describe('dry runs', () => {
  it('401 without a session', async () => {
    expect((await request(h.app).post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({})).status).toBe(401);
    expect((await request(h.app).get(`/api/recipes/${recipeId}/dry-runs/latest`)).status).toBe(401);
    expect((await request(h.app).post('/api/dry-runs').set('Origin', ORIGIN).send({ tree: { children: [] } })).status).toBe(401);
    expect((await request(h.app).get(`/api/recipes/${recipeId}/scan?from=2026-12-01&nights=2`)).status).toBe(401);
  });

  it("404 for another user's recipe; 400 for a bad date", async () => {
    expect((await other.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({})).status).toBe(404);
    expect((await other.agent.get(`/api/recipes/${recipeId}/dry-runs/latest`)).status).toBe(404);
    const bad = await owner.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({ date: '2026-02-30' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.date).toBeDefined();
  });

  it('runs a saved recipe, stores the result, and marks it stale after the recipe changes', async () => {
    const res = await owner.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({ date: '2026-12-01' });
    expect(res.status).toBe(201);
    const result = dryRunResultSchema.parse(res.body.dryRun.result);
    expect(result.timeline.length).toBeGreaterThan(3);
    expect(result.totals.shutterOpenS).toBeGreaterThan(3600);
    expect(res.body.dryRun.stale).toBe(false);
    const list = await owner.agent.get('/api/recipes');
    const item = list.body.recipes.find((r: { id: string }) => r.id === recipeId);
    expect(item.lastDryRunEnd).toBe(result.totals.nightEnd);
    expect(item.lastDryRunStale).toBe(false);
    await owner.agent.put(`/api/recipes/${recipeId}`).set('Origin', ORIGIN).send({ ...recipeBody, name: 'Renamed', version: 1 });
    const latest = await owner.agent.get(`/api/recipes/${recipeId}/dry-runs/latest`);
    expect(latest.body.dryRun.stale).toBe(true);
  });

  it('runs an unsaved tree without storing it; 400 with the node path for a bad tree', async () => {
    const ok = await owner.agent.post('/api/dry-runs').set('Origin', ORIGIN).send({ tree: recipeBody.tree, date: '2026-12-01' });
    expect(ok.status).toBe(200);
    expect(ok.body.result.timeline.length).toBeGreaterThan(3);
    const bad = await owner.agent.post('/api/dry-runs').set('Origin', ORIGIN).send({ tree: { children: [{ id: crypto.randomUUID(), kind: 'expose', enabled: true, filter: 'L', exposureS: 0, count: 1 }] } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)[0]).toMatch(/^tree\.children\.0\./);
  });

  it('scans a range of nights as a stream of events', async () => {
    const res = await owner.agent.get(`/api/recipes/${recipeId}/scan?from=2026-12-01&nights=10`).buffer(true).parse((response, done) => {
      let text = '';
      response.on('data', (c: Buffer) => (text += c.toString()));
      response.on('end', () => done(null, text));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/event-stream/);
    const events = String(res.body).trim().split('\n\n').map((block) => {
      const [ev, data] = block.split('\n');
      return { event: ev!.slice('event: '.length), data: JSON.parse(data!.slice('data: '.length)) };
    });
    const nights = events.filter((e) => e.event === 'nights').flatMap((e) => e.data.nights);
    expect(nights.map((n: { date: string }) => n.date)).toEqual(Array.from({ length: 10 }, (_, i) => `2026-12-${String(i + 1).padStart(2, '0')}`));
    expect(events.at(-1)!.event).toBe('done');
    expect((await owner.agent.get(`/api/recipes/${recipeId}/scan?from=2026-12-01&nights=400`)).status).toBe(400);
  });
});
