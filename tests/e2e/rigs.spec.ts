import { expect, test } from '@playwright/test';
import { expectSignedIn, openSection, signUpThroughUi, snap, uniqueEmail } from './support';

// checks.md "Definitions" (computed): 3.76 µm at 530 mm → 1.4633″/px; 6248 × 4176 px → 2.5392° × 1.6973°.
// trade-defaults.md "download" (S7): 2 B × 26.09 MP ÷ 250 MB/s + 0.3 s = 0.509 s on USB 3.
const BAD_HORIZON = 'azDeg,altDeg\n0,10\n90,abc\n180,20\n';
const GOOD_HORIZON = '# garden skyline\nazDeg,altDeg\n0,12\n45,18.5\n90,26\n135,15\n180,6\n225,9\n270,33\n315,21\n';
const csv = (name: string, text: string) => ({ name, mimeType: 'text/csv', buffer: Buffer.from(text) });

test('a rig: field error, live derived values from checks.md, a new filter slot, kept after a reload', async ({ page }, info) => {
  await signUpThroughUi(page, 'Ines Varga', uniqueEmail('rigs'));
  await expectSignedIn(page);
  await openSection(page, 'setup');
  await expect(page.getByTestId('rigs-empty')).toBeVisible();
  await page.getByTestId('rigs-add').click();

  await page.getByLabel('Rig name', { exact: true }).fill('Ridge refractor');
  const focal = page.getByLabel('Focal length (mm)', { exact: true });
  await focal.fill('5');
  await page.getByTestId('rig-form-submit').click();
  // Below the schema's hard limit: the error shows under the field and nothing is saved.
  await expect(page.getByText('Focal length must be between 10 and 20000 mm', { exact: true })).toBeVisible();
  await expect(focal).toHaveAttribute('aria-invalid', 'true');
  await expect(page).toHaveURL(/\/rigs\/new$/);
  await snap(page, info, 'rigs-01-focal-error');

  await focal.fill('530');
  await page.getByLabel('Pixel size (µm)', { exact: true }).fill('3.76');
  await page.getByLabel('Sensor width (px)', { exact: true }).fill('6248');
  await page.getByLabel('Sensor height (px)', { exact: true }).fill('4176');
  await expect(page.getByText('Focal length must be between 10 and 20000 mm', { exact: true })).toHaveCount(0);
  await expect(page.getByTestId('rig-derived-pixel-scale')).toHaveText('1.46″/px');
  await expect(page.getByTestId('rig-derived-fov')).toHaveText('2.54° × 1.70°');
  await expect(page.getByTestId('rig-derived-download')).toHaveText('0.51 s');
  // Recomputed while typing: a 0.8× reducer gives 424 mm and 1.83″/px (206.265 × 3.76 ÷ 424).
  await page.getByLabel('Reducer or barlow factor', { exact: true }).fill('0.8');
  await expect(page.getByTestId('rig-derived-pixel-scale')).toHaveText('1.83″/px');
  await page.getByLabel('Reducer or barlow factor', { exact: true }).fill('1');
  await expect(page.getByTestId('rig-derived-pixel-scale')).toHaveText('1.46″/px');

  await page.getByTestId('rig-filter-add').click();
  await page.getByTestId('rig-filter-7-name').fill('Dual band');
  await page.getByTestId('rig-filter-7-band').selectOption('Ha');
  await page.getByTestId('rig-filter-7-offset').fill('-40');
  await snap(page, info, 'rigs-02-filter-added');
  await page.getByTestId('rig-form-submit').click();

  await expect(page).toHaveURL(/\/setup$/);
  const item = page.locator('[data-testid^="rig-item-"]').filter({ hasText: 'Ridge refractor' });
  await expect(item).toContainText('1.46″/px');
  await expect(item).toContainText('8 filters');
  await item.click();
  await expect(page).toHaveURL(/\/rigs\/[0-9a-f-]{36}$/);
  await page.reload();
  await expect(page.getByTestId('rig-filter-7-name')).toHaveValue('Dual band');
  await expect(page.getByTestId('rig-filter-7-band')).toHaveValue('Ha');
  await expect(page.getByTestId('rig-filter-7-offset')).toHaveValue('-40');
  await expect(page.getByLabel('Focal length (mm)', { exact: true })).toHaveValue('530');
  await expect(page.getByTestId('rig-derived-pixel-scale')).toHaveText('1.46″/px');
  await snap(page, info, 'rigs-03-reloaded');
});

test('a site: a horizon CSV with a bad row is refused by line, a good one is kept and drawn', async ({ page }, info) => {
  await signUpThroughUi(page, 'Ines Varga', uniqueEmail('horizon'));
  await expectSignedIn(page);
  await openSection(page, 'setup');
  await page.getByTestId('sites-add').click();
  await page.getByLabel('Name', { exact: true }).fill('Orchard Slope');
  await page.getByLabel('Latitude (°)').fill('46.93');
  await page.getByLabel('Longitude (°)').fill('7.62');
  await page.getByLabel('Elevation (m)').fill('870');
  await page.getByLabel('Time zone').fill('Europe/Zurich');
  await expect(page.getByTestId('site-minAltitudeDeg-input')).toHaveValue('30');

  const fileInput = page.getByTestId('site-horizon-csv-input');
  await fileInput.setInputFiles(csv('bad-horizon.csv', BAD_HORIZON));
  await expect(page.getByTestId('site-horizon-errors')).toContainText('Line 3: Altitude "abc" is not a number');
  await expect(page.getByTestId('site-horizon-0-az')).toHaveCount(0);
  await snap(page, info, 'horizon-01-bad-csv');

  await fileInput.setInputFiles(csv('good-horizon.csv', GOOD_HORIZON));
  await expect(page.getByTestId('site-horizon-errors')).toHaveCount(0);
  await expect(page.getByTestId('site-horizon-7-az')).toHaveValue('315');
  await page.getByTestId('site-minAltitudeDeg-input').fill('25');
  await page.getByTestId('site-form-submit').click();

  await expect(page).toHaveURL(/\/setup$/);
  const item = page.locator('[data-testid^="site-item-"]').filter({ hasText: 'Orchard Slope' });
  await expect(item).toContainText('horizon of 8 points');
  await item.click();
  const preview = page.getByTestId('site-horizon-preview');
  await expect(preview).toBeVisible();
  await expect(preview).toHaveAttribute('aria-label', /8 points, highest 33° at azimuth 270°; minimum altitude 25°/);
  await expect(page.getByTestId('site-horizon-1-alt')).toHaveValue('18.5');
  await preview.scrollIntoViewIfNeeded();
  await snap(page, info, 'horizon-02-silhouette');

  // Editing another field keeps the horizon (the form carries every field of the site).
  await page.getByLabel('Dusk temperature (°C)').fill('12');
  await page.getByTestId('site-form-submit').click();
  await expect(page).toHaveURL(/\/setup$/);
  await expect(item).toContainText('horizon of 8 points');
});
