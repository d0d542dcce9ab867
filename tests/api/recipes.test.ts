import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recipe } from '@/db/schema';
import { createNode } from '@/shared/recipe/factory';
import type { RecipeTree } from '@/shared/recipe/types';
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

const recipeCount = async (id: string) => (await h.db.select().from(recipe).where(eq(recipe.ownerId, id))).length;
const exposeTree = (): RecipeTree => ({ children: [createNode('cool'), createNode('stage', { children: [createNode('expose', { filter: 'L', exposureS: 180, count: 20 })] })] as RecipeTree['children'] });
const create = (u: TestUser, body: object) => u.agent.post('/api/recipes').set('Origin', ORIGIN).send(body);

describe('/api/recipes', () => {
  it('401 without a session on every route', async () => {
    const id = '00000000-0000-4000-8000-000000000000';
    const routes = [['get', '/api/recipes'], ['post', '/api/recipes'], ['get', `/api/recipes/${id}`], ['put', `/api/recipes/${id}`], ['delete', `/api/recipes/${id}`], ['post', `/api/recipes/${id}/restore`], ['get', `/api/recipes/${id}/revisions`], ['post', `/api/recipes/${id}/revisions/1/restore`]] as const;
    for (const [m, p] of routes) expect((await request(h.app)[m](p).set('Origin', ORIGIN).send({})).status, `${m} ${p}`).toBe(401);
  });

  it('creates empty, from a given tree, and as a copy with fresh ids; lists with derived totals', async () => {
    const empty = await create(owner, { name: 'Blank night' });
    expect(empty.status).toBe(201);
    expect(empty.body.recipe).toMatchObject({ name: 'Blank night', tree: { children: [] }, version: 1 });
    const tree = exposeTree();
    const given = await create(owner, { name: 'Lum night', start: { kind: 'tree', tree } });
    expect(given.body.recipe.tree).toEqual(JSON.parse(JSON.stringify(tree)));
    const copy = await create(owner, { start: { kind: 'copy', recipeId: given.body.recipe.id } });
    expect(copy.body.recipe.name).toBe('Copy of Lum night');
    expect(copy.body.recipe.tree.children[0].id).not.toBe(tree.children[0]!.id);
    const list = await owner.agent.get('/api/recipes?sort=exposure');
    expect(list.body.recipes[0]).toMatchObject({ plannedExposureS: 3600, nodeCount: 3 });
    const found = await owner.agent.get('/api/recipes?q=lum');
    expect(found.body.recipes.map((r: { name: string }) => r.name).sort()).toEqual(['Copy of Lum night', 'Lum night']);
  });

  it('starts from the built-in starter with the chosen targets and the rig’s filters', async () => {
    const rig = await owner.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name: 'NB rig', filterWheel: { slots: [{ name: 'Ha', band: 'Ha' }, { name: 'OIII', band: 'OIII' }] } });
    const t = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ designation: 'NGC 7000', name: 'North America Nebula', type: 'emission-nebula', raDeg: 314.75, decDeg: 44.53, majorArcmin: 120 });
    const res = await create(owner, { rigId: rig.body.rig.id, start: { kind: 'starter', targetIds: [t.body.target.id] } });
    expect(res.status).toBe(201);
    const kinds = res.body.recipe.tree.children.map((n: { kind: string }) => n.kind);
    expect(kinds).toEqual(['cool', 'stage', 'warm', 'park']);
    expect(res.body.recipe.tree.children[1].targetId).toBe(t.body.target.id);
    const text = JSON.stringify(res.body.recipe.tree);
    expect(text).toContain('"filter":"Ha"');
    expect(text).not.toContain('"filter":"L"');
    const bad = await create(owner, { start: { kind: 'starter', targetIds: ['00000000-0000-4000-8000-000000000000'] } });
    expect(bad.status).toBe(400);
  });

  it('400 with the path of a bad node, and nothing stored', async () => {
    const before = await recipeCount(owner.id);
    const tree = exposeTree() as unknown as { children: { children?: { exposureS?: number }[] }[] };
    tree.children[1]!.children![0]!.exposureS = -5;
    const res = await create(owner, { name: 'Broken', start: { kind: 'tree', tree } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('start.tree.children.1.children.0.exposureS');
    const unknownKind = await create(owner, { name: 'Odd', start: { kind: 'tree', tree: { children: [{ id: crypto.randomUUID(), kind: 'teleport', enabled: true }] } } });
    expect(unknownKind.status).toBe(400);
    expect(await recipeCount(owner.id)).toBe(before);
    const foreignRig = await create(owner, { name: 'X', rigId: '00000000-0000-4000-8000-000000000000' });
    expect(foreignRig.body.error.fields.rigId).toBeDefined();
    expect(await recipeCount(owner.id)).toBe(before);
  });

  it("keeps other users out (404) and refuses a stale save (409) without losing the stored tree", async () => {
    const made = await create(owner, { name: 'Mine', start: { kind: 'tree', tree: exposeTree() } });
    const id = made.body.recipe.id as string;
    expect((await other.agent.get(`/api/recipes/${id}`)).status).toBe(404);
    expect((await other.agent.put(`/api/recipes/${id}`).set('Origin', ORIGIN).send({ ...made.body.recipe, version: 1 })).status).toBe(404);
    expect((await other.agent.delete(`/api/recipes/${id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await other.agent.get(`/api/recipes/${id}/revisions`)).status).toBe(404);
    const first = await owner.agent.put(`/api/recipes/${id}`).set('Origin', ORIGIN).send({ ...made.body.recipe, name: 'Mine, edited', version: 1 });
    expect(first.body.recipe.version).toBe(2);
    const stale = await owner.agent.put(`/api/recipes/${id}`).set('Origin', ORIGIN).send({ ...made.body.recipe, name: 'Lost', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current.name).toBe('Mine, edited');
    const badSave = await owner.agent.put(`/api/recipes/${id}`).set('Origin', ORIGIN).send({ ...made.body.recipe, tree: { children: 'nope' }, version: 2 });
    expect(badSave.status).toBe(400);
    expect((await owner.agent.get(`/api/recipes/${id}`)).body.recipe).toMatchObject({ name: 'Mine, edited', version: 2 });
  });

  it('keeps revisions and restores an older one as a new version', async () => {
    const made = await create(owner, { name: 'History', start: { kind: 'tree', tree: exposeTree() } });
    const id = made.body.recipe.id as string;
    await owner.agent.put(`/api/recipes/${id}`).set('Origin', ORIGIN).send({ ...made.body.recipe, tree: { children: [] }, version: 1 });
    const revs = await owner.agent.get(`/api/recipes/${id}/revisions`);
    expect(revs.body.revisions.map((r: { version: number; nodeCount: number }) => [r.version, r.nodeCount])).toEqual([[2, 0], [1, 3]]);
    const one = await owner.agent.get(`/api/recipes/${id}/revisions/1`);
    expect(one.body.revision.tree.children).toHaveLength(2);
    expect((await owner.agent.post(`/api/recipes/${id}/revisions/1/restore`).set('Origin', ORIGIN).send({ version: 1 })).status).toBe(409);
    const restored = await owner.agent.post(`/api/recipes/${id}/revisions/1/restore`).set('Origin', ORIGIN).send({ version: 2 });
    expect(restored.body.recipe).toMatchObject({ version: 3 });
    expect(restored.body.recipe.tree.children).toHaveLength(2);
    expect((await owner.agent.get(`/api/recipes/${id}/revisions/99`)).status).toBe(404);
  });

  it('deletes softly and restores on undo', async () => {
    const made = await create(owner, { name: 'Undo me' });
    const id = made.body.recipe.id as string;
    const del = await owner.agent.delete(`/api/recipes/${id}`).set('Origin', ORIGIN);
    expect(del.body.recipe.deletedAt).toBeTruthy();
    expect((await owner.agent.get(`/api/recipes/${id}`)).status).toBe(404);
    expect((await owner.agent.get('/api/recipes')).body.recipes.map((r: { id: string }) => r.id)).not.toContain(id);
    expect((await other.agent.post(`/api/recipes/${id}/restore`).set('Origin', ORIGIN)).status).toBe(404);
    const back = await owner.agent.post(`/api/recipes/${id}/restore`).set('Origin', ORIGIN);
    expect(back.body.recipe.deletedAt).toBeNull();
    expect((await owner.agent.get(`/api/recipes/${id}`)).status).toBe(200);
  });
});
