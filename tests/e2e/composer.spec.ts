import { randomUUID } from 'node:crypto';
import { expect, test, type Page } from '@playwright/test';
import { expectSignedIn, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * The recipe composer against the real server: a starter recipe made in the UI, mouse drags
 * (a step to a new place, a step into a stage, and a drag in a scrolled 150-step list, which
 * needs the committed patch of react-native-draggable-flatlist), a refused step edit, keyboard
 * editing with undo, two tabs saving over each other (409), and a restore from History.
 */

const ROW = 56; // components/recipes/step-row.tsx ROW_HEIGHT

type Node = { id: string; kind: string; enabled: boolean; children?: Node[] };
type Recipe = { id: string; version: number; tree: { children: Node[] } };

async function api<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, { method, credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      return { status: res.status, body: await res.json() };
    },
    { method, path, body },
  );
}

/** A fresh user with a rig, a default site and two targets (made through the API, then reloaded so the app sees them). */
async function signUpWithKit(page: Page, name: string) {
  await signUpThroughUi(page, name, uniqueEmail('composer'));
  await expectSignedIn(page);
  const rig = await api<{ rig: { id: string } }>(page, 'POST', '/api/rigs', { name: 'Ridge refractor' });
  const site = await api(page, 'POST', '/api/sites', { name: 'Larch Ridge', latitudeDeg: 46.9, longitudeDeg: 7.6, elevationM: 900, timeZone: 'Europe/Zurich', isDefault: true });
  const ngc = await api(page, 'POST', '/api/targets', { designation: 'NGC 7000', name: 'North America Nebula', type: 'emission-nebula', raDeg: 314.75, decDeg: 44.53, majorArcmin: 120 });
  const m31 = await api(page, 'POST', '/api/targets', { designation: 'M 31', name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.68, decDeg: 41.27, majorArcmin: 190 });
  expect([rig.status, site.status, ngc.status, m31.status]).toEqual([201, 201, 201, 201]);
  await page.reload();
  await expectSignedIn(page);
  return { rigId: rig.body.rig.id };
}

async function newStarterThroughUi(page: Page): Promise<Recipe> {
  await page.getByTestId('nav-recipes').click();
  await expect(page.getByTestId('recipes-empty')).toBeVisible();
  await page.getByTestId('recipes-new').click();
  await page.getByTestId('recipe-new-starter').click();
  await page.getByTestId('recipe-new-target-NGC-7000').click();
  await page.getByTestId('recipe-new-target-M-31').click();
  await expect(page.getByTestId('recipe-new-rig')).toHaveValue(/[0-9a-f-]{36}/);
  await page.getByTestId('recipe-new-create').click();
  await expect(page).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('composer-save-state')).toHaveText('Saved');
  return readRecipe(page);
}

async function readRecipe(page: Page, id = page.url().split('/').pop()!): Promise<Recipe> {
  return (await api<{ recipe: Recipe }>(page, 'GET', `/api/recipes/${id}`)).body.recipe;
}

/** The visible rows as "level name", e.g. "2 Focus". */
async function outline(page: Page): Promise<string[]> {
  return page.$$eval('[data-testid^="step-row-"]', (els) => els.map((e) => `${e.getAttribute('aria-level')} ${(e.getAttribute('aria-label') ?? '').split(':')[0]}`));
}

/** Drags a row by its handle with the mouse: press, 12 px to start, then the rest in 25 steps (stack-notes.md). */
async function dragRow(page: Page, id: string, rows: number) {
  const box = (await page.getByTestId(`step-handle-${id}`).boundingBox())!;
  const x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  const sign = Math.sign(rows);
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x, y + sign * 12, { steps: 2 });
  await page.mouse.move(x, y + rows * ROW + sign * 14, { steps: 25 });
  await page.mouse.up();
}

const saved = (page: Page) => expect(page.getByTestId('composer-save-state')).toHaveText('Saved');

/** Selects a row; phones open the step sheet on a tap, which is closed again here. */
async function selectRow(page: Page, id: string, isPhone: boolean) {
  await page.getByTestId(`step-row-${id}`).click({ position: { x: 120, y: 20 } });
  if (isPhone) await page.getByTestId('composer-editor-sheet-close').click();
  await expect(page.getByTestId(`step-row-${id}`)).toHaveAttribute('aria-selected', 'true');
}

test('a starter recipe: drag a step to a new place and one into a stage, kept after a reload', async ({ page }, info) => {
  await signUpWithKit(page, 'Ada Lindqvist');
  const recipe = await newStarterThroughUi(page);
  const [cool, stage] = recipe.tree.children as [Node, Node];
  const [, , focus] = stage.children as [Node, Node, Node];
  expect([cool.kind, stage.kind, focus.kind]).toEqual(['cool', 'stage', 'focus']);
  await expect.poll(() => outline(page)).toEqual(expect.arrayContaining(['1 Cool camera', '1 Stage', '2 Slew', '2 Centre', '2 Focus']));
  await snap(page, info, 'composer-01-starter');

  // The camera cooling step dropped right under the stage header becomes the stage's first step.
  await dragRow(page, cool.id, 1);
  await expect.poll(async () => (await outline(page)).slice(0, 5)).toEqual(['1 Stage', '2 Cool camera', '2 Slew', '2 Centre', '2 Focus']);
  // Focus one place up, before Centre.
  await dragRow(page, focus.id, -1);
  await expect.poll(async () => (await outline(page)).slice(0, 5)).toEqual(['1 Stage', '2 Cool camera', '2 Slew', '2 Focus', '2 Centre']);
  await saved(page);
  await snap(page, info, 'composer-02-dragged');

  await page.reload();
  await expect.poll(async () => (await outline(page)).slice(0, 5)).toEqual(['1 Stage', '2 Cool camera', '2 Slew', '2 Focus', '2 Centre']);
  const stored = await readRecipe(page);
  expect(stored.tree.children[0]!.children!.map((n) => n.kind).slice(0, 4)).toEqual(['cool', 'slew', 'focus', 'centre']);
});

test('a step with a bad exposure is refused with the message under the field', async ({ page }, info) => {
  await signUpWithKit(page, 'Bo Marten');
  const recipe = await newStarterThroughUi(page);
  const repeat = recipe.tree.children[1]!.children!.find((n) => n.kind === 'repeat')!;
  const expose = repeat.children![0]!;
  await page.getByTestId(`step-row-${expose.id}`).click({ position: { x: 120, y: 20 } });
  const input = page.getByTestId('node-editor-exposureS-input');
  await input.fill('-5');
  await page.getByTestId('node-editor-apply').click();
  await expect(page.getByTestId('node-editor-exposureS-error')).toHaveText('Exposure must be between 0.001 and 3600 s');
  await snap(page, info, 'composer-03-field-error');
  // Nothing reached the recipe: the row still shows the stored exposure and nothing is waiting to be saved.
  await expect(page.getByTestId(`step-row-${expose.id}`)).not.toHaveAttribute('aria-label', /−5 s/);
  await saved(page);
  expect((await readRecipe(page)).version).toBe(recipe.version);
});

test('keyboard (buttons on phones): move, indent, duplicate, delete, and undo/redo put everything back', async ({ page }, info) => {
  const isPhone = info.project.name === 'phone';
  const press = async (key: string, button: string) => (isPhone ? page.getByTestId(button).click() : page.keyboard.press(key));
  await signUpWithKit(page, 'Cleo Randall');
  const recipe = await newStarterThroughUi(page);
  expect(recipe.tree.children.map((n) => n.kind)).toEqual(['cool', 'stage', 'stage', 'warm', 'park']);
  const cool = recipe.tree.children[0]!;
  const coolRow = page.getByTestId(`step-row-${cool.id}`);
  const first = async () => (await outline(page))[0];
  const cools = async () => (await outline(page)).filter((r) => r.endsWith('Cool camera')).length;
  await selectRow(page, cool.id, isPhone);

  // Alt+↓ moves it past the first stage (a move among siblings never enters a container)…
  await press('Alt+ArrowDown', 'step-action-down');
  await expect.poll(first).toBe('1 Stage');
  await expect(coolRow).toHaveAttribute('aria-level', '1');
  // …and Tab puts it into the stage above, as its last step.
  await press('Tab', 'step-action-indent');
  await expect(coolRow).toHaveAttribute('aria-level', '2');
  await snap(page, info, 'composer-04-indented');

  await press('Control+z', 'composer-undo');
  await expect(coolRow).toHaveAttribute('aria-level', '1');
  await expect.poll(first).toBe('1 Stage');
  await press('Control+z', 'composer-undo');
  await expect.poll(first).toBe('1 Cool camera');
  await expect(page.getByTestId('composer-undo')).toHaveAttribute('aria-disabled', 'true');
  await press('Control+Shift+z', 'composer-redo');
  await expect.poll(first).toBe('1 Stage');

  await press('Control+d', 'step-action-duplicate');
  await expect.poll(cools).toBe(2);
  await press('Delete', 'step-action-delete');
  await expect.poll(cools).toBe(1);
  await saved(page);
  expect((await readRecipe(page)).tree.children.map((n) => n.kind)).toEqual(['stage', 'cool', 'stage', 'warm', 'park']);
});

test('two tabs: the second save meets "Changed elsewhere"; overwrite, then load theirs', async ({ page, context }, info) => {
  await signUpWithKit(page, 'Dag Ekholm');
  const recipe = await newStarterThroughUi(page);
  const [cool, , , warm, park] = recipe.tree.children as Node[];
  const other = await context.newPage();
  await other.goto(page.url());
  await expect(other.getByTestId('composer-save-state')).toHaveText('Saved');

  await page.getByTestId(`step-enabled-${park!.id}`).click();
  await saved(page);
  await other.getByTestId(`step-enabled-${warm!.id}`).click();
  await expect(other.getByTestId('composer-conflict')).toBeVisible();
  await expect(other.getByTestId('composer-save-state')).toHaveText('Changed elsewhere');
  await snap(other, info, 'composer-05-conflict');
  await other.getByTestId('composer-conflict-overwrite').click();
  await saved(other);
  await expect(other.getByTestId('composer-conflict')).toHaveCount(0);
  let stored = await readRecipe(other);
  expect(stored.tree.children.map((n) => n.enabled)).toEqual([true, true, true, false, true]);

  // The first tab is now behind: its next save conflicts, and it takes the other tab's version.
  await page.getByTestId(`step-enabled-${cool!.id}`).click();
  await expect(page.getByTestId('composer-conflict')).toBeVisible();
  await page.getByTestId('composer-conflict-load').click();
  await saved(page);
  await expect(page.getByTestId(`step-enabled-${warm!.id}`)).toHaveAttribute('aria-checked', 'false');
  await expect(page.getByTestId(`step-enabled-${park!.id}`)).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByTestId(`step-enabled-${cool!.id}`)).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByTestId('composer-undo')).toHaveAttribute('aria-disabled', 'true');
  stored = await readRecipe(page);
  expect(stored.tree.children.map((n) => n.enabled)).toEqual([true, true, true, false, true]);
  await other.close();
});

test('history: restore the first version, which becomes the newest', async ({ page }, info) => {
  await signUpWithKit(page, 'Eir Solberg');
  const recipe = await newStarterThroughUi(page);
  const [cool, , , warm] = recipe.tree.children as Node[];
  await page.getByTestId(`step-enabled-${cool!.id}`).click();
  await saved(page);
  await page.getByTestId(`step-enabled-${warm!.id}`).click();
  await saved(page);
  expect((await readRecipe(page)).version).toBe(3);

  await page.getByTestId('composer-history').click();
  await expect(page.getByTestId('history-rev-3')).toContainText('current');
  await expect(page.getByTestId('history-rev-1')).toContainText('Version 1');
  await snap(page, info, 'composer-06-history');
  await page.getByTestId('history-restore-1').click();
  await expect(page.getByTestId('composer-history-panel')).toHaveCount(0);
  await expect(page.getByTestId(`step-enabled-${cool!.id}`)).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByTestId(`step-enabled-${warm!.id}`)).toHaveAttribute('aria-checked', 'true');
  await saved(page);
  const stored = await readRecipe(page);
  expect(stored.version).toBe(4);
  expect(stored.tree.children.every((n) => n.enabled)).toBe(true);
});

test('a drag in a scrolled 150-step list lands where it was dropped', async ({ page }, info) => {
  await signUpThroughUi(page, 'Fen Oduya', uniqueEmail('composer'));
  await expectSignedIn(page);
  const children = Array.from({ length: 150 }, (_, i) => ({ id: randomUUID(), kind: 'note', text: `Note ${i}` }));
  const made = await api<{ recipe: Recipe }>(page, 'POST', '/api/recipes', { name: 'Long night', start: { kind: 'tree', tree: { children } } });
  expect(made.status).toBe(201);
  await page.goto(`/recipes/${made.body.recipe.id}`);
  await expect(page.getByTestId(`step-row-${children[0]!.id}`)).toBeVisible();

  // Scroll the list about 60 rows down with the wheel, then drag "Note 62" two rows down.
  const list = page.getByTestId('composer-steps');
  const listBox = (await list.boundingBox())!;
  await page.mouse.move(listBox.x + listBox.width / 2, listBox.y + listBox.height / 2);
  for (let i = 0; i < 10; i++) await page.mouse.wheel(0, 6 * ROW);
  const moved = children[62]!;
  await expect(page.getByTestId(`step-row-${moved.id}`)).toBeInViewport();
  expect(await list.evaluate((el) => el.scrollTop)).toBeGreaterThan(40 * ROW);
  await dragRow(page, moved.id, 2);
  const around = async () => {
    const labels = await page.$$eval('[data-testid^="step-row-"]', (els) => els.map((e) => (e.getAttribute('aria-label') ?? '').split(': ')[1]));
    const at = labels.indexOf('Note 62');
    return labels.slice(at - 3, at + 2);
  };
  await expect.poll(around).toEqual(['Note 61', 'Note 63', 'Note 64', 'Note 62', 'Note 65']);
  await snap(page, info, 'composer-07-scrolled-drop');
  await saved(page);
  const stored = await readRecipe(page, made.body.recipe.id);
  const order = stored.tree.children.map((n) => n.id);
  expect(order.slice(61, 65)).toEqual([children[61]!.id, children[63]!.id, children[64]!.id, moved.id]);
});

test('the list: search, sort, delete with undo', async ({ page }, info) => {
  await signUpThroughUi(page, 'Gus Arvidsen', uniqueEmail('composer'));
  await expectSignedIn(page);
  const one = await api<{ recipe: Recipe }>(page, 'POST', '/api/recipes', { name: 'Autumn widefield', start: { kind: 'empty' } });
  const two = await api<{ recipe: Recipe }>(page, 'POST', '/api/recipes', { name: 'Bright nebulae', start: { kind: 'empty' } });
  await page.getByTestId('nav-recipes').click();
  const rowOne = page.getByTestId(`recipe-row-${one.body.recipe.id}`);
  const rowTwo = page.getByTestId(`recipe-row-${two.body.recipe.id}`);
  await expect(rowOne).toBeVisible();
  await expect(rowTwo).toBeVisible();

  await page.getByTestId('recipes-sort').selectOption('name');
  await expect.poll(() => page.$$eval('[data-testid^="recipe-row-"]', (els) => els.map((e) => e.getAttribute('data-testid')))).toEqual([`recipe-row-${one.body.recipe.id}`, `recipe-row-${two.body.recipe.id}`]);
  await page.getByTestId('recipes-search').fill('nebul');
  await expect(rowOne).toHaveCount(0);
  await expect(rowTwo).toBeVisible();
  await page.getByTestId('recipes-search').fill('');
  await expect(rowOne).toBeVisible();
  await snap(page, info, 'recipes-01-list');

  await page.getByTestId(`recipe-delete-${one.body.recipe.id}`).click();
  await expect(rowOne).toHaveCount(0);
  await page.getByTestId('recipe-deleted-undo').click();
  await expect(rowOne).toBeVisible();
  expect((await api(page, 'GET', `/api/recipes/${one.body.recipe.id}`)).status).toBe(200);
});
