import { count } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clubTemplate, clubTemplateVersion, recipe, templateUse } from '@/db/schema';
import { CHANGELOG_MAX_CHARS } from '@/shared/schemas/club-api';
import { clubCast, narrowbandRecipe, publish, type ClubCast } from './club-fixtures';
import { ORIGIN, startHarness, type Harness, type TestUser } from './harness';

let h: Harness;
let c: ClubCast;
let templateId: string;
const recipes = new Map<string, string>();

beforeAll(async () => {
  h = await startHarness();
  c = await clubCast(h, 'Matrix Circle');
  for (const u of [c.owner, c.admin, c.member, c.outsider, c.otherOwner]) recipes.set(u.id, (await narrowbandRecipe(u)).recipeId);
  templateId = await publish(c.owner, c.clubId, recipes.get(c.owner.id)!);
});
afterAll(async () => h.close());

/** Rows of every table a template action may write. */
async function stored() {
  const n = async (t: typeof clubTemplate | typeof clubTemplateVersion | typeof templateUse | typeof recipe) => Number((await h.db.select({ n: count() }).from(t))[0]!.n);
  return { templates: await n(clubTemplate), versions: await n(clubTemplateVersion), uses: await n(templateUse), recipes: await n(recipe) };
}

type Who = 'owner' | 'admin' | 'member' | 'outsider' | 'otherClub';
const who = (w: Who): TestUser => ({ owner: c.owner, admin: c.admin, member: c.member, outsider: c.outsider, otherClub: c.otherOwner })[w];
const base = () => `/api/clubs/${c.clubId}/templates`;

/** Every action, as a request of a user, with the status expected per role (the permission matrix). */
const ACTIONS: { name: string; write: boolean; run: (u: TestUser) => request.Test; expect: Record<Who, number> }[] = [
  { name: 'list', write: false, run: (u) => u.agent.get(base()), expect: { owner: 200, admin: 200, member: 200, outsider: 404, otherClub: 404 } },
  { name: 'detail', write: false, run: (u) => u.agent.get(`${base()}/${templateId}`), expect: { owner: 200, admin: 200, member: 200, outsider: 404, otherClub: 404 } },
  { name: 'version read', write: false, run: (u) => u.agent.get(`${base()}/${templateId}/versions/1`), expect: { owner: 200, admin: 200, member: 200, outsider: 404, otherClub: 404 } },
  {
    name: 'create',
    write: true,
    run: (u) => u.agent.post(base()).set('Origin', ORIGIN).send({ recipeId: recipes.get(u.id), title: 'Matrix', description: '', tags: [], changelog: 'v1' }),
    expect: { owner: 201, admin: 201, member: 403, outsider: 404, otherClub: 404 },
  },
  {
    name: 'new version',
    write: true,
    run: (u) => u.agent.post(`${base()}/${templateId}/versions`).set('Origin', ORIGIN).send({ recipeId: recipes.get(u.id), changelog: 'Another' }),
    expect: { owner: 201, admin: 201, member: 403, outsider: 404, otherClub: 404 },
  },
  { name: 'patch', write: true, run: (u) => u.agent.patch(`${base()}/${templateId}`).set('Origin', ORIGIN).send({ tags: ['narrowband', 'short nights'] }), expect: { owner: 200, admin: 200, member: 403, outsider: 404, otherClub: 404 } },
  { name: 'use', write: true, run: (u) => u.agent.post(`${base()}/${templateId}/use`).set('Origin', ORIGIN).send({ rigId: null }), expect: { owner: 201, admin: 201, member: 201, outsider: 404, otherClub: 404 } },
];

describe('template permission matrix', () => {
  it('401 without a session on every route', async () => {
    for (const a of ACTIONS) {
      const anon = { id: 'anon', agent: request.agent(h.app) } as unknown as TestUser;
      expect((await a.run(anon)).status, a.name).toBe(401);
    }
  });

  for (const a of ACTIONS) {
    for (const w of ['owner', 'admin', 'member', 'outsider', 'otherClub'] as Who[]) {
      it(`${a.name} as ${w} → ${a.expect[w]}`, async () => {
        const before = await stored();
        const res = await a.run(who(w));
        expect(res.status, JSON.stringify(res.body)).toBe(a.expect[w]);
        if (a.expect[w] >= 400) {
          expect(res.body.error.code).toBe(a.expect[w] === 403 ? 'forbidden' : 'not-found');
          if (a.write) expect(await stored()).toEqual(before);
        }
      });
    }
  }

  it('retire: 403 for a member, 404 outside the club, 200 for owner and admin; retired ones leave the members’ list', async () => {
    const t1 = await publish(c.admin, c.clubId, recipes.get(c.admin.id)!, 'To retire');
    const retire = (u: TestUser, id: string) => u.agent.post(`${base()}/${id}/retire`).set('Origin', ORIGIN).send({});
    for (const [u, status] of [[c.member, 403], [c.outsider, 404], [c.otherOwner, 404]] as const) expect((await retire(u, t1)).status).toBe(status);
    expect((await c.member.agent.get(base())).body.templates.map((t: { id: string }) => t.id)).toContain(t1);
    const done = await retire(c.owner, t1);
    expect(done.status).toBe(200);
    expect(done.body.template.retired).toBe(true);
    expect((await retire(c.admin, t1)).status).toBe(200);
    expect((await c.member.agent.get(base())).body.templates.map((t: { id: string }) => t.id)).not.toContain(t1);
    expect((await c.member.agent.get(`${base()}?retired=1`)).body.templates.map((t: { id: string }) => t.id)).not.toContain(t1);
    expect((await c.admin.agent.get(`${base()}?retired=1`)).body.templates.map((t: { id: string }) => t.id)).toContain(t1);
    // A retired template cannot be used any more, even through an old link, and nothing is stored.
    const before = (await c.member.agent.get('/api/recipes')).body.recipes.length as number;
    const used = await c.member.agent.post(`${base()}/${t1}/use`).set('Origin', ORIGIN).send({ rigId: null });
    expect(used.status).toBe(409);
    expect(used.body.error.code).toBe('template-retired');
    expect((await c.member.agent.get('/api/recipes')).body.recipes.length).toBe(before);
  });

  it("another club's owner cannot reach this club's template through their own club (404)", async () => {
    const other = `/api/clubs/${c.otherClubId}/templates/${templateId}`;
    expect((await c.otherOwner.agent.get(other)).status).toBe(404);
    expect((await c.otherOwner.agent.patch(other).set('Origin', ORIGIN).send({ title: 'Mine now' })).status).toBe(404);
    expect((await c.otherOwner.agent.post(`${other}/use`).set('Origin', ORIGIN).send({ rigId: null })).status).toBe(404);
    expect((await c.otherOwner.agent.post(`${other}/versions`).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.otherOwner.id), changelog: 'x' })).status).toBe(404);
  });

  it('403 for a write from another origin', async () => {
    const before = await stored();
    const res = await c.owner.agent.post(base()).set('Origin', 'https://evil.example').send({ recipeId: recipes.get(c.owner.id), title: 'X', changelog: 'v1' });
    expect(res.status).toBe(403);
    expect(await stored()).toEqual(before);
  });
});

describe('template bad input: 400 with fields, nothing stored', () => {
  const cases: { name: string; run: () => request.Test; fields: string[] }[] = [
    { name: 'create without title or changelog', run: () => c.owner.agent.post(base()).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.owner.id), title: ' ', tags: [] }), fields: ['title', 'changelog'] },
    { name: 'create from someone else’s recipe', run: () => c.owner.agent.post(base()).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.member.id), title: 'T', changelog: 'v1' }), fields: ['recipeId'] },
    { name: 'create with too many tags', run: () => c.owner.agent.post(base()).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.owner.id), title: 'T', changelog: 'v1', tags: Array.from({ length: 11 }, (_, i) => `t${i}`) }), fields: ['tags'] },
    { name: 'new version without changelog', run: () => c.owner.agent.post(`${base()}/${templateId}/versions`).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.owner.id) }), fields: ['changelog'] },
    {
      name: 'new version with a changelog one character over the limit',
      run: () => c.owner.agent.post(`${base()}/${templateId}/versions`).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.owner.id), changelog: 'x'.repeat(CHANGELOG_MAX_CHARS + 1) }),
      fields: ['changelog'],
    },
    { name: 'new version from a bad id', run: () => c.owner.agent.post(`${base()}/${templateId}/versions`).set('Origin', ORIGIN).send({ recipeId: 'nope', changelog: 'x' }), fields: ['recipeId'] },
    { name: 'patch with nothing to change', run: () => c.owner.agent.patch(`${base()}/${templateId}`).set('Origin', ORIGIN).send({}), fields: ['_'] },
    { name: 'patch with a long title', run: () => c.owner.agent.patch(`${base()}/${templateId}`).set('Origin', ORIGIN).send({ title: 'x'.repeat(81) }), fields: ['title'] },
    { name: 'use without rigId', run: () => c.member.agent.post(`${base()}/${templateId}/use`).set('Origin', ORIGIN).send({}), fields: ['rigId'] },
    { name: 'use with someone else’s rig', run: () => c.member.agent.post(`${base()}/${templateId}/use`).set('Origin', ORIGIN).send({ rigId: '00000000-0000-4000-8000-000000000001' }), fields: ['rigId'] },
    { name: 'use of a missing version', run: () => c.member.agent.post(`${base()}/${templateId}/use`).set('Origin', ORIGIN).send({ rigId: null, version: 99 }), fields: ['version'] },
    {
      name: 'use with a target for an unknown stage',
      run: () => c.member.agent.post(`${base()}/${templateId}/use`).set('Origin', ORIGIN).send({ rigId: null, targetIds: { '00000000-0000-4000-8000-000000000002': null } }),
      fields: ['targetIds.00000000-0000-4000-8000-000000000002'],
    },
  ];
  for (const t of cases) {
    it(t.name, async () => {
      const before = await stored();
      const detail = await c.owner.agent.get(`${base()}/${templateId}`);
      const res = await t.run();
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(Object.keys(res.body.error.fields).sort()).toEqual(t.fields.sort());
      expect(await stored()).toEqual(before);
      const after = await c.owner.agent.get(`${base()}/${templateId}`);
      expect({ ...after.body.template, updatedAt: '' }).toEqual({ ...detail.body.template, updatedAt: '' });
    });
  }

  it('a changelog of exactly the limit the forms allow is stored whole', async () => {
    const changelog = `Longer subs. ${'y'.repeat(CHANGELOG_MAX_CHARS - 13)}`;
    expect(changelog).toHaveLength(CHANGELOG_MAX_CHARS);
    const res = await c.owner.agent.post(`${base()}/${templateId}/versions`).set('Origin', ORIGIN).send({ recipeId: recipes.get(c.owner.id), changelog });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const latest = res.body.template.versions.at(-1);
    expect(latest.changelog).toBe(changelog);
  });

  it('404 for a template id that is not a uuid or not in the club, and for a missing version', async () => {
    expect((await c.member.agent.get(`${base()}/nope`)).status).toBe(404);
    expect((await c.member.agent.get(`${base()}/00000000-0000-4000-8000-000000000009`)).status).toBe(404);
    expect((await c.member.agent.get(`${base()}/${templateId}/versions/99`)).status).toBe(404);
    expect((await c.member.agent.get(`${base()}/${templateId}/versions/x`)).status).toBe(404);
  });
});
