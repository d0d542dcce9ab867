import { and, count, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { devMail, recipe } from '@/db/schema';
import { filterRefsOf } from '@/shared/recipe/template';
import { clubCast, joinClub, LRGB_HA_SLOTS, makeRig, narrowbandRecipe, publish, type ClubCast } from './club-fixtures';
import { mailTo, ORIGIN, signUp, startHarness, type Harness, type TestUser } from './harness';

let h: Harness;
let c: ClubCast;
let source: Awaited<ReturnType<typeof narrowbandRecipe>>;
let templateId: string;

beforeAll(async () => {
  h = await startHarness();
  c = await clubCast(h, 'Band Circle');
  source = await narrowbandRecipe(c.owner);
  templateId = await publish(c.owner, c.clubId, source.recipeId, 'Narrowband triad');
});
afterAll(async () => h.close());

const base = () => `/api/clubs/${c.clubId}/templates/${templateId}`;
const use = (u: TestUser, body: object) => u.agent.post(`${base()}/use`).set('Origin', ORIGIN).send(body);
const recipeCount = async (u: TestUser) => Number((await h.db.select({ n: count() }).from(recipe).where(eq(recipe.ownerId, u.id)))[0]!.n);

describe('a published template', () => {
  it('is rig-agnostic: filters by band, no gain, focuser step size reset, the target kept as a suggestion only', async () => {
    const res = await c.member.agent.get(base());
    expect(res.status).toBe(200);
    const t = res.body.template;
    expect(t).toMatchObject({ title: 'Narrowband triad', latestVersion: 1, useCount: 0, retired: false, bands: ['Ha', 'OIII', 'SII'], myUses: [] });
    expect(t.versions).toEqual([expect.objectContaining({ version: 1, changelog: 'First version', createdBy: 'Club Owner', useCount: 0 })]);
    const stage = t.tree.children[1];
    expect(stage.targetId).toBeNull();
    expect(t.suggestedTargets[stage.id]).toMatchObject({ designation: 'NGC 7000', raDeg: 314.75 });
    expect(stage.children[0]).toMatchObject({ kind: 'focus', filter: 'Ha', stepSize: 50 });
    for (const e of stage.children.slice(1)) expect(e.gain).toBeUndefined();
  });

  it('does not change when the source recipe is edited later (versions are immutable)', async () => {
    const before = (await c.owner.agent.get(`${base()}/versions/1`)).body.version;
    const mine = (await c.owner.agent.get(`/api/recipes/${source.recipeId}`)).body.recipe;
    const tree = structuredClone(mine.tree);
    tree.children[1].children[1].count = 99;
    tree.children.pop();
    const saved = await c.owner.agent.put(`/api/recipes/${source.recipeId}`).set('Origin', ORIGIN).send({ ...mine, tree });
    expect(saved.status).toBe(200);
    expect((await c.owner.agent.get(`${base()}/versions/1`)).body.version).toEqual(before);
    expect(before.tree.children[1].children[1].count).toBe(12);
  });
});

describe('using a template', () => {
  it('on an LRGB+Ha rig: 400 unmapped-bands listing OIII and SII, nothing stored', async () => {
    const rigId = await makeRig(c.member, 'LRGB Ha rig', LRGB_HA_SLOTS);
    const n = await recipeCount(c.member);
    const res = await use(c.member, { rigId });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'unmapped-bands', bands: ['OIII', 'SII'] });
    expect(await recipeCount(c.member)).toBe(n);
    const bad = await use(c.member, { rigId, bandMap: { OIII: 'Green', SII: 'No such filter' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ 'bandMap.SII': ['No filter of that name in the rig'] });
    expect(await recipeCount(c.member)).toBe(n);
  });

  it('with a band map: a recipe with the mapped filter names and the chosen target; the use is recorded', async () => {
    const rigId = await makeRig(c.member, 'LRGB Ha rig 2', LRGB_HA_SLOTS);
    const t = await c.member.agent.post('/api/targets').set('Origin', ORIGIN).send({ designation: 'IC 1396', name: 'Trunk', type: 'emission-nebula', raDeg: 324.7, decDeg: 57.5, majorArcmin: 170 });
    expect(t.status, JSON.stringify(t.body)).toBe(201);
    const stageId = (await c.member.agent.get(base())).body.template.tree.children[1].id;
    const res = await use(c.member, { rigId, name: 'My triad', bandMap: { OIII: 'Green', SII: 'Red' }, targetIds: { [stageId]: t.body.target.id } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const made = res.body.recipe;
    expect(made).toMatchObject({ name: 'My triad', rigId });
    expect(filterRefsOf(made.tree)).toEqual(['H-alpha 3nm', 'Green', 'Red']);
    expect(made.tree.children[1].targetId).toBe(t.body.target.id);
    expect(made.tree.children[1].id).not.toBe(stageId);
    expect((await c.member.agent.get(`/api/recipes/${made.id}`)).status).toBe(200);
    expect((await c.member.agent.get(`/api/recipes/${made.id}/revisions`)).body.revisions).toHaveLength(1);
    const detail = (await c.member.agent.get(base())).body.template;
    expect(detail.useCount).toBe(1);
    expect(detail.myUses).toEqual([{ recipeId: made.id, version: 1 }]);
    expect(detail.versions[0].useCount).toBe(1);
    expect((await c.member.agent.get(`/api/recipes/${made.id}/template-origin`)).body.origin).toEqual({ clubId: c.clubId, templateId, title: 'Narrowband triad', version: 1, latestVersion: 1, newer: false, newerVersions: [] });
  });

  it('a recipe not made from a template has no origin; another user’s recipe is 404', async () => {
    expect((await c.owner.agent.get(`/api/recipes/${source.recipeId}/template-origin`)).body.origin).toBeNull();
    expect((await c.owner.agent.get(`/api/recipes/${source.recipeId}/template-diff`)).status).toBe(404);
    expect((await c.outsider.agent.get(`/api/recipes/${source.recipeId}/template-origin`)).status).toBe(404);
  });
});

describe('a new version', () => {
  it('mails members who used the template (not one who opted out), and their copies can be compared', async () => {
    const keen = await signUp(h, { name: 'Keen Member' });
    const quiet = await signUp(h, { name: 'Quiet Member' });
    await joinClub(c.owner, keen, c.clubId, 'member');
    await joinClub(c.owner, quiet, c.clubId, 'member');
    const keenCopy = (await use(keen, { rigId: null })).body.recipe;
    expect((await use(quiet, { rigId: null })).status).toBe(201);
    await quiet.agent.put('/api/account/settings').set('Origin', ORIGIN).send({ notifyTemplateVersions: false });

    // Version 2 from the edited source (the 99-frame Ha block and no final park).
    const v2 = await c.owner.agent.post(`${base()}/versions`).set('Origin', ORIGIN).send({ recipeId: source.recipeId, changelog: 'Longer Ha, no park' });
    expect(v2.status).toBe(201);
    expect(v2.body.template.latestVersion).toBe(2);
    const mail = await mailTo(h, keen.email);
    expect(mail.subject).toBe('New version of Narrowband triad');
    expect(mail.text).toContain(`${ORIGIN}/clubs/${c.clubId}/templates/${templateId}`);
    const toQuiet = await h.db.select().from(devMail).where(and(sql`${devMail.to} @> ${JSON.stringify([quiet.email])}::jsonb`, eq(devMail.subject, 'New version of Narrowband triad')));
    expect(toQuiet).toEqual([]);

    // The notice lists what the newer versions say, newest first.
    const origin = (await keen.agent.get(`/api/recipes/${keenCopy.id}/template-origin`)).body.origin;
    expect(origin).toMatchObject({ version: 1, latestVersion: 2, newer: true });
    expect(origin.newerVersions).toEqual([{ version: 2, changelog: 'Longer Ha, no park', createdAt: expect.any(String) }]);
    const diff = await keen.agent.get(`/api/recipes/${keenCopy.id}/template-diff`);
    expect(diff.status).toBe(200);
    expect(diff.body.from).toBe(1);
    expect(diff.body.to).toBe(2);
    // Each change in words (shared/recipe/summary.ts), in the stage named by the template's suggested target.
    expect(diff.body.changes).toEqual([
      {
        kind: 'changed',
        path: '1.1',
        nodeKind: 'expose',
        before: 'Ha 12 × 300 s, bin 1, dither every frame',
        after: 'Ha 99 × 300 s, bin 1, dither every frame',
        where: { within: ["stage 'NGC 7000'"], step: 2 },
      },
      { kind: 'removed', path: '2', nodeKind: 'park', before: 'Park the mount', where: { within: [], step: 3 } },
    ]);

    // A third version: both changelogs, newest first; a copy of version 2 sees only the third.
    const v3 = await c.owner.agent.post(`${base()}/versions`).set('Origin', ORIGIN).send({ recipeId: source.recipeId, changelog: 'Same steps, new notes' });
    expect(v3.status).toBe(201);
    const both = (await keen.agent.get(`/api/recipes/${keenCopy.id}/template-origin`)).body.origin;
    expect(both.newerVersions.map((v: { version: number; changelog: string }) => [v.version, v.changelog])).toEqual([
      [3, 'Same steps, new notes'],
      [2, 'Longer Ha, no park'],
    ]);
    const quietCopy = (await use(quiet, { rigId: null, version: 2 })).body.recipe;
    const later = (await quiet.agent.get(`/api/recipes/${quietCopy.id}/template-origin`)).body.origin;
    expect(later).toMatchObject({ version: 2, latestVersion: 3, newer: true });
    expect(later.newerVersions.map((v: { version: number }) => v.version)).toEqual([3]);
    expect((await quiet.agent.get(`/api/recipes/${quietCopy.id}/template-diff`)).body.changes).toEqual([]);
    // Version 1 is still there as it was.
    expect((await keen.agent.get(`${base()}/versions/1`)).body.version.tree.children).toHaveLength(3);
  });

  it('a member who left sees no origin and gets 404 for the club’s template', async () => {
    const gone = await signUp(h, { name: 'Gone Member' });
    await joinClub(c.owner, gone, c.clubId, 'member');
    const copy = (await use(gone, { rigId: null })).body.recipe;
    await gone.agent.post('/api/auth/organization/leave').set('Origin', ORIGIN).send({ organizationId: c.clubId });
    expect((await gone.agent.get(`/api/recipes/${copy.id}/template-origin`)).body.origin).toBeNull();
    expect((await gone.agent.get(base())).status).toBe(404);
  });
});
