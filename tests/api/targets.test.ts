import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { framing, target } from '@/db/schema';
import { buildFits, imageCards } from '@/tests/helpers/fits';
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

// M42, published J2000 position (e.g. SIMBAD): 05h35m17.3s −05°23′28″.
const m42 = { designation: 'M42', aliases: ['NGC 1976'], name: 'Orion Nebula', type: 'emission-nebula', raDeg: 83.822, decDeg: -5.391, majorArcmin: 85, minorArcmin: 60, positionAngleDeg: null, magnitude: 4 };
const frame = { name: 'Core', raDeg: 83.822, decDeg: -5.391, positionAngleDeg: 90 };
const targetCount = async (id: string) => (await h.db.select().from(target).where(eq(target.ownerId, id))).length;

describe('/api/targets', () => {
  it('401 without a session', async () => {
    for (const [m, p] of [['get', '/api/targets'], ['post', '/api/targets'], ['post', '/api/targets/00000000-0000-4000-8000-000000000000/framings']] as const) {
      expect((await request(h.app)[m](p).set('Origin', ORIGIN).send(m42)).status).toBe(401);
    }
  });

  it('adds a target once (409 duplicate the second time), lists it with its framings', async () => {
    const created = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send(m42);
    expect(created.status).toBe(201);
    expect(created.body.target).toMatchObject({ designation: 'M42', aliases: ['NGC 1976'], framings: [] });
    const again = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send(m42);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('duplicate');
    const id = created.body.target.id as string;
    const f = await owner.agent.post(`/api/targets/${id}/framings`).set('Origin', ORIGIN).send(frame);
    expect(f.status).toBe(201);
    expect(f.body.framing).toMatchObject({ ...frame, mosaicCols: 1, mosaicRows: 1, version: 1 });
    const list = await owner.agent.get('/api/targets');
    expect(list.body.targets.find((t: { id: string }) => t.id === id).framings).toHaveLength(1);
  });

  it('400 with field errors for a bad target or framing, nothing stored', async () => {
    const before = await targetCount(owner.id);
    const bad = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ ...m42, designation: 'X1', raDeg: 400, decDeg: -91, type: 'comet' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['raDeg', 'decDeg', 'type']));
    expect(await targetCount(owner.id)).toBe(before);
    const t = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ ...m42, designation: 'NGC 2024', name: 'Flame' });
    const fbad = await owner.agent.post(`/api/targets/${t.body.target.id}/framings`).set('Origin', ORIGIN).send({ ...frame, positionAngleDeg: 360, mosaicCols: 0, rigId: '00000000-0000-4000-8000-000000000000' });
    expect(fbad.status).toBe(400);
    expect(Object.keys(fbad.body.error.fields)).toEqual(expect.arrayContaining(['positionAngleDeg', 'mosaicCols']));
    const fForeignRig = await owner.agent.post(`/api/targets/${t.body.target.id}/framings`).set('Origin', ORIGIN).send({ ...frame, rigId: '00000000-0000-4000-8000-000000000000' });
    expect(fForeignRig.status).toBe(400);
    expect(fForeignRig.body.error.fields.rigId).toBeDefined();
    expect(await h.db.select().from(framing).where(eq(framing.targetId, t.body.target.id))).toHaveLength(0);
  });

  it("hides another user's target and framings (404) and refuses stale versions (409)", async () => {
    const t = await owner.agent.post('/api/targets').set('Origin', ORIGIN).send({ ...m42, designation: 'M43', name: "De Mairan's Nebula" });
    const id = t.body.target.id as string;
    const f = await owner.agent.post(`/api/targets/${id}/framings`).set('Origin', ORIGIN).send(frame);
    const fid = f.body.framing.id as string;
    expect((await other.agent.get(`/api/targets/${id}`)).status).toBe(404);
    expect((await other.agent.post(`/api/targets/${id}/framings`).set('Origin', ORIGIN).send(frame)).status).toBe(404);
    expect((await other.agent.put(`/api/targets/${id}/framings/${fid}`).set('Origin', ORIGIN).send({ ...frame, version: 1 })).status).toBe(404);
    expect((await other.agent.delete(`/api/targets/${id}`).set('Origin', ORIGIN)).status).toBe(404);
    const ok = await owner.agent.put(`/api/targets/${id}/framings/${fid}`).set('Origin', ORIGIN).send({ ...frame, positionAngleDeg: 270, version: 1 });
    expect(ok.body.framing.version).toBe(2);
    const stale = await owner.agent.put(`/api/targets/${id}/framings/${fid}`).set('Origin', ORIGIN).send({ ...frame, positionAngleDeg: 0, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current.positionAngleDeg).toBe(270);
    const notes = await owner.agent.put(`/api/targets/${id}`).set('Origin', ORIGIN).send({ ...m42, designation: 'M43', notes: 'Needs short subs for the core', version: 1 });
    expect(notes.body.target.notes).toBe('Needs short subs for the core');
    expect((await owner.agent.put(`/api/targets/${id}`).set('Origin', ORIGIN).send({ ...m42, designation: 'M43', version: 1 })).status).toBe(409);
    expect((await owner.agent.delete(`/api/targets/${id}/framings/${fid}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await owner.agent.delete(`/api/targets/${id}`).set('Origin', ORIGIN)).status).toBe(204);
  });
});

describe('POST /api/fits/framing', () => {
  // checks.md worked example: CROTA2 = 30°, 1.46331″/px → CD matrix below → PA 330°.
  const cdCards = [
    { key: 'CTYPE1', value: 'RA---TAN' },
    { key: 'CTYPE2', value: 'DEC--TAN' },
    { key: 'CRVAL1', value: 83.822 },
    { key: 'CRVAL2', value: -5.391 },
    { key: 'CRPIX1', value: 8.5 },
    { key: 'CRPIX2', value: 4.5 },
    { key: 'CD1_1', raw: '-3.520182981D-4'.padStart(20) },
    { key: 'CD1_2', raw: '-2.032378592D-4'.padStart(20) },
    { key: 'CD2_1', raw: '-2.032378592D-4'.padStart(20) },
    { key: 'CD2_2', raw: '3.520182981D-4'.padStart(20) },
    { key: 'OBJECT', value: 'M42' },
    { key: 'FILTER', value: 'Ha' },
    { key: 'EXPTIME', value: 300 },
  ];
  const post = (u: TestUser | null, bytes: Uint8Array) =>
    (u ? u.agent.post('/api/fits/framing') : request(h.app).post('/api/fits/framing')).set('Origin', ORIGIN).set('Content-Type', 'application/octet-stream').send(Buffer.from(bytes));

  it('reads the framing of a plate-solved header (position angle 330°, scale 1.46331″/px)', async () => {
    const res = await post(owner, buildFits(imageCards(16, 8, cdCards)));
    expect(res.status).toBe(200);
    expect(res.body.framing.positionAngleDeg).toBeCloseTo(330, 5);
    expect(res.body.framing.pixelScaleArcsecPerPx).toBeCloseTo(1.46331, 4);
    expect(res.body.framing.mirrored).toBe(false);
    expect(res.body.framing.raDeg).toBeCloseTo(83.822, 3);
    expect(res.body.frame).toMatchObject({ object: 'M42', filter: 'Ha', exposureS: 300 });
  });

  it('401 without a session; 400 with the reason for a broken header; 422 without WCS', async () => {
    expect((await post(null, buildFits(imageCards()))).status).toBe(401);
    const noEnd = await post(owner, buildFits(imageCards(16, 8, cdCards), { dropEnd: true }));
    expect(noEnd.status).toBe(400);
    expect(noEnd.body.error.code).toBe('invalid-fits');
    expect(noEnd.body.error.message).toMatch(/END/);
    const junk = await post(owner, new TextEncoder().encode('this is not a fits file at all'));
    expect(junk.status).toBe(400);
    const plain = await post(owner, buildFits(imageCards(16, 8, [{ key: 'OBJECT', value: 'M42' }])));
    expect(plain.status).toBe(422);
    expect(plain.body.error.code).toBe('no-wcs');
  });
});

describe('GET /api/visibility', () => {
  it('401 without a session, 404 without a site, 400 on bad coordinates, the curve otherwise', async () => {
    expect((await request(h.app).get('/api/visibility?raDeg=10&decDeg=41')).status).toBe(401);
    const u = await signUp(h);
    expect((await u.agent.get('/api/visibility?raDeg=10&decDeg=41')).body.error.code).toBe('no-site');
    await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
    const bad = await u.agent.get('/api/visibility?raDeg=abc&decDeg=100');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['decDeg', 'raDeg']);
    const ok = await u.agent.get('/api/visibility?raDeg=10.6847&decDeg=41.2689&date=2026-12-01');
    expect(ok.status).toBe(200);
    expect(ok.body.visibility.samples.length).toBe(145);
    expect(ok.body.visibility.usableDarkMinutes).toBeGreaterThan(200);
  });
});
