import { expect, test, type Page } from '@playwright/test';
import { expectSignedIn, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * The open YAML plan in the browser: one user's recipe exported through the API, imported by a
 * second user through the import screen (paste → preview → confirm → the new recipe), and a
 * broken plan whose error is shown at its line with that line of the text highlighted.
 */

type Json = Record<string, unknown>;

/** A same-origin API call from the signed-in page (cookie session; the browser adds Origin). */
async function call(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; json: Json; text: string }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, { method, headers: body === undefined ? {} : { 'Content-Type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      const text = await res.text();
      let json = {};
      try {
        json = JSON.parse(text);
      } catch {
        /* YAML or empty */
      }
      return { status: res.status, json, text };
    },
    { method, path, body },
  );
}

/** Signs up a user who owns a site, an M31 target and a recipe on it; returns the plan as exported. */
async function exportedPlan(page: Page): Promise<string> {
  await signUpThroughUi(page, 'Ines Export', uniqueEmail('plan-a'));
  await expectSignedIn(page);
  expect((await call(page, 'POST', '/api/sites', { name: 'Larch Meadow', latitudeDeg: 46.93, longitudeDeg: 7.62, elevationM: 872, timeZone: 'Europe/Zurich' })).status).toBe(201);
  // M31, published J2000 position (e.g. SIMBAD).
  const t = await call(page, 'POST', '/api/targets', { designation: 'M31', name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.6847, decDeg: 41.2689, majorArcmin: 178 });
  const made = await call(page, 'POST', '/api/recipes', { name: 'Andromeda shared', start: { kind: 'starter', targetIds: [(t.json.target as Json).id] } });
  expect(made.status).toBe(201);
  const plan = await call(page, 'GET', `/api/recipes/${(made.json.recipe as Json).id}/plan?date=2026-10-10&estimate=1`);
  expect(plan.status).toBe(200);
  expect(plan.text).toContain('format: nightloom.plan/1');
  return plan.text;
}

test('a plan exported by one user is imported by another: paste, preview, confirm, open', async ({ page, browser }, info) => {
  const text = await exportedPlan(page);

  const context = await browser.newContext({ baseURL: info.project.use.baseURL, viewport: info.project.use.viewport });
  const second = await context.newPage();
  await signUpThroughUi(second, 'Tomas Import', uniqueEmail('plan-b'));
  await expectSignedIn(second);
  await second.goto('/recipes/import');
  await second.getByTestId('plan-import-text').fill(text);
  await second.getByTestId('plan-import-preview').click();

  const summary = second.getByTestId('plan-import-summary');
  await expect(summary).toContainText('Andromeda shared · 2026-10-10');
  await expect(summary).toContainText('night of 2026-10-10');
  await expect(second.getByTestId('plan-import-adds-targets')).toHaveText('Targets for your list: M31');
  await expect(second.getByTestId('plan-import-create-site')).toHaveAttribute('aria-checked', 'true');
  await expect(second.getByTestId('plan-import-create-rig')).toHaveAttribute('aria-checked', 'true');
  await snap(second, info, 'plan-01-preview');
  await second.getByTestId('plan-import-confirm').click();

  await expect(second).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  const id = new URL(second.url()).pathname.split('/').pop()!;
  const stored = await call(second, 'GET', `/api/recipes/${id}`);
  expect(stored.json.recipe).toMatchObject({ name: 'Andromeda shared' });
  expect((stored.json.recipe as Json).siteId).not.toBeNull();
  const sites = await call(second, 'GET', '/api/sites');
  expect((sites.json.sites as Json[]).map((s) => s.name)).toEqual(['Larch Meadow']);
  await context.close();
});

test('a broken plan shows its error at the right line, with the line highlighted', async ({ page }, info) => {
  const text = await exportedPlan(page);
  const broken = text.replace('exposureS: 180', 'exposureS: -180');
  const line = broken.slice(0, broken.indexOf('exposureS: -180')).split('\n').length;

  await page.goto('/recipes/import');
  await page.getByTestId('plan-import-text').fill(broken);
  await page.getByTestId('plan-import-preview').click();
  const errors = page.getByTestId('plan-import-errors');
  await expect(errors).toBeVisible();
  await expect(errors).toContainText(`Line ${line}, column`);
  await expect(errors).toContainText(/recipe\.children\[\d+\](\.children\[\d+\])+\.exposureS/);
  await expect(errors).toContainText('Exposure must be between 0.001 and 3600 s');
  const highlight = page.getByTestId('plan-import-highlight').first();
  await expect(highlight).toContainText(String(line));
  await expect(highlight).toContainText('exposureS: -180');
  await expect(page.getByTestId('plan-import-confirm')).toHaveCount(0);
  await snap(page, info, 'plan-02-error');

  // A file picked instead of pasted is read and checked at once.
  await page.getByTestId('plan-import-file-input').setInputFiles({ name: 'shared.yaml', mimeType: 'text/yaml', buffer: Buffer.from(text) });
  await expect(page.getByTestId('plan-import-summary')).toContainText('Andromeda shared');
  await expect(page.getByTestId('plan-import-errors')).toHaveCount(0);
});

test('the composer exports its recipe as a plan file', async ({ page }) => {
  await signUpThroughUi(page, 'Ines Download', uniqueEmail('plan-dl'));
  await expectSignedIn(page);
  await call(page, 'POST', '/api/sites', { name: 'Larch Meadow', latitudeDeg: 46.93, longitudeDeg: 7.62, elevationM: 872, timeZone: 'Europe/Zurich' });
  const made = await call(page, 'POST', '/api/recipes', { name: 'Download me', start: { kind: 'starter', targetIds: [] } });
  await page.goto(`/recipes/${(made.json.recipe as Json).id}`);
  await page.getByTestId('plan-export').click();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('plan-export-download').click()]);
  expect(download.suggestedFilename()).toMatch(/\.ya?ml$/);
  const fs = await import('node:fs/promises');
  const text = await fs.readFile((await download.path())!, 'utf8');
  expect(text.startsWith('#') || text.startsWith('format:')).toBe(true);
  expect(text).toContain('format: nightloom.plan/1');
  expect(text).toContain('name: Download me');
});
