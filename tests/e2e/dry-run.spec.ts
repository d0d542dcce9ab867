import { expect, test, type Page } from '@playwright/test';
import { expectSignedIn, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * The dry-run screen against the real server: a fresh user with a site at 47° N, a rig, M 31 and
 * a field at Dec −80° (it never rises there: a `never-rises` stop on purpose), and a starter
 * recipe for both. The screen runs the night by itself, shows the summary, the Gantt and the
 * findings; a finding opens its step in the composer; the recipe changes and the result turns
 * stale; a 30-night scan runs to the end and a 365-night scan is cancelled midway.
 */

type Node = { id: string; kind: string; targetId?: string | null; children?: Node[] };
type Recipe = { id: string; name: string; notes: string; rigId: string | null; siteId: string | null; version: number; tree: { children: Node[] } };

async function api<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, { method, credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      return { status: res.status, body: await res.json() };
    },
    { method, path, body },
  );
}

/** A fresh user (signed up in the UI) with a site, a rig, two targets and a starter recipe for them. */
async function userWithRecipe(page: Page): Promise<{ recipe: Recipe; southStageId: string }> {
  await signUpThroughUi(page, 'Dara Okafor', uniqueEmail('dry-run'));
  await expectSignedIn(page);
  const rig = await api<{ rig: { id: string } }>(page, 'POST', '/api/rigs', { name: 'Field refractor' });
  const site = await api(page, 'POST', '/api/sites', { name: 'Beech Hill', latitudeDeg: 47, longitudeDeg: 8, elevationM: 700, timeZone: 'Europe/Zurich', isDefault: true });
  const m31 = await api<{ target: { id: string } }>(page, 'POST', '/api/targets', { designation: 'M 31', name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.68, decDeg: 41.27, majorArcmin: 190 });
  // Dec −80° culminates 90 − 47 − 80 = −37° at 47° N: it never rises there.
  const south = await api<{ target: { id: string } }>(page, 'POST', '/api/targets', { designation: 'South 80', name: 'Far southern field', type: 'galaxy', raDeg: 90, decDeg: -80, majorArcmin: 10 });
  expect([rig.status, site.status, m31.status, south.status]).toEqual([201, 201, 201, 201]);
  const made = await api<{ recipe: Recipe }>(page, 'POST', '/api/recipes', { name: 'Andromeda and a southern field', rigId: rig.body.rig.id, start: { kind: 'starter', targetIds: [m31.body.target.id, south.body.target.id] } });
  expect(made.status).toBe(201);
  const recipe = made.body.recipe;
  const southStage = recipe.tree.children.find((n) => n.kind === 'stage' && n.targetId === south.body.target.id);
  return { recipe, southStageId: southStage!.id };
}

test('a first visit runs the night: summary, Gantt, findings; a finding opens its step in the composer', async ({ page }, info) => {
  const { recipe, southStageId } = await userWithRecipe(page);
  await page.goto(`/recipes/${recipe.id}/dry-run`);
  await expect(page.getByTestId('dry-run-screen')).toBeVisible();
  await expect(page.getByTestId('dry-run-recipe-name')).toHaveText('Andromeda and a southern field');
  // No stored run yet: the screen ran the current night by itself.
  await expect(page.getByTestId('dry-run-result-time')).toContainText('Result of');
  await expect(page.getByTestId('dry-run-night')).toContainText('Tonight');
  await expect(page.getByTestId('dry-run-summary-end')).toContainText(/\d\d:\d\d/);
  await expect(page.getByTestId('dry-run-efficiency')).toContainText('%');
  await expect(page.getByTestId('dry-run-gantt')).toBeVisible();
  await expect(page.getByTestId(`dry-run-gantt-row-${southStageId}`)).toContainText('Skipped');
  await expect(page.getByTestId('dry-run-cautions')).toContainText('Sun');
  await snap(page, info, 'dry-run-01-night');

  // A block of the Gantt tells what it is and where the telescope points (the first lane's first block).
  await page.getByTestId('dry-run-gantt').scrollIntoViewIfNeeded();
  await page.getByTestId('dry-run-gantt-scroll').locator('rect[fill="transparent"]').first().click({ force: true });
  const detail = page.getByTestId('dry-run-gantt-detail');
  await expect(detail).toBeVisible();
  await expect(page.getByTestId('dry-run-gantt-detail-time')).toHaveText(/^\d\d:\d\d–\d\d:\d\d · /);
  await snap(page, info, 'dry-run-02-block');

  await expect(page.getByTestId('dry-run-findings')).toBeVisible();
  const neverRises = page.getByTestId('dry-run-finding-never-rises');
  await expect(neverRises).toContainText('South 80');
  await neverRises.scrollIntoViewIfNeeded();
  await snap(page, info, 'dry-run-03-findings');
  await neverRises.click();
  await expect(page).toHaveURL(new RegExp(`/recipes/${recipe.id}\\?select=${southStageId}$`));
});

test('another night, and a stale result after the recipe changes', async ({ page }, info) => {
  const { recipe } = await userWithRecipe(page);
  const first = await api<{ dryRun: { nightDate: string } }>(page, 'POST', `/api/recipes/${recipe.id}/dry-runs`, { date: '2026-10-12' });
  expect(first.status).toBe(201);
  await page.goto(`/recipes/${recipe.id}/dry-run`);
  await expect(page.getByTestId('dry-run-night')).toHaveText('Mon 12 Oct 2026');
  await page.getByTestId('dry-run-next-night').click();
  await expect(page.getByTestId('dry-run-night')).toHaveText('Tue 13 Oct 2026');
  await expect(page.getByTestId('dry-run-run')).toBeEnabled();
  await page.getByTestId('dry-run-prev-night').click();
  await expect(page.getByTestId('dry-run-night')).toHaveText('Mon 12 Oct 2026');
  await expect(page.getByTestId('dry-run-stale')).toHaveCount(0);

  const saved = await api(page, 'PUT', `/api/recipes/${recipe.id}`, { name: 'Renamed', notes: recipe.notes, rigId: recipe.rigId, siteId: recipe.siteId, tree: recipe.tree, version: recipe.version });
  expect(saved.status).toBe(200);
  await page.reload();
  await expect(page.getByTestId('dry-run-stale')).toContainText('The recipe changed since this dry run');
  await snap(page, info, 'dry-run-04-stale');
  await page.getByTestId('dry-run-stale-run').click();
  await expect(page.getByTestId('dry-run-stale')).toHaveCount(0);
  await expect(page.getByTestId('dry-run-night')).toHaveText('Mon 12 Oct 2026');
});

test('best nights: a 30-night scan to the end, a 365-night scan cancelled midway, a best night run above', async ({ page }, info) => {
  const { recipe } = await userWithRecipe(page);
  await page.goto(`/recipes/${recipe.id}/dry-run`);
  await expect(page.getByTestId('dry-run-summary-end')).toBeVisible();
  await page.getByTestId('dry-run-tab-best').click();

  await page.getByTestId('scan-range-30').click();
  await page.getByTestId('scan-start').click();
  await expect(page.getByTestId('scan-status')).toContainText('Scanned 30 nights', { timeout: 30_000 });
  await expect(page.getByTestId('scan-chart')).toBeVisible();
  const best = page.locator('[data-testid^="scan-best-"]');
  await expect(best).toHaveCount(5);
  await page.getByTestId('scan-chart').scrollIntoViewIfNeeded();
  await snap(page, info, 'dry-run-05-best-nights');

  await page.getByTestId('scan-range-365').click();
  await page.getByTestId('scan-start').click();
  await expect(page.getByTestId('scan-progress')).toBeVisible();
  await expect(page.getByTestId('scan-progress-text')).toHaveText(/^([1-9]\d*) of 365 nights$/);
  await snap(page, info, 'dry-run-06-scanning');
  await page.getByTestId('scan-cancel').click();
  await expect(page.getByTestId('scan-status')).toHaveText(/^Stopped after (\d+) of 365 nights/);
  const stoppedAt = Number((await page.getByTestId('scan-status').textContent())!.match(/after (\d+)/)![1]);
  expect(stoppedAt).toBeLessThan(365);
  // Nothing arrives after the cancel.
  await page.waitForTimeout(1500);
  await expect(page.getByTestId('scan-status')).toContainText(`after ${stoppedAt} of 365`);

  const firstBest = best.first();
  const date = (await firstBest.getAttribute('data-testid'))!.replace('scan-best-', '');
  await firstBest.click();
  await expect(page.getByTestId('dry-run-summary-end')).toBeVisible();
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const day = new Date(Date.UTC(y, m - 1, d)).toLocaleDateString('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short' });
  await expect(page.getByTestId('dry-run-night')).toContainText(day.replace(',', ''));
  const latest = await api<{ dryRun: { nightDate: string } }>(page, 'GET', `/api/recipes/${recipe.id}/dry-runs/latest`);
  expect(latest.body.dryRun.nightDate).toBe(date);
});
