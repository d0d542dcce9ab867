import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { framing, recipe, rig, site, target } from '@/db/schema';
import { importPlan } from '@/shared/plan';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let other: TestUser;
let recipeId: string;
let targetId: string;
let framingId: string;

const yaml = (u: TestUser, path: string, text: string) => u.agent.post(path).set('Origin', ORIGIN).set('Content-Type', 'text/yaml').send(text);
const exportText = async (u: TestUser, query = 'date=2026-10-10') => {
  const res = await u.agent.get(`/api/recipes/${recipeId}/plan?${query}`);
  expect(res.status).toBe(200);
  return res.text;
};

/** Rows a user owns, to prove that a refused import stored nothing. */
async function counts(u: TestUser) {
  const n = async (table: typeof recipe | typeof target | typeof site | typeof rig) => (await h.db.select({ id: table.id }).from(table).where(eq(table.ownerId, u.id))).length;
  return { recipes: await n(recipe), targets: await n(target), sites: await n(site), rigs: await n(rig) };
}

beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h, { name: 'Ines Export' });
  other = await signUp(h);
  await owner.agent.post('/api/sites').set('Origin', ORIGIN).send({ ...validSite, horizon: [{ azDeg: 0, altDeg: 10 }, { azDeg: 180, altDeg: 5 }] });
  const rigRes = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name: 'Plan rig', filterWheel: { slots: [{ name: 'L', band: 'L', focusOffsetSteps: 0 }, { name: 'Ha', band: 'Ha', focusOffsetSteps: 40 }] } });
  // M31, published J2000 position (e.g. SIMBAD).
  const t = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ designation: 'M31', name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.6847, decDeg: 41.2689, majorArcmin: 178 });
  targetId = t.body.target.id;
  const f = await owner.agent.post(`/api/targets/${targetId}/framings`).set('Origin', ORIGIN).send({ name: 'Core', raDeg: 10.6847, decDeg: 41.2689, positionAngleDeg: 35 });
  framingId = f.body.framing.id;
  const made = await owner.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'Andromeda · Ha & L', rigId: rigRes.body.rig.id, start: { kind: 'starter', targetIds: [targetId] } });
  recipeId = made.body.recipe.id;
  const tree = made.body.recipe.tree;
  tree.children.push({ kind: 'flats', id: crypto.randomUUID(), filters: ['L'], matchFramingOf: { kind: 'framing', framingId } });
  await owner.agent.put(`/api/recipes/${recipeId}`).set('Origin', ORIGIN).send({ ...made.body.recipe, tree, version: 1 });
});
afterAll(async () => h.close());

describe('/api/recipes/:id/plan and /api/plans', () => {
  it('401 without a session, 403 for cross-site writes', async () => {
    expect((await request(h.app).get(`/api/recipes/${recipeId}/plan`)).status).toBe(401);
    expect((await request(h.app).post('/api/plans/preview').set('Origin', ORIGIN).set('Content-Type', 'text/yaml').send('a: 1')).status).toBe(401);
    expect((await request(h.app).post('/api/plans/import').set('Origin', ORIGIN).set('Content-Type', 'text/yaml').send('a: 1')).status).toBe(401);
    const text = await exportText(owner);
    expect((await other.agent.post('/api/plans/preview').set('Origin', 'http://evil.example').set('Content-Type', 'text/yaml').send(text)).status).toBe(403);
    const before = await counts(other);
    expect((await other.agent.post('/api/plans/import?createSite=1').set('Content-Type', 'text/yaml').send(text)).status).toBe(403);
    expect(await counts(other)).toEqual(before);
  });

  it('exports a recipe as a YAML download with site, rig, targets, framings and darkness', async () => {
    const res = await owner.agent.get(`/api/recipes/${recipeId}/plan?date=2026-10-10`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/yaml; charset=utf-8/);
    expect(res.headers['content-disposition']).toBe(`attachment; filename="andromeda-ha-l-2026-10-10.yaml"; filename*=UTF-8''andromeda-ha-l-2026-10-10.yaml`);
    const result = importPlan(res.text);
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const plan = result.plan;
    expect(plan.meta).toMatchObject({ author: 'Ines Export', sourceRecipeId: recipeId, generator: 'Nightloom' });
    expect(plan.meta.created).toMatch(/[+-]\d\d:\d\d$/);
    expect(plan.site).toMatchObject({ name: 'Test Meadow', timeZone: 'Europe/Zurich', horizon: [{ azDeg: 0, altDeg: 10 }, { azDeg: 180, altDeg: 5 }] });
    expect(plan.rig.filterWheel.slots).toEqual([{ name: 'L', band: 'L', focusOffsetSteps: 0 }, { name: 'Ha', band: 'Ha', focusOffsetSteps: 40 }]);
    expect(plan.night.darknessStart).toMatch(/^2026-10-10T\d\d:\d\d:\d\d\+02:00$/);
    expect(plan.targets).toEqual([expect.objectContaining({ id: targetId, designation: 'M31', framings: [expect.objectContaining({ id: framingId, name: 'Core', positionAngleDeg: 35 })] })]);
    expect(plan.estimate).toBeUndefined();
    expect(res.text).toContain('exposureS: 180 # seconds');
  });

  it('adds the dry-run estimate with estimate=1', async () => {
    const text = await exportText(owner, 'date=2026-10-10&estimate=1');
    const result = importPlan(text);
    expect(result.ok && result.plan.estimate?.nightDate).toBe('2026-10-10');
    expect(result.ok && result.plan.estimate!.stages[0]!.name).toBe('M31');
  });

  it('export: 400 for a bad date, 404 for a foreign recipe, 404 without any site', async () => {
    expect((await owner.agent.get(`/api/recipes/${recipeId}/plan?date=2026-02-30`)).status).toBe(400);
    expect((await owner.agent.get(`/api/recipes/${recipeId}/plan?estimate=yes`)).status).toBe(400);
    expect((await other.agent.get(`/api/recipes/${recipeId}/plan`)).status).toBe(404);
    expect((await owner.agent.get('/api/recipes/not-an-id/plan')).status).toBe(404);
    const loner = await signUp(h);
    const made = await loner.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'Nowhere' });
    const res = await loner.agent.get(`/api/recipes/${made.body.recipe.id}/plan`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('no-site');
  });

  it('previews a plan against the importing user’s account; nothing is stored', async () => {
    const text = await exportText(owner);
    const before = await counts(other);
    const res = await yaml(other, '/api/plans/preview', text);
    expect(res.status).toBe(200);
    expect(res.body.errors).toEqual([]);
    const p = res.body.preview;
    expect(p).toMatchObject({ title: 'Andromeda · Ha & L · 2026-10-10', recipeName: 'Andromeda · Ha & L', nightDate: '2026-10-10', targets: [{ designation: 'M31', onYourList: false }] });
    expect(p.site).toMatchObject({ name: 'Test Meadow', matchId: null });
    expect(p.rig).toMatchObject({ name: 'Plan rig', filters: ['L', 'Ha'], matchId: null });
    expect(p.nodeCount).toBe(p.outline.length);
    expect(p.outline[0]).toMatchObject({ depth: 0, kind: 'cool' });
    expect(await counts(other)).toEqual(before);
    const mine = await yaml(owner, '/api/plans/preview', text);
    expect(mine.body.preview.site.matchName).toBe('Test Meadow');
    expect(mine.body.preview.rig.matchName).toBe('Plan rig');
    expect(mine.body.preview.targets[0].onYourList).toBe(true);
  });

  it('imports for another user in one go: recipe, site, rig, targets and framings; the dry run gives the same timeline', async () => {
    const text = await exportText(owner);
    const res = await yaml(other, '/api/plans/import?createSite=1&createRig=1', text);
    expect(res.status).toBe(201);
    expect(res.body.created).toEqual({ site: true, rig: true, targets: ['M31'] });
    const imported = res.body.recipe;
    expect(imported).toMatchObject({ name: 'Andromeda · Ha & L', version: 1 });
    const [theirTarget] = await h.db.select().from(target).where(eq(target.ownerId, other.id));
    expect(theirTarget).toMatchObject({ designation: 'M31', raDeg: 10.6847 });
    const stage = imported.tree.children.find((n: { kind: string }) => n.kind === 'stage');
    expect(stage.targetId).toBe(theirTarget!.id);
    const [theirFraming] = await h.db.select().from(framing).where(eq(framing.targetId, theirTarget!.id));
    expect(theirFraming).toMatchObject({ name: 'Core', positionAngleDeg: 35 });
    const flats = imported.tree.children.find((n: { kind: string }) => n.kind === 'flats');
    expect(flats.matchFramingOf).toEqual({ kind: 'framing', framingId: theirFraming!.id });
    expect((await other.agent.get(`/api/recipes/${imported.id}`)).status).toBe(200);
    expect((await other.agent.get(`/api/recipes/${imported.id}/revisions`)).body.revisions).toHaveLength(1);
    // The issue's "done": dry-run both on the same night; the timelines agree event for event.
    const mine = await owner.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({ date: '2026-10-10' });
    const theirs = await other.agent.post(`/api/recipes/${imported.id}/dry-runs`).set('Origin', ORIGIN).send({ date: '2026-10-10' });
    const events = (r: request.Response) => r.body.dryRun.result.timeline.map((e: Record<string, unknown>) => [e.start, e.end, e.kind, e.path, e.what]);
    expect(events(theirs)).toEqual(events(mine));
    expect(theirs.body.dryRun.result.totals.nightEnd).toBe(mine.body.dryRun.result.totals.nightEnd);
  });

  it('links what the user already has instead of creating it again', async () => {
    const text = await exportText(owner);
    const before = await counts(owner);
    const res = await yaml(owner, '/api/plans/import?createSite=1&createRig=1', text);
    expect(res.status).toBe(201);
    expect(res.body.created).toEqual({ site: false, rig: false, targets: [] });
    expect(await counts(owner)).toEqual({ ...before, recipes: before.recipes + 1 });
    expect(res.body.recipe.tree.children.find((n: { kind: string }) => n.kind === 'stage').targetId).toBe(targetId);
    const flats = res.body.recipe.tree.children.find((n: { kind: string }) => n.kind === 'flats');
    expect(flats.matchFramingOf.framingId).toBe(framingId);
    // Without the switches, a user with no match gets a recipe linked to no site or rig.
    const third = await signUp(h);
    const bare = await yaml(third, '/api/plans/import', text);
    expect(bare.status).toBe(201);
    expect(bare.body.recipe).toMatchObject({ siteId: null, rigId: null });
    expect(await counts(third)).toEqual({ recipes: 1, targets: 1, sites: 0, rigs: 0 });
  });

  it('refuses bad plans with 4xx, line, column and path, and stores nothing', async () => {
    const text = await exportText(owner);
    const before = await counts(other);
    const line = (needle: string, t = text) => t.slice(0, t.indexOf(needle)).split('\n').length;
    const negative = text.replace('exposureS: 180', 'exposureS: -1');
    const bad = await yaml(other, '/api/plans/import?createSite=1&createRig=1', negative);
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid-plan');
    expect(bad.body.error.issues[0]).toMatchObject({ line: line('exposureS: -1', negative), path: expect.stringMatching(/^recipe(\.children\[\d+\])+\.exposureS$/), message: expect.stringMatching(/Exposure must be between/) });
    expect(bad.body.error.message).toMatch(/^line \d+, column \d+: recipe\.children/);
    const cases: [string, string, number, RegExp][] = [
      ['duplicate key', text.replace('  author:', '  title: twice\n  author:'), 400, /appears twice/],
      ['unknown kind', text.replace('- kind: park', '- kind: teleport'), 400, /Kind is one of/],
      ['wrong type', text.replace('latitudeDeg: 46.93', 'latitudeDeg: north'), 400, /Latitude must be a number/],
      ['major version', text.replace('format: nightloom.plan/1', 'format: nightloom.plan/7'), 400, /nightloom\.plan\/7/],
      ['alias bomb', `format: nightloom.plan/1\na: &a [x,x,x,x,x,x,x,x,x,x]\nb: &b [*a,*a,*a,*a,*a,*a,*a,*a,*a,*a]\nc: &c [*b,*b,*b,*b,*b,*b,*b,*b,*b,*b]\nd: [*c,*c,*c,*c,*c,*c,*c,*c,*c,*c]\n`, 400, /aliases/],
      ['depth bomb', '['.repeat(100_000), 400, /nested too deeply/],
      ['scalar', 'hello', 400, /single value/],
      ['list', '- 1\n- 2\n', 400, /a list/],
      ['junk', '\u0000\u0001{{{ ]]]: :\n\t- x', 400, /line 1/],
      ['too large', `${text}#${'x'.repeat(2 * 1024 * 1024)}`, 413, /at most 2 MB/],
    ];
    for (const [what, body, status, message] of cases) {
      for (const route of ['/api/plans/preview', '/api/plans/import?createSite=1&createRig=1']) {
        const res = await yaml(other, route, body);
        expect(res.status, `${what} ${route}`).toBe(status);
        expect(res.body.error.message, what).toMatch(message);
      }
    }
    const json = await other.agent.post('/api/plans/import').set('Origin', ORIGIN).send({ format: 'nightloom.plan/1' });
    expect(json.status).toBe(415);
    expect((await other.agent.post('/api/plans/preview').set('Origin', ORIGIN)).status).toBe(415);
    expect((await other.agent.post('/api/plans/import?createSite=maybe').set('Origin', ORIGIN).set('Content-Type', 'text/yaml').send(text)).status).toBe(400);
    expect(await counts(other)).toEqual(before);
  });
});
