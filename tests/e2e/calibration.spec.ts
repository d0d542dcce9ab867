import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { cameraFrame, type CameraFrameSpec } from '../helpers/fits';
import { expectSignedIn, openSection, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * Issue 8 "done means", in the browser against the real server: a folder of synthetic camera
 * frames (lights of M 31 with a plate solution in two filters over two nights, one night with a
 * meridian flip, darks, flats, a broken file and a text file) is picked; the headers are read
 * with progress and recorded in one request; the result lists the broken file with its reason.
 * The dark library, flats and history fill in; a set is added by hand, an edit loses to another
 * save (409) and an intake set is forgotten. The target's history shows the chart, the nights
 * and the flip question; "Continue this target" makes a recipe whose dry run finds the 300 s
 * darks missing, and the darks recipe opens in the composer with a darks step.
 * Lights of objects the user has no target for (M 42, Sh2-240) get rows of their own: one opens
 * its history by OBJECT and is added from the built-in list, the other is added at its recorded
 * centre from the row; both rows then become target rows with their integration.
 */

type Api<T> = { status: number; body: T };

async function api<T>(page: Page, method: string, url: string, body?: unknown): Promise<Api<T>> {
  return page.evaluate(
    async ({ method, url, body }) => {
      const res = await fetch(url, { method, credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      const text = await res.text();
      return { status: res.status, body: text ? JSON.parse(text) : null };
    },
    { method, url, body },
  );
}

// M 31's J2000 centre (SIMBAD: 00 42 44.33 +41 16 07.5), the centre of every synthetic light.
const M31 = { raDeg: 10.684708, decDeg: 41.26875 };
const DATA_BYTES = 100_000;

/** One light of M 31: 300 s, gain 100, offset 50, −10 °C, the rotator at 35° and the focuser near 15 200. */
function light(dateObs: string, filter: 'Ha' | 'OIII', pa: 125 | 305): CameraFrameSpec {
  return {
    type: 'Light Frame',
    dateObs,
    exposureS: 300,
    object: 'M 31',
    filter,
    gain: 100,
    offset: 50,
    binning: 1,
    setTempC: -10,
    sensorTempC: -10.1,
    focuserPositionSteps: filter === 'Ha' ? 15200 : 15180,
    rotatorAngleDeg: 35,
    // Past the meridian the mount flips and the camera turns with it: the same field at PA + 180°.
    pierSide: pa === 125 ? 'WEST' : 'EAST',
    wcs: { ...M31, positionAngleDeg: pa, scaleArcsecPerPx: 1.46 },
  };
}

const dark = (dateObs: string, exposureS: number): CameraFrameSpec => ({ type: 'Dark Frame', dateObs, exposureS, gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10 });

/**
 * A night's folder on disk: 10 lights (Ha and OIII, nights of 20 and 22 Nov 2026; two OIII
 * frames after a flip at PA 305°), three 120 s darks, two 60 s darks from January 2025 (stale
 * with any validity up to a year), two bias frames, three Ha flats, a truncated frame and a text file.
 */
function writeFolder(): { dir: string; extra: string; brokenName: string } {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'nightloom-frames-'));
  const dir = path.join(root, 'M31-november');
  fs.mkdirSync(path.join(dir, 'lights'), { recursive: true });
  fs.mkdirSync(path.join(dir, 'calibration'), { recursive: true });
  const write = (rel: string, spec: CameraFrameSpec, truncateTo?: number) => fs.writeFileSync(path.join(dir, rel), cameraFrame(spec, { dataBytes: DATA_BYTES, truncateTo }));
  // 20 Nov, 21:00–22:40 UTC (22:00–23:40 at the site): Ha west of the meridian, then OIII after the flip.
  ['21:00', '21:06', '21:12'].forEach((t, i) => write(`lights/M31_Ha_1120_${i + 1}.fits`, light(`2026-11-20T${t}:00`, 'Ha', 125)));
  ['22:30', '22:36'].forEach((t, i) => write(`lights/M31_OIII_1120_${i + 1}.fits`, light(`2026-11-20T${t}:00`, 'OIII', 305)));
  ['19:00', '19:06'].forEach((t, i) => write(`lights/M31_Ha_1122_${i + 1}.fit`, light(`2026-11-22T${t}:00`, 'Ha', 125)));
  ['19:20', '19:26', '19:32'].forEach((t, i) => write(`lights/M31_OIII_1122_${i + 1}.fts`, light(`2026-11-22T${t}:00`, 'OIII', 125)));
  [1, 2, 3].forEach((i) => write(`calibration/dark_120s_${i}.fits`, dark(`2026-11-23T10:0${i}:00`, 120)));
  [1, 2].forEach((i) => write(`calibration/dark_60s_${i}.fits`, dark(`2025-01-10T10:0${i}:00`, 60)));
  [1, 2].forEach((i) => write(`calibration/bias_${i}.fits`, { type: 'Bias Frame', dateObs: `2026-11-23T10:1${i}:00`, exposureS: 0.001, gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10 }));
  [1, 2, 3].forEach((i) =>
    write(`calibration/flat_Ha_${i}.fits`, { type: 'Flat Field', dateObs: `2026-11-21T06:1${i}:00`, exposureS: 2, filter: 'Ha', gain: 100, offset: 50, binning: 1, setTempC: -10, focuserPositionSteps: 15200, rotatorAngleDeg: 35 }),
  );
  const brokenName = 'M31_Ha_1120_cut.fits';
  write(`lights/${brokenName}`, light('2026-11-20T21:18:00', 'Ha', 125), 1000);
  fs.writeFileSync(path.join(dir, 'notes.txt'), 'Seeing 2", wind from the west.\n');
  // Outside the folder: one more light (a third night) for the undo check.
  const extra = path.join(root, 'M31_Ha_1125_1.fits');
  fs.writeFileSync(extra, cameraFrame(light('2026-11-25T19:00:00', 'Ha', 125), { dataBytes: DATA_BYTES }));
  return { dir, extra, brokenName };
}

/** Phones switch between the screen's parts; wide screens show them all. */
async function showPart(page: Page, part: 'frames' | 'darks' | 'flats' | 'history', isPhone: boolean) {
  if (isPhone) await page.getByTestId(`calibration-tab-${part}`).click();
}

test('frames from a folder fill the dark library, flats and history; continuing M 31 finds its darks missing', async ({ page }, info) => {
  test.setTimeout(150_000);
  const isPhone = info.project.name === 'phone';
  const { dir, extra, brokenName } = writeFolder();

  await signUpThroughUi(page, 'Noor Halvorsen', uniqueEmail('calibration'));
  await expectSignedIn(page);
  // Site (its zone names the nights), rig and target with a framing, through the API as the other specs do.
  const site = await api(page, 'POST', '/api/sites', { name: 'Beech Hill', latitudeDeg: 47, longitudeDeg: 8, elevationM: 700, timeZone: 'Europe/Zurich', isDefault: true });
  const rig = await api<{ rig: { id: string } }>(page, 'POST', '/api/rigs', { name: 'Field refractor' });
  const m31 = await api<{ target: { id: string } }>(page, 'POST', '/api/targets', { designation: 'M 31', name: 'Andromeda Galaxy', type: 'galaxy', ...M31, majorArcmin: 190 });
  expect([site.status, rig.status, m31.status]).toEqual([201, 201, 201]);
  const targetId = m31.body.target.id;
  const framing = await api(page, 'POST', `/api/targets/${targetId}/framings`, { name: 'Core and dust lanes', ...M31, positionAngleDeg: 125 });
  expect(framing.status).toBe(201);
  const club = await api<{ id: string }>(page, 'POST', '/api/auth/organization/create', { name: `Beech Hill Imagers ${targetId.slice(0, 6)}`, slug: `beech-hill-${targetId.slice(0, 8)}` });
  expect(club.status).toBe(200);

  // Pick the folder. The upload is held back a moment so its progress can be seen.
  await openSection(page, 'calibration');
  await expect(page.getByTestId('calibration-screen')).toBeVisible();
  await page.route('**/api/calibration/intake', async (route) => {
    await new Promise((r) => setTimeout(r, 1500));
    await route.continue();
  });
  await page.getByTestId('intake-folder-input').setInputFiles(dir);
  await expect(page.getByTestId('intake-progress')).toBeVisible();
  await expect(page.getByTestId('intake-progress-text')).toHaveText(/^(Reading headers \d+ \/ 21|Sending the headers(…|: .+ of .+)|Sent\. Recording the frames…)$/);
  await snap(page, info, 'calibration-01-progress');
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 10 lights, 5 darks, 3 flats and 2 bias frames');
  await expect(page.getByTestId('intake-recorded')).toContainText('1 other file in the folder skipped');
  const rejected = page.getByTestId('intake-rejected-item');
  await expect(rejected).toHaveCount(1);
  await expect(rejected).toContainText(brokenName);
  await expect(rejected).toContainText('Truncated file');
  await snap(page, info, 'calibration-02-frames');
  await page.unroute('**/api/calibration/intake');

  // Two files picked: one new light, one already on record. Then the import is undone.
  await page.getByTestId('intake-again').click();
  await page.getByTestId('intake-files-input').setInputFiles([extra, path.join(dir, 'lights', 'M31_Ha_1120_1.fits')]);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 1 light');
  await expect(page.getByTestId('intake-recorded')).toContainText('1 frame was already on record');
  await page.getByTestId('intake-undo').click();
  await expect(page.getByTestId('intake-undone')).toContainText('Import undone');

  // The dark library: the 120 s set and the stale 60 s set, both grouped from the frames.
  await showPart(page, 'darks', isPhone);
  const library = page.getByTestId('dark-library-list');
  await expect(library.getByRole('listitem')).toHaveCount(2);
  await expect(library).toContainText('120 s at −10 °C');
  await expect(page.getByTestId('dark-set-stale')).toHaveCount(1);
  // The two bias frames: one bias set under the dark sets.
  await expect(page.getByTestId('bias-library-list').getByRole('listitem')).toHaveCount(1);
  await expect(page.getByTestId('bias-set-text')).toHaveText('Bias · gain 100 · offset 50 · bin 1 · −10 °C · 2 frames · Sun 22 Nov 2026');
  // A set by hand: the form checks it with the shared schema.
  await page.getByTestId('dark-set-add-open').click();
  await page.getByTestId('dark-set-add-exposureS').fill('600');
  await page.getByTestId('dark-set-add-submit').click();
  await expect(page.getByText('Temperature must be a number')).toBeVisible();
  await page.getByTestId('dark-set-add-temperatureC').fill('-10');
  await page.getByTestId('dark-set-add-gain').fill('100');
  await page.getByTestId('dark-set-add-offset').fill('50');
  await page.getByTestId('dark-set-add-frames').fill('20');
  await page.getByTestId('dark-set-add-takenOn').fill('2026-11-01');
  await page.getByTestId('dark-set-add-submit').click();
  await expect(library.getByRole('listitem')).toHaveCount(3);
  const lib = await api<{ sets: { id: string; source: string; version: number; stale: boolean; exposureS: number }[] }>(page, 'GET', '/api/calibration/dark-library');
  const hand = lib.body.sets.find((s) => s.source === 'hand')!;
  const staleSet = lib.body.sets.find((s) => s.stale)!;
  await expect(page.getByTestId(`dark-set-${hand.id}`)).toContainText('By hand');
  // An edit that loses to another save: the clean message, and the stored set shown.
  await page.getByTestId(`dark-set-${hand.id}`).getByTestId('dark-set-edit-open').click();
  const elsewhere = await api(page, 'PUT', `/api/calibration/dark-sets/${hand.id}`, { exposureS: 600, gain: 100, offset: 50, temperatureC: -10, frames: 40, takenOn: '2026-11-01', version: hand.version });
  expect(elsewhere.status).toBe(200);
  await page.getByTestId('dark-set-edit-frames').fill('25');
  await page.getByTestId('dark-set-edit-submit').click();
  await expect(page.getByTestId('dark-set-conflict')).toContainText('changed elsewhere');
  await expect(page.getByTestId(`dark-set-${hand.id}`)).toContainText('40 frames');
  await page.getByTestId(`dark-set-${hand.id}`).scrollIntoViewIfNeeded();
  await snap(page, info, 'calibration-03-darks');
  // Forget the stale set grouped from frames.
  const staleRow = page.getByTestId(`dark-set-${staleSet.id}`);
  await staleRow.getByTestId('dark-set-delete').click();
  await staleRow.getByTestId('dark-set-delete-confirm').click();
  await expect(staleRow).toHaveCount(0);
  await expect(page.getByTestId('dark-set-stale')).toHaveCount(0);

  // Flats of the first night: Ha has its three flats, OIII none.
  await showPart(page, 'flats', isPhone);
  const flatsNight = page.getByTestId('flats-night');
  await expect(flatsNight).toHaveValue('2026-11-22');
  await flatsNight.selectOption('2026-11-20');
  const combos = page.getByTestId('flats-combo');
  await expect(combos).toHaveCount(2);
  await expect(combos.filter({ hasText: 'Ha' })).toContainText('3 flats on record');
  await expect(combos.filter({ hasText: 'OIII' })).toContainText('No flats on record');
  await expect(combos.first()).toContainText('rotator 35.0°');
  await expect(combos.getByTestId('flats-combo-bias').first()).toHaveText('bias on record');
  await page.getByTestId('flats-source-sky').click();
  await expect(page.getByTestId('flats-caution')).toContainText('twilight');
  await page.getByTestId('flats-section').scrollIntoViewIfNeeded();
  await snap(page, info, 'calibration-04-flats');

  // History: M 31 with both filters; its page has the chart, both nights and the flip question.
  await showPart(page, 'history', isPhone);
  const row = page.getByTestId(`history-row-${targetId}`);
  await expect(row).toContainText('M 31');
  await expect(row).toContainText('50 min');
  await row.scrollIntoViewIfNeeded();
  await snap(page, info, 'calibration-05-history');
  await row.click();
  await expect(page).toHaveURL(new RegExp(`/targets/${targetId}/history`));
  await expect(page.getByTestId('history-total')).toHaveText('50 min');
  await expect(page.getByTestId('history-filter-Ha')).toContainText('5 frames');
  await expect(page.getByTestId('history-chart')).toBeVisible();
  await expect(page.getByTestId('history-night-2026-11-20')).toContainText('0:25');
  await expect(page.getByTestId('history-night-2026-11-22')).toContainText('0:25');
  await expect(page.getByTestId('history-framing-match').first()).toContainText('Core and dust lanes');
  await expect(page.getByTestId('history-flip-question')).toHaveText(
    'Earlier frames were taken at 125.0° and at 305.0° — the camera turned with a meridian flip. Which one do you want to continue?',
  );
  await snap(page, info, 'history-01-target');
  await page.getByTestId('history-flip').scrollIntoViewIfNeeded();
  await page.getByRole('radio', { name: /^305\.0°/ }).click();
  await page.getByRole('radio', { name: /^125\.0°/ }).click();
  await snap(page, info, 'history-02-continue');

  // Share with the club (explicitly), and see it on the club page.
  await page.getByTestId(`history-share-${club.body.id}`).click();
  await expect(page.getByTestId(`history-share-${club.body.id}`)).toHaveAttribute('aria-checked', 'true');
  await expect.poll(async () => (await api<{ captures: { designation: string }[] }>(page, 'GET', `/api/clubs/${club.body.id}/captures`)).body.captures.map((c) => c.designation)).toEqual(['M 31']);

  // Continue this target at 125° → a new recipe in the composer.
  await page.getByTestId('history-continue-submit').click();
  await expect(page).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  const continuedId = page.url().split('/').pop()!;

  // Its dry run: the 300 s lights have no darks in the library.
  await page.goto(`/recipes/${continuedId}/dry-run`);
  const darks = page.getByTestId('dry-run-darks');
  await expect(darks).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('dry-run-dark-missing')).toContainText('300 s at −10 °C');
  await expect(page.getByTestId('dry-run-dark-missing')).toContainText('gain 100 · offset 50 · bin 1');
  await expect(page.getByTestId('dry-run-finding-darks-missing')).toBeVisible();
  await darks.scrollIntoViewIfNeeded();
  await snap(page, info, 'dry-run-darks');
  await page.getByTestId('dry-run-darks-recipe').click();
  await expect(page).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  expect(page.url().split('/').pop()).not.toBe(continuedId);
  await expect(page.locator('[data-testid^="step-row-"][aria-label^="Darks"]').first()).toBeVisible();
  await expect(page.locator('[data-testid^="step-row-"][aria-label^="Darks"]').first()).toHaveAttribute('aria-label', /300 s at −10 °C/);

  // The club page lists the shared capture.
  await page.goto(`/clubs/${club.body.id}`);
  await expect(page.getByTestId('club-capture')).toContainText('M 31');
  await expect(page.getByTestId('club-capture')).toContainText('Noor Halvorsen');
  fs.rmSync(path.dirname(dir), { recursive: true, force: true });
});

test('a flats recipe for a night returns the rotator and focuser to the lights’ positions', async ({ page }, info) => {
  const isPhone = info.project.name === 'phone';
  const { dir } = writeFolder();
  await signUpThroughUi(page, 'Ivo Maddern', uniqueEmail('flats'));
  await expectSignedIn(page);
  const site = await api(page, 'POST', '/api/sites', { name: 'Beech Hill', latitudeDeg: 47, longitudeDeg: 8, elevationM: 700, timeZone: 'Europe/Zurich', isDefault: true });
  expect(site.status).toBe(201);
  await openSection(page, 'calibration');
  await expect(page.getByTestId('calibration-screen')).toBeVisible();
  await page.getByTestId('intake-folder-input').setInputFiles(dir);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 10 lights');
  await showPart(page, 'flats', isPhone);
  await page.getByTestId('flats-night').selectOption('2026-11-20');
  await page.getByTestId('flats-source-panel').click();
  await page.getByTestId('flats-make-recipe').click();
  await expect(page).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  const flatsRow = page.locator('[data-testid^="step-row-"][aria-label^="Flats"]').first();
  await expect(flatsRow).toHaveAttribute('aria-label', /rotator 35°/);
  await flatsRow.click({ position: { x: 120, y: 20 } });
  const angle = page.getByTestId('node-editor-matchFramingOf.rotatorAngleDeg-input');
  await expect(angle).toHaveValue('35');
  await expect(page.getByTestId('node-editor-matchFramingOf.focuserPositionSteps-input')).not.toHaveValue('');
  await snap(page, info, 'composer-flats-positions');
  fs.rmSync(path.dirname(dir), { recursive: true, force: true });
});

// M 42's J2000 centre as the built-in list gives it (05:35:17.3 −05:23:28); Sh2-240 is in no built-in list.
const M42 = { raDeg: 83.8221, decDeg: -5.3911 };
const SH2_240 = { raDeg: 84.8, decDeg: 28.03 };

/** A 300 s light with a plate solution at `at`, named by OBJECT. */
function namedLight(object: string, at: { raDeg: number; decDeg: number }, dateObs: string, filter: 'Ha' | 'OIII'): CameraFrameSpec {
  return { type: 'Light Frame', dateObs, exposureS: 300, object, filter, gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10, wcs: { ...at, positionAngleDeg: 90, scaleArcsecPerPx: 1.46 } };
}

/** Four lights of M 42 over two nights (Ha on 20 Nov, OIII on 22 Nov 2026) and two of Sh2-240. */
function writeUnmatchedFolder(): string {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'nightloom-unmatched-'));
  const dir = path.join(root, 'winter-objects');
  fs.mkdirSync(dir);
  const write = (name: string, spec: CameraFrameSpec) => fs.writeFileSync(path.join(dir, name), cameraFrame(spec, { dataBytes: DATA_BYTES }));
  ['22:00', '22:06'].forEach((t, i) => write(`M42_Ha_${i + 1}.fits`, namedLight('M 42', M42, `2026-11-20T${t}:00`, 'Ha')));
  ['23:00', '23:06'].forEach((t, i) => write(`M42_OIII_${i + 1}.fits`, namedLight('M 42', M42, `2026-11-22T${t}:00`, 'OIII')));
  ['01:00', '01:06'].forEach((t, i) => write(`Sh2-240_Ha_${i + 1}.fits`, namedLight('Sh2-240', SH2_240, `2026-11-21T${t}:00`, 'Ha')));
  return dir;
}

test('lights of objects without a target: open their history, add them as targets, and their rows become target rows', async ({ page }, info) => {
  test.setTimeout(90_000);
  const isPhone = info.project.name === 'phone';
  const dir = writeUnmatchedFolder();
  await signUpThroughUi(page, 'Ilse Marrow', uniqueEmail('unmatched'));
  await expectSignedIn(page);
  const site = await api(page, 'POST', '/api/sites', { name: 'Beech Hill', latitudeDeg: 47, longitudeDeg: 8, elevationM: 700, timeZone: 'Europe/Zurich', isDefault: true });
  expect(site.status).toBe(201);

  await openSection(page, 'calibration');
  await expect(page.getByTestId('calibration-screen')).toBeVisible();
  await page.getByTestId('intake-folder-input').setInputFiles(dir);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 6 lights');

  // Two rows for frames no target matches, by OBJECT.
  await showPart(page, 'history', isPhone);
  const unmatched = page.getByTestId('history-row-unmatched');
  await expect(unmatched).toHaveCount(2);
  const m42Row = unmatched.filter({ hasText: 'M 42' });
  const sh2Row = unmatched.filter({ hasText: 'Sh2-240' });
  await expect(m42Row).toContainText('20 min');
  await expect(m42Row).toContainText('2 nights');
  await expect(sh2Row).toContainText('10 min');

  // Sh2-240 is in no catalogue: the row offers a target at the frames' recorded centre.
  await sh2Row.getByTestId('history-row-unmatched-add').click();
  await expect(sh2Row.getByTestId('history-object-add-offer')).toContainText('No catalogue object is named “Sh2-240”');
  await expect(sh2Row.getByTestId('history-object-add-offer')).toContainText('05:39:12.0  +28:01:48');
  await sh2Row.scrollIntoViewIfNeeded();
  await snap(page, info, 'calibration-06-unmatched');
  await expect(sh2Row.getByTestId('history-object-add-submit')).toHaveText('Add Sh2-240 as a target');
  await sh2Row.getByTestId('history-object-add-submit').click();
  await expect(unmatched).toHaveCount(1);
  const targets = await api<{ targets: { id: string; designation: string; raDeg: number; decDeg: number; type: string }[] }>(page, 'GET', '/api/targets');
  const sh2 = targets.body.targets.find((t) => t.designation === 'Sh2-240')!;
  expect(sh2).toMatchObject({ type: 'other' });
  expect(sh2.raDeg).toBeCloseTo(SH2_240.raDeg, 3);
  expect(sh2.decDeg).toBeCloseTo(SH2_240.decDeg, 3);
  await expect(page.getByTestId(`history-row-${sh2.id}`)).toContainText('10 min');

  // M 42's history by OBJECT: totals, chart, nights and framing; nothing to continue or share.
  await m42Row.getByTestId('history-row-unmatched-open').click();
  await expect(page).toHaveURL(/\/calibration\/objects\/M(%20| )42$/);
  await expect(page.getByTestId('object-history')).toBeVisible();
  await expect(page.getByRole('heading', { name: 'M 42', exact: true })).toBeVisible();
  await expect(page.getByTestId('history-total')).toHaveText('20 min');
  await expect(page.getByTestId('history-filter-Ha')).toContainText('2 frames');
  await expect(page.getByTestId('history-filter-OIII')).toContainText('2 frames');
  await expect(page.getByTestId('history-chart')).toBeVisible();
  await expect(page.getByTestId('history-night-2026-11-20')).toContainText('0:10');
  await expect(page.getByTestId('history-night-2026-11-22')).toContainText('0:10');
  await expect(page.getByTestId('history-framings').getByRole('listitem')).toHaveCount(1);
  await expect(page.getByTestId('history-continue')).toHaveCount(0);
  await expect(page.getByTestId('history-share')).toHaveCount(0);
  await expect(page.getByTestId('history-object-add-section')).toContainText('nothing to continue or share');
  // "M 42" finds the built-in M42.
  await expect(page.getByTestId('history-object-add-offer')).toContainText('From the built-in list: M42 · Orion Nebula at 05:35:17.3');
  await snap(page, info, 'history-03-object');
  await expect(page.getByTestId('history-object-add-submit')).toHaveText('Add M42 · Orion Nebula as a target');
  await page.getByTestId('history-object-add-submit').click();

  // The frames are now M42's: its own history, with continue and share, and a target row.
  await expect(page).toHaveURL(/\/targets\/[0-9a-f-]{36}\/history/);
  const m42Id = new URL(page.url()).pathname.split('/')[2]!;
  await expect(page.getByTestId('target-history')).toBeVisible();
  await expect(page.getByTestId('history-total')).toHaveText('20 min');
  await expect(page.getByTestId('history-continue')).toBeVisible();
  await expect(page.getByTestId('history-share')).toBeVisible();
  await snap(page, info, 'history-04-object-added');
  await page.getByTestId('history-back').click();
  await expect(page.getByTestId('calibration-screen')).toBeVisible();
  await expect(page.getByTestId(`history-row-${m42Id}`)).toContainText('M42 · Orion Nebula');
  await expect(page.getByTestId(`history-row-${m42Id}`)).toContainText('20 min');
  await expect(page.getByTestId('history-row-unmatched')).toHaveCount(0);
  await page.getByTestId('history-list').scrollIntoViewIfNeeded();
  await snap(page, info, 'calibration-07-added');
  fs.rmSync(path.dirname(dir), { recursive: true, force: true });
});
