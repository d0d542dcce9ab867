import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { separationDeg } from '@/shared/calibration/sky-geometry';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeNode } from '@/shared/recipe/types';
import { historyListSchema, targetHistorySchema, type TargetHistory } from '@/shared/schemas/calibration-api';
import { dateObs, intakeOk, light, makeTarget, recipeCount, type IntakeFile } from './calibration-fixtures';
import { clubCast, type ClubCast } from './club-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;

beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h.close());

/*
 * The recorded sky: M31 (published J2000 centre, e.g. SIMBAD) imaged at one framing over two
 * nights (L, R and a filter the rig lacks; one L frame after a meridian flip with the rotator
 * left alone, PA + 180°), a second M31 panel in Ha, NGC 7000 in Ha, an unsolved M31 frame
 * named only by OBJECT, and two frames of an object on no list.
 */
const M31 = { designation: 'M31', name: 'Andromeda Galaxy', raDeg: 10.6847, decDeg: 41.2689 };
const NGC7000 = { designation: 'NGC 7000', name: 'North America Nebula', type: 'emission-nebula', raDeg: 314.75, decDeg: 44.53 };
const FRAMING = { raDeg: 10.7, decDeg: 41.3, positionAngleDeg: 15, scaleArcsecPerPx: 1.46 };
const PANEL_2 = { raDeg: 10.9, decDeg: 41.5, positionAngleDeg: 15, scaleArcsecPerPx: 1.46 };
const N1 = '2026-10-12T19:30:00';
const N2 = '2026-10-14T19:30:00';

function recordedSky(): IntakeFile[] {
  let i = 0;
  const at = (start: string) => dateObs(start, 6 * i++);
  const m31 = (start: string, filter: string, exposureS: number, wcs = FRAMING) => light(`M31_${filter}_${i}.fits`, { dateObs: at(start), object: 'M 31', filter, exposureS, wcs });
  return [
    ...[1, 2, 3].map(() => m31(N1, 'L', 300)),
    ...[1, 2].map(() => m31(N1, 'R', 300)),
    ...[1, 2].map(() => m31(N1, 'Ha', 600, PANEL_2)),
    m31(N2, 'L', 300, { ...FRAMING, raDeg: 10.7005, decDeg: 41.3003 }),
    m31(N2, 'L', 300),
    m31(N2, 'L', 300, { ...FRAMING, positionAngleDeg: 195 }),
    m31(N2, 'L', 120),
    m31(N2, 'Xyz', 300),
    light('unsolved.fits', { dateObs: at(N2), object: 'm 31', filter: 'L', exposureS: 300 }),
    ...[1, 2].map(() => light(`NA_Ha_${i}.fits`, { dateObs: at(N1), object: 'NGC7000', filter: 'Ha', exposureS: 600, wcs: { raDeg: 314.75, decDeg: 44.53, positionAngleDeg: 0, scaleArcsecPerPx: 1.46 } })),
    ...[1, 2].map(() => light(`comet_${i}.fits`, { dateObs: at(N1), object: 'Comet 2026 A1', filter: 'L', exposureS: 60 })),
  ];
}

/** The user's site, targets and recorded lights; returns the target ids. */
async function recordSky(u: TestUser): Promise<{ m31: string; ngc7000: string }> {
  await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
  const m31 = await makeTarget(u, M31);
  const ngc7000 = await makeTarget(u, NGC7000);
  const res = await intakeOk(u, recordedSky());
  expect(res.recorded.light).toBe(17);
  return { m31, ngc7000 };
}

// Totals of M31 (the frames above): 7 L at 300 s + 1 at 120 s, 2 R, 2 Ha at 600 s, 1 Xyz.
const M31_BY_FILTER = [
  { filter: 'Ha', frames: 2, seconds: 1200 },
  { filter: 'L', frames: 8, seconds: 2220 },
  { filter: 'R', frames: 2, seconds: 600 },
  { filter: 'Xyz', frames: 1, seconds: 300 },
];

describe('history API: sessions and ownership', () => {
  it('401 JSON on every route without a session', async () => {
    const id = randomUUID();
    const anonymous = () => request(h.app);
    const calls = [
      anonymous().get('/api/history'),
      anonymous().get(`/api/history/targets/${id}`),
      anonymous().get('/api/history/objects/Comet'),
      anonymous().post(`/api/history/targets/${id}/continue`).send({}),
      anonymous().post(`/api/history/targets/${id}/shares`).send({}),
      anonymous().delete(`/api/history/targets/${id}/shares/club`),
      anonymous().get('/api/clubs/club/captures'),
    ];
    for (const call of calls) {
      const res = await call.set('Origin', ORIGIN);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    }
  });
});

describe('capture history', () => {
  let a: TestUser;
  let b: TestUser;
  let ids: { m31: string; ngc7000: string };
  let m31History: TargetHistory;

  beforeAll(async () => {
    a = await signUp(h);
    b = await signUp(h);
    ids = await recordSky(a);
  });

  it('lists every target with lights and the unmatched ones by OBJECT: totals per filter and night', async () => {
    const res = await a.agent.get('/api/history');
    expect(res.status).toBe(200);
    const { targets } = historyListSchema.parse(res.body);
    expect(targets.map((t) => [t.targetId, t.label, t.frames, t.seconds, t.nights, t.firstNight, t.lastNight])).toEqual([
      [ids.m31, 'M31', 13, 4320, 2, '2026-10-12', '2026-10-14'],
      [null, 'Comet 2026 A1', 2, 120, 1, '2026-10-12', '2026-10-12'],
      [ids.ngc7000, 'NGC 7000', 2, 1200, 1, '2026-10-12', '2026-10-12'],
    ]);
    expect(targets[0]).toMatchObject({ name: 'Andromeda Galaxy', byFilter: M31_BY_FILTER, sharedWith: [] });
  });

  it('one target: recorded framings (centre within 1′, flipped frames apart), nights and unsolved frames', async () => {
    const res = await a.agent.get(`/api/history/targets/${ids.m31}`);
    expect(res.status).toBe(200);
    m31History = targetHistorySchema.parse(res.body);
    expect(m31History.unsolvedFrames).toBe(1);
    const [main, panel] = m31History.framings;
    expect(m31History.framings).toHaveLength(2);
    expect(separationDeg(main!.raDeg, main!.decDeg, FRAMING.raDeg, FRAMING.decDeg) * 60).toBeLessThan(1);
    expect(main!.positionAngleDeg).toBeCloseTo(15, 6);
    expect(main).toMatchObject({ frames: 9, seconds: 2520, flippedFrames: 1, flippedSeconds: 300, framingId: null });
    expect(main!.byFilter).toEqual([
      { filter: 'L', frames: 7, seconds: 1920 },
      { filter: 'R', frames: 2, seconds: 600 },
      { filter: 'Xyz', frames: 1, seconds: 300 },
    ]);
    expect(panel).toMatchObject({ frames: 2, seconds: 1200, byFilter: [{ filter: 'Ha', frames: 2, seconds: 1200 }] });
    expect(m31History.nights).toEqual([
      { nightDate: '2026-10-12', seconds: 2700, byFilter: [{ filter: 'Ha', frames: 2, seconds: 1200 }, { filter: 'L', frames: 3, seconds: 900 }, { filter: 'R', frames: 2, seconds: 600 }] },
      { nightDate: '2026-10-14', seconds: 1620, byFilter: [{ filter: 'L', frames: 5, seconds: 1320 }, { filter: 'Xyz', frames: 1, seconds: 300 }] },
    ]);
    const comet = await a.agent.get(`/api/history/objects/${encodeURIComponent('comet 2026 a1')}`);
    expect(comet.status).toBe(200);
    expect(targetHistorySchema.parse(comet.body).target).toMatchObject({ targetId: null, label: 'Comet 2026 A1', frames: 2 });
    expect((await a.agent.get('/api/history/objects/Nothing%20here')).status).toBe(404);
  });

  it('continue without a recipe: a new recipe whose stage is framed within 1′ of the recorded centre, with the most used exposure per filter', async () => {
    const main = m31History.framings[0]!;
    const res = await a.agent.post(`/api/history/targets/${ids.m31}/continue`).set('Origin', ORIGIN).send({ framingKey: main.key, positionAngleDeg: main.positionAngleDeg });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.skippedFilters).toEqual(['Xyz']); // not in the default rig's wheel
    const recipe = (await a.agent.get(`/api/recipes/${res.body.recipeId}`)).body.recipe;
    expect(recipe).toMatchObject({ name: 'Continue M31', rigId: null, version: 1 });
    expect(recipe.siteId).toEqual(expect.any(String));
    const stage = recipeTreeSchema.parse(recipe.tree).children.find((n) => n.kind === 'stage');
    if (stage?.kind !== 'stage') throw new Error('no stage');
    expect(stage.targetId).toBe(ids.m31);
    expect(separationDeg(stage.framing!.raDeg, stage.framing!.decDeg, FRAMING.raDeg, FRAMING.decDeg) * 60).toBeLessThan(1);
    expect(stage.framing!.positionAngleDeg).toBeCloseTo(15, 6);
    const exposes = stage.children.filter((c): c is Extract<RecipeNode, { kind: 'expose' }> => c.kind === 'expose');
    // L: 6 frames at 300 s against 1 at 120 s.
    expect(exposes.map((e) => [e.filter, e.exposureS, e.gain, e.offset, e.binning])).toEqual([
      ['L', 300, 0, 50, 1],
      ['R', 300, 0, 50, 1],
    ]);
  });

  it('continue into a recipe: the stage is appended with a version check (409 when stale) and a new revision', async () => {
    const panel = m31History.framings[1]!;
    const made = await a.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'Autumn galaxies', start: { kind: 'empty' } });
    expect(made.status).toBe(201);
    const recipeId = made.body.recipe.id;
    const body = { framingKey: panel.key, positionAngleDeg: (panel.positionAngleDeg + 180) % 360, recipeId };
    const noVersion = await a.agent.post(`/api/history/targets/${ids.m31}/continue`).set('Origin', ORIGIN).send(body);
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.error.fields.version).toBeDefined();
    const added = await a.agent.post(`/api/history/targets/${ids.m31}/continue`).set('Origin', ORIGIN).send({ ...body, version: 1 });
    expect(added.status).toBe(201);
    expect(added.body).toEqual({ recipeId, skippedFilters: [] });
    const stale = await a.agent.post(`/api/history/targets/${ids.m31}/continue`).set('Origin', ORIGIN).send({ ...body, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'version-conflict', current: { id: recipeId, version: 2 } });
    const recipe = (await a.agent.get(`/api/recipes/${recipeId}`)).body.recipe;
    expect(recipe.version).toBe(2);
    const stages = recipeTreeSchema.parse(recipe.tree).children.filter((n) => n.kind === 'stage');
    expect(stages).toHaveLength(1);
    expect(stages[0]!.kind === 'stage' && stages[0]!.framing!.positionAngleDeg).toBeCloseTo(195, 6);
    const revisions = (await a.agent.get(`/api/recipes/${recipeId}/revisions`)).body.revisions;
    expect(revisions.map((r: { version: number }) => r.version)).toEqual([2, 1]);
  });

  it('continue: 404 for a framing that is gone, an unknown or foreign target or recipe; 400 for bad input; nothing stored', async () => {
    const main = m31History.framings[0]!;
    const before = await recipeCount(h.db, a.id);
    const post = (u: TestUser, targetId: string, body: object) => u.agent.post(`/api/history/targets/${targetId}/continue`).set('Origin', ORIGIN).send(body);
    expect((await post(a, ids.m31, { framingKey: '1.000,2.000,3.0', positionAngleDeg: 0 })).status).toBe(404);
    expect((await post(a, randomUUID(), { framingKey: main.key, positionAngleDeg: 15 })).status).toBe(404);
    expect((await post(b, ids.m31, { framingKey: main.key, positionAngleDeg: 15 })).status).toBe(404);
    const foreignRecipe = (await b.agent.post('/api/recipes').set('Origin', ORIGIN).send({ start: { kind: 'empty' } })).body.recipe.id;
    expect((await post(a, ids.m31, { framingKey: main.key, positionAngleDeg: 15, recipeId: foreignRecipe, version: 1 })).status).toBe(404);
    const bad = await post(a, ids.m31, { framingKey: '', positionAngleDeg: 360 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['framingKey', 'positionAngleDeg']);
    expect(await recipeCount(h.db, a.id)).toBe(before);
  });

  it('privacy: another user sees none of the history and cannot read, continue or share the target', async () => {
    expect((await b.agent.get('/api/history')).body).toEqual({ targets: [] });
    expect((await b.agent.get(`/api/history/targets/${ids.m31}`)).status).toBe(404);
    expect((await b.agent.get('/api/history/objects/Comet%202026%20A1')).status).toBe(404);
    expect((await b.agent.post(`/api/history/targets/${ids.m31}/shares`).set('Origin', ORIGIN).send({ organizationId: 'any' })).status).toBe(404);
    expect((await b.agent.delete(`/api/history/targets/${ids.m31}/shares/any`).set('Origin', ORIGIN)).status).toBe(404);
    // B's own target at the same place does not see A's frames either.
    const mine = await makeTarget(b, M31);
    const own = await b.agent.get(`/api/history/targets/${mine}`);
    expect(own.status).toBe(200);
    expect(own.body.target.frames).toBe(0);
    expect(own.body.framings).toEqual([]);
  });
});

describe('sharing capture summaries with a club', () => {
  let cast: ClubCast;
  let ids: { m31: string; ngc7000: string };
  const share = (u: TestUser, targetId: string, organizationId: string) => u.agent.post(`/api/history/targets/${targetId}/shares`).set('Origin', ORIGIN).send({ organizationId });
  const captures = (u: TestUser, clubId = cast.clubId) => u.agent.get(`/api/clubs/${clubId}/captures`);

  beforeAll(async () => {
    cast = await clubCast(h, 'Dark Sky Circle');
    ids = await recordSky(cast.member);
  });

  it('nothing is shared until the owner shares a target', async () => {
    const res = await captures(cast.owner);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ captures: [] });
  });

  it('a member shares one target (idempotent): members see its summary, never frames nor unshared targets', async () => {
    const first = await share(cast.member, ids.m31, cast.clubId);
    expect(first.status).toBe(200);
    expect(first.body.sharedWith).toEqual([cast.clubId]);
    expect((await share(cast.member, ids.m31, cast.clubId)).body.sharedWith).toEqual([cast.clubId]);
    const summary = { ownerName: 'Club Member', designation: 'M31', name: 'Andromeda Galaxy', frames: 13, seconds: 4320, nights: 2, lastNight: '2026-10-14', byFilter: M31_BY_FILTER };
    for (const viewer of [cast.owner, cast.admin, cast.member]) {
      const res = await captures(viewer);
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ captures: [summary] });
    }
    const mine = historyListSchema.parse((await cast.member.agent.get('/api/history')).body).targets;
    expect(mine.find((t) => t.targetId === ids.m31)!.sharedWith).toEqual([cast.clubId]);
    expect(mine.find((t) => t.targetId === ids.ngc7000)!.sharedWith).toEqual([]);
  });

  it('403 for outsiders and for sharing into a club one is not in; 404 for sharing someone else’s target; 400 without a club', async () => {
    expect((await captures(cast.outsider)).status).toBe(403);
    expect((await captures(cast.otherOwner)).status).toBe(403);
    expect((await captures(cast.owner, cast.otherClubId)).status).toBe(403);
    expect((await share(cast.member, ids.ngc7000, cast.otherClubId)).status).toBe(403);
    expect((await share(cast.owner, ids.ngc7000, cast.clubId)).status).toBe(404);
    const bad = await share(cast.member, ids.ngc7000, '');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.organizationId).toBeDefined();
    expect((await captures(cast.owner)).body.captures.map((c: { designation: string }) => c.designation)).toEqual(['M31']);
  });

  it('unsharing removes the summary from the club', async () => {
    const res = await cast.member.agent.delete(`/api/history/targets/${ids.m31}/shares/${cast.clubId}`).set('Origin', ORIGIN);
    expect(res.status).toBe(200);
    expect(res.body.sharedWith).toEqual([]);
    expect((await captures(cast.owner)).body).toEqual({ captures: [] });
  });
});
