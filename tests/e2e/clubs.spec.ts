import { expect, test, type Page } from '@playwright/test';
import { expectSignedIn, makeSiteAdmin, openSection, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * Issue 7 "done means": an owner creates a club in the UI, publishes a recipe as a template and
 * invites a new person by e-mail; the invitation is read back from the local SMTP fake on the
 * admin Mail page; the new person opens the link signed out, sees who invites them to which club,
 * creates an account from the invitation page, joins, and uses the template on their own rig,
 * whose filters are named differently (one band has no filter of its band at all, so the app
 * asks for it).
 */

async function api<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, { method, credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
      return { status: res.status, body: await res.json() };
    },
    { method, path, body },
  );
}

const VEIL = { designation: 'NGC 6992', name: 'Eastern Veil', type: 'supernova-remnant', raDeg: 314.0, decDeg: 31.7, majorArcmin: 60 };

type Node = { kind: string; filter?: string; targetId?: string | null; children?: Node[] };
const exposeFilters = (nodes: Node[]): string[] => nodes.flatMap((n) => (n.kind === 'expose' && n.filter ? [n.filter] : exposeFilters(n.children ?? [])));

test('an owner shares a template; an invited newcomer joins by e-mail and uses it on their own rig', async ({ browser }, info) => {
  const viewport = info.project.use.viewport ?? undefined;
  const ownerEmail = uniqueEmail('club-owner');
  const newcomerEmail = uniqueEmail('club-newcomer');
  const adminEmail = uniqueEmail('club-mail-admin');
  const clubName = `Larch Ridge Imagers ${ownerEmail.slice(11, 19)}`;
  const slug = clubName.toLowerCase().replace(/[^a-z0-9]+/g, '-');

  // The owner: a narrowband rig and a starter recipe through it (API), then a club (UI).
  const owner = await browser.newPage({ viewport });
  await signUpThroughUi(owner, 'Wren Ostby', ownerEmail);
  await expectSignedIn(owner);
  const rig = await api<{ rig: { id: string } }>(owner, 'POST', '/api/rigs', {
    name: 'Ridge refractor',
    filterWheel: { slots: [{ name: 'Astro Ha', band: 'Ha' }, { name: 'Astro OIII', band: 'OIII' }] },
  });
  expect(rig.status).toBe(201);
  // NGC 6992, approximate J2000 centre of the Eastern Veil (from memory; any position serves here).
  const veil = await api<{ target: { id: string } }>(owner, 'POST', '/api/targets', VEIL);
  const recipe = await api<{ recipe: { id: string } }>(owner, 'POST', '/api/recipes', { name: 'Veil bicolour', rigId: rig.body.rig.id, start: { kind: 'starter', targetIds: [veil.body.target.id] } });
  expect(recipe.status).toBe(201);
  await owner.reload();
  await openSection(owner, 'club');
  await owner.getByTestId('clubs-new').click();
  await owner.getByTestId('club-name-input').fill(clubName);
  await owner.getByTestId('club-create').click();
  await expect(owner).toHaveURL(/\/clubs\/[^/]+$/);
  const clubUrl = owner.url();

  // Publish the recipe as a template.
  await owner.getByTestId('club-publish').click();
  await owner.getByTestId('publish-recipe').selectOption({ label: 'Veil bicolour' });
  await owner.getByTestId('publish-title').fill('Veil bicolour');
  await owner.getByTestId('publish-description').fill('Two hours of Ha and OIII a night, alternating.');
  await owner.getByTestId('tag-narrowband').click();
  await owner.getByTestId('publish-submit').click();
  await expect(owner.getByTestId('template-screen')).toBeVisible();
  await expect(owner.getByTestId('template-tree')).toContainText('Ha');
  await snap(owner, info, 'clubs-01-template');

  // Invite the newcomer.
  await owner.goto(clubUrl);
  await expect(owner.getByTestId('template-card-veil-bicolour')).toBeVisible();
  await owner.getByTestId('club-invite-email').fill(newcomerEmail);
  await owner.getByTestId('club-invite-send').click();
  await expect(owner.getByTestId(`club-invitation-${newcomerEmail}`)).toBeVisible();
  await snap(owner, info, 'clubs-02-invited');

  // A site admin reads the invitation on the Mail page.
  const admin = await browser.newPage({ viewport });
  await signUpThroughUi(admin, 'Mail Keeper', adminEmail);
  await expectSignedIn(admin);
  await makeSiteAdmin(adminEmail);
  await admin.reload();
  await openSection(admin, 'mail');
  const mail = admin.getByTestId(/^mail-(?!to$|body$|list$|refresh$|empty$)/).filter({ hasText: newcomerEmail }).first();
  const link = mail.getByRole('link', { name: /\/invitations\// }).first();
  await expect(link).toBeVisible();
  const href = (await link.getAttribute('href'))!;
  expect(href).toMatch(/\/invitations\/[^/]+$/);

  // The newcomer opens the link signed out, creates an account there and comes back to join.
  const context = await browser.newContext({ viewport });
  const newcomer = await context.newPage();
  await newcomer.goto(href);
  // Before any account exists, the link says who invites them where (the public preview).
  const preview = newcomer.getByTestId('invitation-preview');
  await expect(preview).toContainText(`Wren Ostby invites you to ${clubName} as a member.`);
  await expect(preview).toContainText('Sent to c***@e2e.example');
  await expect(preview).not.toContainText(newcomerEmail);
  await snap(newcomer, info, 'clubs-02b-invitation-signed-out');
  await newcomer.getByTestId('invitation-sign-up').click();
  await newcomer.getByLabel('Name', { exact: true }).fill('Ilse Quarrington');
  await newcomer.getByLabel('Email', { exact: true }).fill(newcomerEmail);
  await newcomer.getByLabel('Password', { exact: true }).fill('night-sky-2026');
  await newcomer.getByTestId('sign-up-submit').click();
  await expect(newcomer).toHaveURL(/\/invitations\//);
  await newcomer.getByTestId('invitation-accept').click();
  await expect(newcomer).toHaveURL(/\/clubs\/[^/]+$/);
  await expect(newcomer.getByTestId(`club-member-${newcomerEmail}`)).toBeVisible();
  await expect(newcomer.getByTestId(`club-member-${ownerEmail}`)).toBeVisible();

  // Their own rig: Ha under another name, and a filter of no known band where the template has OIII.
  const ownRig = await api<{ rig: { id: string } }>(newcomer, 'POST', '/api/rigs', {
    name: 'Backyard reflector',
    filterWheel: { slots: [{ name: 'Ha 7nm', band: 'Ha' }, { name: 'Teal 3nm', band: 'custom' }] },
  });
  expect(ownRig.status).toBe(201);
  // The same object on their own list: the template's suggested target is preselected.
  const ownVeil = await api<{ target: { id: string } }>(newcomer, 'POST', '/api/targets', VEIL);
  await newcomer.reload();
  await newcomer.getByTestId('template-card-veil-bicolour').click();
  await newcomer.getByTestId('template-use').click();
  await newcomer.getByTestId('template-use-rig').selectOption({ label: 'Backyard reflector' });
  await newcomer.getByTestId('template-use-confirm').click();
  await newcomer.getByTestId('template-band-OIII').selectOption({ label: 'Teal 3nm' });
  await snap(newcomer, info, 'clubs-03-band');
  await newcomer.getByTestId('template-use-confirm').click();
  await expect(newcomer).toHaveURL(/\/recipes\/[0-9a-f-]{36}$/);
  const copyId = newcomer.url().split('/').pop()!;
  const copy = await api<{ recipe: { rigId: string; tree: { children: Node[] } } }>(newcomer, 'GET', `/api/recipes/${copyId}`);
  expect(copy.body.recipe.rigId).toBe(ownRig.body.rig.id);
  expect(new Set(exposeFilters(copy.body.recipe.tree.children))).toEqual(new Set(['Ha 7nm', 'Teal 3nm']));
  const stage = copy.body.recipe.tree.children.find((n) => n.kind === 'stage');
  expect(stage?.targetId).toBe(ownVeil.body.target.id);

  // It is in their recipes.
  await newcomer.getByTestId('nav-recipes').click();
  await expect(newcomer.getByText('Veil bicolour').first()).toBeVisible();
  await snap(newcomer, info, 'clubs-04-recipes');
  await context.close();

  // The owner's list shows the club with its slug.
  await openSection(owner, 'club');
  await expect(owner.getByTestId(`club-row-${slug}`)).toContainText('Owner');
});
