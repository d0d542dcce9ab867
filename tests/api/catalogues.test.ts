import fs from 'node:fs';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { catalogue } from '@/db/schema';
import { findBuiltinTarget } from '@/shared/targets/builtin';
import { OPENNGC_NGC_CSV, openNgcAvailable, openNgcSuite } from '@/tests/helpers/openngc';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let admin: TestUser;
let plain: TestUser;
let outsider: TestUser;
let clubId: string;

async function joinClub(u: TestUser, role: 'admin' | 'member') {
  const inv = await owner.agent.post('/api/auth/organization/invite-member').set('Origin', ORIGIN).send({ email: u.email, role, organizationId: clubId });
  await u.agent.post('/api/auth/organization/accept-invitation').set('Origin', ORIGIN).send({ invitationId: inv.body.id });
}

beforeAll(async () => {
  h = await startHarness();
  [owner, admin, plain, outsider] = [await signUp(h), await signUp(h), await signUp(h), await signUp(h)];
  const club = await owner.agent.post('/api/auth/organization/create').set('Origin', ORIGIN).send({ name: 'Catalogue Circle', slug: `cat-circle-${owner.id.slice(0, 8).toLowerCase()}` });
  clubId = club.body.id;
  await joinClub(admin, 'admin');
  await joinClub(plain, 'member');
});
afterAll(async () => h.close());

const csv = ['designation,ra,dec,type,size,mag,name', 'XC 1,05:35:17,-05:23:28,emission-nebula,60,4,Test Cloud', 'XC 2,10:00:00,+70:00:00,galaxy,5,11,Polar Smudge', 'XC 3,25:00:00,+10:00:00,galaxy,2,12,Broken RA'].join('\n');
const upload = (u: TestUser | null, path: string, body: string) =>
  (u ? u.agent.post(path) : request(h.app).post(path)).set('Origin', ORIGIN).set('Content-Type', 'text/csv').send(body);
const countCatalogues = async (ownerId: string) => (await h.db.select().from(catalogue).where(eq(catalogue.ownerId, ownerId))).length;

describe('catalogue import', () => {
  it('401 without a session on every route', async () => {
    expect((await request(h.app).get('/api/catalogues')).status).toBe(401);
    expect((await upload(null, '/api/catalogues/preview', csv)).status).toBe(401);
    expect((await upload(null, '/api/catalogues?name=x', csv)).status).toBe(401);
    expect((await request(h.app).get('/api/catalogue/search?q=m31')).status).toBe(401);
  });

  it('previews without storing, reporting bad rows by line', async () => {
    const before = await countCatalogues(owner.id);
    const res = await upload(owner, '/api/catalogues/preview', csv);
    expect(res.status).toBe(200);
    expect(res.body.layout.mapping.layout).toBe('generic');
    expect(res.body.count).toBe(2);
    expect(res.body.errors).toEqual([expect.objectContaining({ line: 4 })]);
    expect(await countCatalogues(owner.id)).toBe(before);
  });

  it('refuses a file with bad rows unless the user accepts them, then keeps only the good rows', async () => {
    const before = await countCatalogues(owner.id);
    const refused = await upload(owner, '/api/catalogues?name=Mine', csv);
    expect(refused.status).toBe(400);
    expect(refused.body.error.code).toBe('invalid-csv');
    expect(refused.body.error.rows[0].line).toBe(4);
    expect(await countCatalogues(owner.id)).toBe(before);
    const accepted = await upload(owner, '/api/catalogues?name=Mine&acceptErrors=1', csv);
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ imported: 2, skippedRows: 1, catalogue: { name: 'Mine', objectCount: 2, ownedByMe: true } });
    const found = await owner.agent.get('/api/catalogue/search?q=polar smudge');
    expect(found.body.results.map((r: { designation: string }) => r.designation)).toEqual(['XC 2']);
    // Another user does not see a personal catalogue.
    expect((await outsider.agent.get('/api/catalogue/search?q=polar smudge')).body.results).toHaveLength(0);
  });

  it('400 for a missing name, an invalid mapping, an empty file; 415 for a non-CSV body', async () => {
    expect((await upload(owner, '/api/catalogues', csv)).body.error.fields.name).toBeDefined();
    expect((await upload(owner, '/api/catalogues/preview?mapping=not-json', csv)).status).toBe(400);
    const badMapping = await upload(owner, `/api/catalogues/preview?mapping=${encodeURIComponent(JSON.stringify({ layout: 'weird' }))}`, csv);
    expect(badMapping.status).toBe(400);
    expect((await upload(owner, '/api/catalogues/preview', '   ')).status).toBe(400);
    const json = await owner.agent.post('/api/catalogues/preview').set('Origin', ORIGIN).send({ csv });
    expect(json.status).toBe(415);
  });

  it('club catalogues: owners and admins import, members 403, outsiders 404; members search them', async () => {
    const path = `/api/catalogues?name=Club%20list&clubId=${clubId}&acceptErrors=1`;
    expect((await upload(plain, path, csv)).status).toBe(403);
    expect((await upload(outsider, path, csv)).status).toBe(404);
    const byAdmin = await upload(admin, path, csv);
    expect(byAdmin.status).toBe(201);
    expect(byAdmin.body.catalogue.clubName).toBe('Catalogue Circle');
    const memberSearch = await plain.agent.get('/api/catalogue/search?q=test cloud');
    expect(memberSearch.body.results[0]).toMatchObject({ designation: 'XC 1', source: 'catalogue', catalogueName: 'Club list' });
    expect((await outsider.agent.get('/api/catalogue/search?q=test cloud')).body.results).toHaveLength(0);
    const id = byAdmin.body.catalogue.id as string;
    expect((await plain.agent.delete(`/api/catalogues/${id}`).set('Origin', ORIGIN)).status).toBe(403);
    expect((await outsider.agent.delete(`/api/catalogues/${id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await owner.agent.delete(`/api/catalogues/${id}`).set('Origin', ORIGIN)).status).toBe(204);
  });
});

describe('catalogue search', () => {
  it('finds built-in objects by designation in any spelling and by name', async () => {
    for (const q of ['M31', 'm 31', 'NGC0224', 'ngc 224', 'andromeda']) {
      const res = await owner.agent.get(`/api/catalogue/search?q=${encodeURIComponent(q)}`);
      expect(res.body.results[0]?.designation, q).toBe('M31');
    }
  });

  it('filters by kind and size, and 400s on an unknown kind', async () => {
    const res = await owner.agent.get('/api/catalogue/search?kind=planetary-nebula&minSizeArcmin=10');
    expect(res.body.results.length).toBeGreaterThan(0);
    for (const r of res.body.results) {
      expect(r.type).toBe('planetary-nebula');
      expect(r.majorArcmin).toBeGreaterThanOrEqual(10);
    }
    expect((await owner.agent.get('/api/catalogue/search?kind=comet')).status).toBe(400);
  });

  it('"well placed tonight" keeps objects with enough darkness above the minimum altitude, best first', async () => {
    const u = await signUp(h);
    expect((await u.agent.get('/api/catalogue/search?wellPlaced=1')).body.error.code).toBe('no-site');
    await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
    const res = await u.agent.get('/api/catalogue/search?wellPlaced=1&date=2026-12-01&limit=200');
    expect(res.status).toBe(200);
    const designations = res.body.results.map((r: { designation: string }) => r.designation);
    // Early December at 47° N (computed): M31 and M42 are well up in darkness; the far-southern
    // globular NGC 5139 (ω Cen, δ −47°) never clears 30°.
    expect(designations).toEqual(expect.arrayContaining(['M31', 'M42']));
    expect(designations).not.toContain('NGC 5139');
    const minutes = res.body.results.map((r: { darkMinutes: number }) => r.darkMinutes);
    expect([...minutes].sort((a, b) => b - a)).toEqual(minutes);
    expect(Math.min(...minutes)).toBeGreaterThanOrEqual(60);
  });
});

describe.skipIf(!openNgcAvailable)(openNgcSuite('importing the real OpenNGC file (Mattia Verga, CC-BY-SA-4.0)'), () => {
  it('imports NGC.csv in one request and finds an object only the import provides', async () => {
    const text = fs.readFileSync(OPENNGC_NGC_CSV, 'utf8');
    const preview = await upload(owner, '/api/catalogues/preview', text);
    expect(preview.body.layout.mapping.layout).toBe('openngc');
    expect(preview.body.count).toBeGreaterThan(12_000);
    const res = await upload(owner, '/api/catalogues?name=OpenNGC', text);
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(preview.body.count);
    // NGC 7 (a faint galaxy in Sculptor) is not in the built-in list; OpenNGC has it.
    expect(findBuiltinTarget('NGC 7')).toBeUndefined();
    const found = await owner.agent.get('/api/catalogue/search?q=ngc0007');
    expect(found.body.results[0]).toMatchObject({ designation: 'NGC 7', source: 'catalogue', catalogueName: 'OpenNGC' });
    // An imported copy of a built-in object is not listed twice.
    const m31 = await owner.agent.get('/api/catalogue/search?q=m31');
    const isM31 = (r: { designation: string; aliases: string[] }) => [r.designation, ...r.aliases].some((d) => d === 'M31' || d === 'NGC 224');
    expect(m31.body.results.filter(isM31)).toEqual([expect.objectContaining({ designation: 'M31', source: 'builtin' })]);
  }, 60_000);
});
