import fs from 'node:fs';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { buildFits, imageCards, type TestCard } from '../helpers/fits';
import { expectSignedIn, openSection, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * Targets against the real server: a catalogue import of OpenNGC (CC-BY-SA-4.0, read from the
 * shared data folder at run time, never copied into the repository), search, the target page
 * with its altitude chart, framings typed by hand and taken from a FITS header.
 */

const OPENNGC_DIR = process.env.OPENNGC_DIR ?? path.resolve(process.cwd(), '..', 'shared', 'data', 'openngc');
const NGC_CSV = path.join(OPENNGC_DIR, 'NGC.csv');

// NGC 7640, a galaxy in Andromeda: in OpenNGC but not in the built-in list (shared/targets/builtin/*),
// so only the import can make search find it. Position from OpenNGC's NGC.csv: 23:22:06.58 +40:50:43.5.
const IMPORTED_ONLY = 'NGC 7640';
const SLUG = 'NGC-7640';

// checks.md "FITS", worked check (computed, agrees with WCSLIB to 9 decimals):
// CD = [[−3.520182981e-4, −2.032378592e-4], [−2.032378592e-4, 3.520182981e-4]] → position angle 330°.
const WORKED_CD_CARDS: TestCard[] = [
  { key: 'CD1_1', raw: '-3.520182981D-04'.padStart(20) },
  { key: 'CD1_2', raw: '-2.032378592D-04'.padStart(20) },
  { key: 'CD2_1', raw: '-2.032378592D-04'.padStart(20) },
  { key: 'CD2_2', raw: '3.520182981D-04'.padStart(20) },
];

function solvedLight(): Buffer {
  const cards = imageCards(6248, 4176, [
    { key: 'OBJECT', value: IMPORTED_ONLY },
    { key: 'FILTER', value: 'Ha' },
    { key: 'EXPTIME', value: 300 },
    { key: 'CTYPE1', value: 'RA---TAN' },
    { key: 'CTYPE2', value: 'DEC--TAN' },
    { key: 'CRVAL1', value: 350.52742 },
    { key: 'CRVAL2', value: 40.84542 },
    { key: 'CRPIX1', value: 3124.5 },
    { key: 'CRPIX2', value: 2088.5 },
    ...WORKED_CD_CARDS,
  ]);
  // A few data bytes after the header: the page must read only the header blocks.
  return Buffer.from(buildFits(cards, { dataBytes: 8000 }));
}

/** A site through the API from the signed-in page (same origin, the session cookie): visibility needs one. */
async function addDefaultSite(page: Page) {
  const status = await page.evaluate(async () => {
    const body = { name: 'Larch Ridge', latitudeDeg: 46.9, longitudeDeg: 7.6, elevationM: 900, timeZone: 'Europe/Zurich', isDefault: true, minAltitudeDeg: 20 };
    const res = await fetch('/api/sites', { method: 'POST', credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
    return res.status;
  });
  expect(status).toBe(201);
}

async function importOpenNgc(page: Page) {
  await openSection(page, 'targets');
  await page.getByTestId('targets-import').click();
  await page.getByTestId('catalogue-file-input').setInputFiles(NGC_CSV);
  const count = page.getByTestId('catalogue-preview-count');
  await expect(count).toBeVisible({ timeout: 30_000 });
  const objects = Number((await count.innerText()).replace(/[^\d]/g, ''));
  expect(objects).toBeGreaterThan(12_000);
  await page.getByTestId('catalogue-name-input').fill('OpenNGC');
  await page.getByTestId('catalogue-import-submit').click();
  // Rows the file cannot give (no position) are listed; importing them asks once more.
  if (await page.getByTestId('catalogue-errors').isVisible()) await page.getByTestId('catalogue-import-confirm').click();
  await expect(page.getByTestId('catalogue-progress')).toBeVisible();
  await expect(page.getByTestId('catalogue-done')).toContainText(/Imported [\d,]+ objects into “OpenNGC”/, { timeout: 60_000 });
}

test.describe('targets', () => {
  test.skip(!fs.existsSync(NGC_CSV), `OpenNGC not found at ${NGC_CSV} (set OPENNGC_DIR)`);
  test.setTimeout(180_000);

  test('import OpenNGC, find an imported object, add it, chart it and frame it', async ({ page }, info) => {
    await signUpThroughUi(page, 'Ilse Varnow', uniqueEmail('targets'));
    await expectSignedIn(page);
    await addDefaultSite(page);

    await importOpenNgc(page);
    await snap(page, info, 'targets-01-import-done');

    await page.getByTestId('catalogue-done-search').click();
    await page.getByTestId('target-search-input').fill(IMPORTED_ONLY);
    const result = page.getByTestId(`search-result-${SLUG}`).first();
    await expect(result).toContainText('OpenNGC');
    await snap(page, info, 'targets-02-search');
    await page.getByTestId(`add-target-${SLUG}`).first().click();
    await page.getByTestId(`open-target-${SLUG}`).first().click();

    await expect(page.getByRole('heading', { name: IMPORTED_ONLY })).toBeVisible();
    await expect(page.getByTestId('target-ra')).toHaveText('23:22:06.6');
    await expect(page.getByTestId('target-visibility-chart')).toBeVisible();
    await expect(page.getByTestId('visibility-night')).toContainText('Larch Ridge');
    await snap(page, info, 'targets-03-detail');

    // A framing with an impossible RA: the field says why and nothing is saved.
    await page.getByTestId('framing-new').click();
    await page.getByTestId('framing-ra-input').fill('25:00:00');
    await page.getByTestId('framing-form-submit').click();
    await expect(page.getByText('Right ascension hours must be below 24')).toBeVisible();
    await expect(page.getByTestId('framing-item')).toHaveCount(0);

    await page.getByTestId('framing-ra-input').fill('23:22:06.6');
    await page.getByTestId('framing-name-input').fill('Galaxy centred');
    await page.getByTestId('framing-positionAngleDeg-input').fill('45');
    await page.getByTestId('framing-form-submit').click();
    await expect(page.getByTestId('framing-item')).toHaveCount(1);
    await expect(page.getByTestId('framing-item')).toContainText('Galaxy centred');
    await expect(page.getByTestId('framing-preview')).toBeVisible();
    await expect(page.getByTestId('framing-preview-panel')).toHaveCount(1);
    await snap(page, info, 'targets-04-framing');

    await page.getByTestId('target-notes-input').fill('Try 10 min Ha subs; low in the west by midnight.');
    await page.getByTestId('notes-save').click();
    await expect(page.getByTestId('notes-saved')).toBeVisible();

    await page.getByTestId('back-to-targets').click();
    if (await page.getByTestId('targets-tab-mine').isVisible()) await page.getByTestId('targets-tab-mine').click();
    await expect(page.getByTestId(`target-item-${SLUG}`)).toContainText('1 framing');
  });

  test('take a framing from a FITS header, and see why a broken file is refused', async ({ page }, info) => {
    await signUpThroughUi(page, 'Oren Balsk', uniqueEmail('fits'));
    await expectSignedIn(page);
    await addDefaultSite(page);
    await openSection(page, 'targets');
    if (await page.getByTestId('targets-tab-find').isVisible()) await page.getByTestId('targets-tab-find').click();
    // M31 is in the built-in list: no import needed for this part.
    await page.getByTestId('target-search-input').fill('M31');
    await page.getByTestId('add-target-M31').first().click();
    await page.getByTestId('open-target-M31').first().click();
    await expect(page.getByTestId('target-visibility-chart')).toBeVisible();

    await page.getByTestId('framing-new').click();
    await page.getByTestId('framing-fits-input').setInputFiles({ name: 'light_ha_300s.fits', mimeType: 'application/octet-stream', buffer: solvedLight() });
    await expect(page.getByTestId('framing-fits-summary')).toContainText('1.46″/px');
    await expect(page.getByTestId('framing-positionAngleDeg-input')).toHaveValue('330');
    await expect(page.getByTestId('framing-name-input')).toHaveValue(IMPORTED_ONLY);
    await snap(page, info, 'targets-05-fits');

    const broken = Buffer.from(buildFits(imageCards(16, 8, WORKED_CD_CARDS), { dropEnd: true }));
    await page.getByTestId('framing-fits-input').setInputFiles({ name: 'broken.fits', mimeType: 'application/octet-stream', buffer: broken });
    await expect(page.getByTestId('framing-fits-error')).toContainText('No END card');
    await snap(page, info, 'targets-06-fits-error');
  });
});
