import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { dryRunResultSchema, type DryRunResult } from '@/shared/dry-run';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeNode } from '@/shared/recipe/types';
import { darkLibrarySchema, flatsPlanSchema, intakeResultSchema } from '@/shared/schemas/calibration-api';
import { cameraFrame } from '@/tests/helpers/fits';
import { asFile, darks, dateObs, flat, frameCount, frameFile, intake, intakeOk, light, m31Night, makeTarget, noImageType, recipeCount } from './calibration-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

let h: Harness;
let a: TestUser;
let b: TestUser;

/** A user with the test site (Europe/Zurich) as default. */
async function imager(): Promise<TestUser> {
  const u = await signUp(h);
  const res = await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
  expect(res.status).toBe(201);
  return u;
}

beforeAll(async () => {
  h = await startHarness();
  a = await imager();
  b = await imager();
});
afterAll(async () => h.close());

// M31's published J2000 centre (e.g. SIMBAD), as a plate solution would put it.
const M31_WCS = { raDeg: 10.6847, decDeg: 41.2689, positionAngleDeg: 15, scaleArcsecPerPx: 1.46 };

/** Lights, darks, flats and a bias of one night, with the three ways a file fails. */
function mixedBatch() {
  const lights = [
    light('M31_L_0001.fits', { dateObs: '2026-10-12T20:00:00', exposureS: 120, object: 'M 31', filter: 'L', wcs: M31_WCS, rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
    light('M31_L_0002.fits', { dateObs: '2026-10-12T20:03:00', exposureS: 120, object: 'M 31', filter: 'L', wcs: M31_WCS, rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
    // 04:00 in Zurich: still the night that began on the 12th.
    light('M31_L_0003.fits', { dateObs: '2026-10-13T02:00:00', exposureS: 120, object: 'M 31', filter: 'L', wcs: M31_WCS, rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
  ];
  const files = [
    ...lights,
    lights[0]!, // picked twice
    ...darks('Dark_120s', '2026-10-13T04:30:00', 2),
    flat('Flat_L_0001.fits', { dateObs: '2026-10-13T05:40:00', filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
    flat('Flat_L_0002.fits', { dateObs: '2026-10-13T05:41:00', filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
    frameFile('Bias_0001.fits', { type: 'Bias Frame', dateObs: '2026-10-13T05:50:00', gain: 0, offset: 50 }),
    asFile('M31_L_0004.fits', cameraFrame({ type: 'Light Frame', dateObs: '2026-10-12T20:06:00', exposureS: 120 }, { truncateTo: 1000 })),
    asFile('notes.fits', new TextEncoder().encode('Seeing was poor after midnight; dew on the corrector.\n')),
    noImageType('mystery.fits', { type: 'Light Frame', dateObs: '2026-10-12T20:09:00', exposureS: 120 }),
  ];
  return files;
}

describe('calibration API: sessions and ownership', () => {
  const id = randomUUID();
  const routes: ['get' | 'post' | 'put' | 'delete', string][] = [
    ['post', '/api/calibration/intake'],
    ['get', '/api/calibration/frames'],
    ['delete', `/api/calibration/intakes/${id}`],
    ['get', '/api/calibration/dark-library'],
    ['post', '/api/calibration/dark-sets'],
    ['put', `/api/calibration/dark-sets/${id}`],
    ['delete', `/api/calibration/dark-sets/${id}`],
    ['delete', '/api/calibration/dark-library/intake/2026-10-12%7C120s'],
    ['delete', '/api/calibration/dark-library/bias/2026-10-12%7Cg0'],
    ['get', '/api/calibration/settings'],
    ['put', '/api/calibration/settings'],
    ['post', '/api/calibration/darks-recipe'],
    ['get', '/api/calibration/flats'],
    ['post', '/api/calibration/flats-recipe'],
  ];

  it('401 JSON on every route without a session', async () => {
    for (const [method, path] of routes) {
      const anonymous = request(h.app);
      const call = method === 'get' ? anonymous.get(path) : method === 'post' ? anonymous.post(path).send({}) : method === 'put' ? anonymous.put(path).send({}) : anonymous.delete(path);
      const res = await call.set('Origin', ORIGIN);
      expect(res.status, `${method} ${path}`).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    }
  });

  it('403 for a write from another origin', async () => {
    const res = await a.agent.post('/api/calibration/intake').set('Origin', 'https://elsewhere.example').send({ files: [] });
    expect(res.status).toBe(403);
    expect(await frameCount(h.db, a.id)).toBe(0);
  });
});

describe('intake', () => {
  it('records a mixed batch: counts by type, repeats as duplicates, each bad file with its reason', async () => {
    const res = await intakeOk(a, mixedBatch());
    intakeResultSchema.parse(res);
    expect(res.recorded).toEqual({ light: 3, dark: 2, flat: 2, bias: 1 });
    expect(res.duplicates).toBe(1);
    const rejected = Object.fromEntries(res.rejected.map((r) => [r.name, r]));
    expect(Object.keys(rejected).sort()).toEqual(['M31_L_0004.fits', 'mystery.fits', 'notes.fits']);
    expect(rejected['M31_L_0004.fits']).toMatchObject({ kind: 'truncated', reason: expect.stringMatching(/Truncated/) });
    expect(rejected['notes.fits']).toMatchObject({ kind: 'not-fits', reason: expect.stringMatching(/Not a FITS file/) });
    expect(rejected['mystery.fits']).toMatchObject({ kind: 'no-frame-type', reason: expect.stringMatching(/IMAGETYP/) });
    expect(await frameCount(h.db, a.id)).toBe(8);
  });

  it('lists the frames newest first with their night at the default site, paged', async () => {
    const all = await a.agent.get('/api/calibration/frames');
    expect(all.status).toBe(200);
    expect(all.body.frames).toHaveLength(8);
    expect(all.body.nextCursor).toBeNull();
    const times = all.body.frames.map((f: { takenAt: string }) => f.takenAt);
    expect([...times].sort().reverse()).toEqual(times);
    const lights = await a.agent.get('/api/calibration/frames?type=light');
    expect(lights.body.frames.map((f: { fileName: string; nightDate: string }) => [f.fileName, f.nightDate])).toEqual([
      ['M31_L_0003.fits', '2026-10-12'],
      ['M31_L_0002.fits', '2026-10-12'],
      ['M31_L_0001.fits', '2026-10-12'],
    ]);
    expect(lights.body.frames[0]).toMatchObject({ frameType: 'light', exposureS: 120, filter: 'L', gain: 0, offset: 50, rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 });
    expect(lights.body.frames[0].wcsRaDeg).toBeCloseTo(M31_WCS.raDeg, 6);
    expect(lights.body.frames[0].ownerId).toBeUndefined();
    const seen: string[] = [];
    let cursor: string | null = null;
    do {
      const page: request.Response = await a.agent.get(`/api/calibration/frames?limit=3${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`);
      expect(page.status).toBe(200);
      expect(page.body.frames.length).toBeLessThanOrEqual(3);
      seen.push(...page.body.frames.map((f: { id: string }) => f.id));
      cursor = page.body.nextCursor;
    } while (cursor);
    expect(seen).toEqual(all.body.frames.map((f: { id: string }) => f.id));
  });

  it('the same batch again records nothing: every good file is a duplicate', async () => {
    const res = await intakeOk(a, mixedBatch());
    expect(res.recorded).toEqual({ light: 0, dark: 0, flat: 0, bias: 0 });
    expect(res.duplicates).toBe(9);
    expect(res.rejected).toHaveLength(3);
    expect(await frameCount(h.db, a.id)).toBe(8);
  });

  it('bad input → 400 with field errors, nothing stored', async () => {
    const u = await imager();
    const good = darks('Dark', '2026-10-13T04:30:00', 1)[0]!;
    const cases: [unknown, string][] = [
      [{ files: [] }, 'files'],
      [{}, 'files'],
      [{ files: [good, { ...good, name: 'x'.repeat(261) }] }, 'files.1.name'],
      [{ files: [good, { name: 'odd.fits', headerBase64: 'not base64!' }] }, 'files.1.headerBase64'],
      [{ files: [{ name: '   ', headerBase64: good.headerBase64 }] }, 'files.0.name'],
    ];
    for (const [body, field] of cases) {
      const res = await u.agent.post('/api/calibration/intake').set('Origin', ORIGIN).send(body as object);
      expect(res.status, field).toBe(400);
      expect(res.body.error.code).toBe('invalid-input');
      expect(res.body.error.fields[field], JSON.stringify(res.body.error.fields)).toBeDefined();
    }
    const notJson = await u.agent.post('/api/calibration/intake').set('Origin', ORIGIN).set('Content-Type', 'application/json').send('{"files": [');
    expect(notJson.status).toBe(400);
    expect(notJson.body.error.code).toBe('invalid-json');
    for (const q of ['limit=0', 'limit=501', 'type=comet', 'night=2026-02-30', 'cursor=yesterday']) {
      const res = await u.agent.get(`/api/calibration/frames?${q}`);
      expect(res.status, q).toBe(400);
      expect(Object.keys(res.body.error.fields)).toHaveLength(1);
    }
    expect(await frameCount(h.db, u.id)).toBe(0);
  });

  it('413 JSON for a body over the intake limit (24 MB), nothing stored', async () => {
    const u = await imager();
    const res = await intake(u, [{ name: 'huge.fits', headerBase64: 'A'.repeat(25 * 1024 * 1024) }]);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too-large');
    expect(await frameCount(h.db, u.id)).toBe(0);
  });

  it('one transaction: a database failure in the second batch of rows leaves nothing recorded; the retry records all', async () => {
    const u = await imager();
    // 520 darks fill more than one INSERT (500 rows each); a trigger refuses the last file's row.
    const files = [...darks('Dark_300s', '2026-09-01T20:00:00', 520, 300), ...darks('poison', '2026-09-03T20:00:00', 1, 300)];
    files[520] = { ...files[520]!, name: 'poison.fits' };
    await h.db.execute(sql.raw(`create or replace function refuse_poison() returns trigger language plpgsql as $$ begin raise exception 'refused by the test'; end $$`));
    await h.db.execute(sql.raw(`create trigger refuse_poison before insert on capture_frame for each row when (new.file_name = 'poison.fits') execute function refuse_poison()`));
    const logged = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const failed = await intake(u, files);
      expect(failed.status).toBe(500);
      expect(failed.body.error.code).toBe('internal');
      expect(logged).toHaveBeenCalledWith('[api] unexpected error:', expect.anything());
    } finally {
      logged.mockRestore();
      await h.db.execute(sql.raw('drop trigger refuse_poison on capture_frame'));
      await h.db.execute(sql.raw('drop function refuse_poison()'));
    }
    expect(await frameCount(h.db, u.id)).toBe(0);
    // Well over express.json's 1 MB elsewhere: intake has its own limit.
    expect(JSON.stringify({ files }).length).toBeGreaterThan(1024 * 1024);
    const retry = await intakeOk(u, files);
    expect(retry.recorded.dark).toBe(521);
    expect(retry.duplicates).toBe(0);
  });

  it('undo removes the frames of one intake; another user cannot', async () => {
    const u = await imager();
    const first = await intakeOk(u, darks('Dark_60s', '2026-11-01T20:00:00', 3, 60));
    const second = await intakeOk(u, darks('Dark_90s', '2026-11-01T21:00:00', 2, 90));
    expect((await b.agent.delete(`/api/calibration/intakes/${first.intakeId}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await u.agent.delete('/api/calibration/intakes/not-an-id').set('Origin', ORIGIN)).status).toBe(404);
    const undo = await u.agent.delete(`/api/calibration/intakes/${first.intakeId}`).set('Origin', ORIGIN);
    expect(undo.status).toBe(200);
    expect(undo.body.deleted).toBe(3);
    expect(await frameCount(h.db, u.id)).toBe(2);
    expect((await u.agent.delete(`/api/calibration/intakes/${first.intakeId}`).set('Origin', ORIGIN)).status).toBe(404);
    expect(second.recorded.dark).toBe(2);
  });

  it("privacy: another user sees none of the frames, library or flats", async () => {
    expect((await b.agent.get('/api/calibration/frames')).body.frames).toEqual([]);
    expect((await b.agent.get('/api/calibration/dark-library')).body.sets).toEqual([]);
    expect((await b.agent.get('/api/calibration/flats')).body).toEqual({ nights: [], nightDate: null, combos: [] });
    // B importing A's very files records them as B's own (fingerprints are per owner).
    const mine = await intakeOk(b, darks('Dark_120s', '2026-10-13T04:30:00', 2));
    expect(mine.recorded.dark).toBe(2);
    await b.agent.delete(`/api/calibration/intakes/${mine.intakeId}`).set('Origin', ORIGIN);
  });
});

/** YYYY-MM-DD `months` calendar months before today (UTC), on the 15th. */
function monthsAgo(months: number): string {
  const now = new Date();
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - months, 15)).toISOString().slice(0, 10);
}

describe('dark library', () => {
  let u: TestUser;
  beforeAll(async () => {
    u = await imager();
  });

  it('fills from intake (grouped per settings and night) and from hand entry; validity changes staleness', async () => {
    const old = monthsAgo(8);
    const recent = monthsAgo(1);
    await intakeOk(u, [...darks('Dark_120s', `${old}T21:00:00`, 4), ...darks('Dark_300s', `${recent}T21:00:00`, 3, 300)]);
    const lib = darkLibrarySchema.parse((await u.agent.get('/api/calibration/dark-library')).body);
    expect(lib.validityMonths).toBe(6); // default: trade-defaults.md S22
    expect(lib.sets.map((s) => [s.source, s.exposureS, s.frames, s.takenOn, s.stale, s.temperatureC, s.gain, s.offset])).toEqual([
      ['intake', 120, 4, old, true, -10, 0, 50],
      ['intake', 300, 3, recent, false, -10, 0, 50],
    ]);

    const made = await u.agent.post('/api/calibration/dark-sets').set('Origin', ORIGIN).send({ exposureS: 60, gain: 0, offset: 50, temperatureC: -10, frames: 25, takenOn: monthsAgo(7), notes: 'Library shelf B' });
    expect(made.status).toBe(201);
    expect(made.body.set).toMatchObject({ source: 'hand', version: 1, exposureS: 60, binning: 1, readoutMode: null, frames: 25, stale: true, notes: 'Library shelf B' });

    const bad = await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 13 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.darkValidityMonths).toBeDefined();
    const set = await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 12 });
    expect(set.status).toBe(200);
    expect(set.body.settings).toEqual({ darkValidityMonths: 12 });
    expect((await u.agent.get('/api/calibration/settings')).body.settings).toEqual({ darkValidityMonths: 12 });
    const longer = darkLibrarySchema.parse((await u.agent.get('/api/calibration/dark-library')).body);
    expect(longer.validityMonths).toBe(12);
    expect(longer.sets.map((s) => s.stale)).toEqual([false, false, false]);
    expect((await b.agent.get('/api/calibration/settings')).body.settings).toEqual({ darkValidityMonths: 6 });
  });

  it('edits a hand set with its version (stale version → 409 with the stored copy); other users get 404', async () => {
    const lib = darkLibrarySchema.parse((await u.agent.get('/api/calibration/dark-library')).body);
    const hand = lib.sets.find((s) => s.source === 'hand')!;
    const body = { exposureS: 60, gain: 0, offset: 50, temperatureC: -15, frames: 40, takenOn: hand.takenOn };
    const saved = await u.agent.put(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN).send({ ...body, version: 1 });
    expect(saved.status).toBe(200);
    expect(saved.body.set).toMatchObject({ version: 2, temperatureC: -15, frames: 40 });
    const lost = await u.agent.put(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN).send({ ...body, frames: 10, version: 1 });
    expect(lost.status).toBe(409);
    expect(lost.body.error).toMatchObject({ code: 'version-conflict', current: { version: 2, frames: 40 } });
    const invalid = await u.agent.put(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN).send({ ...body, exposureS: 0, version: 2 });
    expect(invalid.status).toBe(400);
    expect(invalid.body.error.fields.exposureS).toBeDefined();
    expect((await b.agent.put(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN).send({ ...body, version: 2 })).status).toBe(404);
    expect((await b.agent.delete(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await u.agent.get('/api/calibration/dark-library')).body.sets.find((s: { id: string }) => s.id === hand.id)).toMatchObject({ version: 2, frames: 40 });
    expect((await u.agent.delete(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await u.agent.delete(`/api/calibration/dark-sets/${hand.id}`).set('Origin', ORIGIN)).status).toBe(404);
  });

  it('bad hand entry → 400 with fields, nothing stored', async () => {
    const res = await u.agent.post('/api/calibration/dark-sets').set('Origin', ORIGIN).send({ exposureS: -5, temperatureC: 99, frames: 0, takenOn: '2026-02-30', binning: 9 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['binning', 'exposureS', 'frames', 'takenOn', 'temperatureC']);
    expect((await u.agent.get('/api/calibration/dark-library')).body.sets.filter((s: { source: string }) => s.source === 'hand')).toEqual([]);
  });

  it('deletes the frames of one grouped set by its key; 404 for another user or an unknown key', async () => {
    const lib = darkLibrarySchema.parse((await u.agent.get('/api/calibration/dark-library')).body);
    const grouped = lib.sets.find((s) => s.source === 'intake' && s.exposureS === 120)!;
    const path = `/api/calibration/dark-library/intake/${encodeURIComponent(grouped.id.replace(/^intake:/, ''))}`;
    expect((await b.agent.delete(path).set('Origin', ORIGIN)).status).toBe(404);
    expect((await u.agent.delete('/api/calibration/dark-library/intake/nothing-here').set('Origin', ORIGIN)).status).toBe(404);
    const res = await u.agent.delete(path).set('Origin', ORIGIN);
    expect(res.status).toBe(200);
    expect(res.body.deleted).toBe(4);
    const after = darkLibrarySchema.parse((await u.agent.get('/api/calibration/dark-library')).body);
    expect(after.sets.map((s) => s.exposureS)).toEqual([300]);
  });
});

describe('darks in the dry run, and a darks recipe', () => {
  let u: TestUser;
  let recipeId: string;
  let rigId: string;
  const dryRun = async (): Promise<DryRunResult> => {
    const res = await u.agent.post(`/api/recipes/${recipeId}/dry-runs`).set('Origin', ORIGIN).send({ date: '2026-10-12' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return dryRunResultSchema.parse(res.body.dryRun.result);
  };
  const codes = (r: DryRunResult) => r.findings.map((f) => f.code).filter((c) => c.startsWith('darks-'));

  beforeAll(async () => {
    u = await imager();
    rigId = (await u.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name: 'Refractor and cooled camera' })).body.rig.id;
    const targetId = await makeTarget(u, { designation: 'M31', name: 'Andromeda Galaxy', raDeg: M31_WCS.raDeg, decDeg: M31_WCS.decDeg });
    const made = await u.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'M31 in L', rigId, start: { kind: 'tree', tree: m31Night(targetId) } });
    expect(made.status).toBe(201);
    recipeId = made.body.recipe.id;
  });

  it('no darks at the expose settings → darks-missing, and darksNeeded not covered', async () => {
    const r = await dryRun();
    expect(codes(r)).toEqual(['darks-missing']);
    // 120 s at gain 0 / offset 50 (the rig's first presets), bin 1, at the cool step's −10 °C.
    expect(r.darksNeeded).toMatchObject([{ exposureS: 120, gain: 0, offset: 50, binning: 1, temperatureC: -10, covered: false, fresh: false }]);
  });

  it('after intake of matching darks the same dry run has none; an unsaved tree sees the library too', async () => {
    const taken = await intakeOk(u, darks('Dark_120s', '2026-09-20T03:00:00', 10));
    const r = await dryRun();
    expect(codes(r)).toEqual([]);
    expect(r.darksNeeded[0]).toMatchObject({ covered: true, fresh: true });
    const recipe = (await u.agent.get(`/api/recipes/${recipeId}`)).body.recipe;
    const unsaved = await u.agent.post('/api/dry-runs').set('Origin', ORIGIN).send({ tree: recipe.tree, rigId, date: '2026-10-12' });
    expect(unsaved.status).toBe(200);
    expect(unsaved.body.result.findings.filter((f: { code: string }) => f.code.startsWith('darks-'))).toEqual([]);
    await u.agent.delete(`/api/calibration/intakes/${taken.intakeId}`).set('Origin', ORIGIN);
    expect(codes(await dryRun())).toEqual(['darks-missing']);
  });

  it('darks 8 months before the night → darks-stale (6 months by default, S22); 12 months makes them fresh', async () => {
    await intakeOk(u, darks('Old_Dark_120s', '2026-02-10T21:00:00', 10));
    const r = await dryRun();
    expect(codes(r)).toEqual(['darks-stale']);
    expect(r.darksNeeded[0]).toMatchObject({ covered: true, fresh: false });
    await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 12 });
    expect(codes(await dryRun())).toEqual([]);
    await u.agent.put('/api/calibration/settings').set('Origin', ORIGIN).send({ darkValidityMonths: 6 });
  });

  it('a hand-entered set covers the lights as well', async () => {
    const made = await u.agent.post('/api/calibration/dark-sets').set('Origin', ORIGIN).send({ exposureS: 120, gain: 0, offset: 50, temperatureC: -10, frames: 30, takenOn: '2026-10-01' });
    expect(made.status).toBe(201);
    expect(codes(await dryRun())).toEqual([]);
    await u.agent.delete(`/api/calibration/dark-sets/${made.body.set.id}`).set('Origin', ORIGIN);
  });

  it('darks-recipe: a parseable recipe whose darks steps cover every requested set', async () => {
    const wanted = [
      { exposureS: 120, gain: 0, offset: 50, binning: 1, temperatureC: -10 },
      { exposureS: 300, gain: 100, offset: 50, binning: 1, temperatureC: -10 },
      { exposureS: 60, gain: 0, offset: 50, binning: 2, temperatureC: -20 },
    ];
    const before = await recipeCount(h.db, u.id);
    const res = await u.agent.post('/api/calibration/darks-recipe').set('Origin', ORIGIN).send({ darks: wanted, rigId });
    expect(res.status).toBe(201);
    const recipe = (await u.agent.get(`/api/recipes/${res.body.recipeId}`)).body.recipe;
    expect(recipe).toMatchObject({ name: 'Darks for a cloudy night', rigId, version: 1 });
    const tree = recipeTreeSchema.parse(recipe.tree);
    const steps = tree.children.filter((n): n is Extract<RecipeNode, { kind: 'darks' }> => n.kind === 'darks');
    for (const d of wanted) {
      const covering = steps.filter((s) => s.exposuresS.includes(d.exposureS) && s.temperatureC === d.temperatureC && s.gain === d.gain && s.offset === d.offset && s.binning === d.binning);
      expect(covering, JSON.stringify(d)).toHaveLength(1);
      expect(covering[0]!.count).toBe(30); // trade-defaults.md "frames per set"
    }
    expect((await u.agent.get(`/api/recipes/${res.body.recipeId}/revisions`)).body.revisions).toHaveLength(1);
    const named = await u.agent.post('/api/calibration/darks-recipe').set('Origin', ORIGIN).send({ darks: wanted.slice(0, 1), count: 50, name: 'Rainy Tuesday darks' });
    expect(named.status).toBe(201);
    expect((await u.agent.get(`/api/recipes/${named.body.recipeId}`)).body.recipe.name).toBe('Rainy Tuesday darks');
    expect(await recipeCount(h.db, u.id)).toBe(before + 2);
  });

  it('darks-recipe: bad input and a rig that is not the caller’s → 400, nothing stored', async () => {
    const before = await recipeCount(h.db, b.id);
    const cases: [object, string][] = [
      [{ darks: [] }, 'darks'],
      [{ darks: [{ exposureS: 0, gain: 0, offset: 0, binning: 1, temperatureC: -10 }] }, 'darks.0.exposureS'],
      [{ darks: [{ exposureS: 60, gain: 0, offset: 0, binning: 1, temperatureC: -10 }], count: 0 }, 'count'],
      [{ darks: [{ exposureS: 60, gain: 0, offset: 0, binning: 1, temperatureC: -10 }], rigId }, 'rigId'],
    ];
    for (const [body, field] of cases) {
      const res = await b.agent.post('/api/calibration/darks-recipe').set('Origin', ORIGIN).send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields[field], JSON.stringify(res.body.error.fields)).toBeDefined();
    }
    expect(await recipeCount(h.db, b.id)).toBe(before);
  });
});

describe('flats from the lights of a night', () => {
  let u: TestUser;
  beforeAll(async () => {
    u = await imager();
    const at = { wcs: M31_WCS, object: 'M31', exposureS: 120 };
    await intakeOk(u, [
      light('L1.fits', { ...at, dateObs: '2026-10-12T20:00:00', filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
      light('L2.fits', { ...at, dateObs: '2026-10-12T20:03:00', filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
      light('R1.fits', { ...at, dateObs: '2026-10-12T21:00:00', filter: 'R', rotatorAngleDeg: 12.5, focuserPositionSteps: 15230 }),
      light('Ha1.fits', { ...at, dateObs: '2026-10-14T21:00:00', filter: 'Ha', rotatorAngleDeg: 12.5, focuserPositionSteps: 15180, exposureS: 300 }),
      // Panel flats the next morning: L at the lights' positions; R at another focus (does not serve).
      ...[0, 1, 2].map((i) => flat(`FL${i}.fits`, { dateObs: dateObs('2026-10-13T07:00:00', i), filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 })),
      flat('FR0.fits', { dateObs: '2026-10-13T07:10:00', filter: 'R', rotatorAngleDeg: 12.5, focuserPositionSteps: 15260 }),
    ]);
  });

  it('lists the nights with lights (newest first, the latest by default) and each combination with its flats', async () => {
    const latest = flatsPlanSchema.parse((await u.agent.get('/api/calibration/flats')).body);
    expect(latest.nights).toEqual(['2026-10-14', '2026-10-12']);
    expect(latest.nightDate).toBe('2026-10-14');
    expect(latest.combos).toEqual([{ filter: 'Ha', rotatorAngleDeg: 12.5, focuserPositionSteps: 15180, lightFrames: 1, flatFrames: 0, biasOnRecord: false }]);
    const night = flatsPlanSchema.parse((await u.agent.get('/api/calibration/flats?night=2026-10-12')).body);
    expect(night.combos).toEqual([
      { filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200, lightFrames: 2, flatFrames: 3, biasOnRecord: false },
      { filter: 'R', rotatorAngleDeg: 12.5, focuserPositionSteps: 15230, lightFrames: 1, flatFrames: 0, biasOnRecord: false },
    ]);
    const bad = await u.agent.get('/api/calibration/flats?night=12.10.2026');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.night).toBeDefined();
  });

  it('flats-recipe: one flats step per combination returning rotator and focuser to the recorded positions', async () => {
    const res = await u.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send({ nightDate: '2026-10-12', source: 'panel' });
    expect(res.status).toBe(201);
    const recipe = (await u.agent.get(`/api/recipes/${res.body.recipeId}`)).body.recipe;
    expect(recipe.name).toBe('Flats for the night of 2026-10-12');
    const flats = recipeTreeSchema.parse(recipe.tree).children.filter((n) => n.kind === 'flats');
    expect(flats.map((s) => s.kind === 'flats' && [s.filters, s.source, s.count, s.matchFramingOf])).toEqual([
      [['L'], 'panel', 25, { kind: 'positions', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }],
      [['R'], 'panel', 25, { kind: 'positions', rotatorAngleDeg: 12.5, focuserPositionSteps: 15230 }],
    ]);
  });

  it('flats-recipe: 400 for a night without lights or a bad body, nothing stored', async () => {
    const before = await recipeCount(h.db, u.id);
    const none = await u.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send({ nightDate: '2026-10-20', source: 'sky' });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.nightDate).toBeDefined();
    const bad = await u.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send({ nightDate: '2026-02-30', source: 'lamp', count: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['count', 'nightDate', 'source']);
    // Another user's night: they have no lights there.
    expect((await b.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send({ nightDate: '2026-10-12', source: 'panel' })).status).toBe(400);
    expect(await recipeCount(h.db, u.id)).toBe(before);
  });
});
