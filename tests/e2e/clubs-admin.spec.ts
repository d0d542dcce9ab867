import { expect, test, type Browser, type BrowserContext, type Page, type TestInfo } from '@playwright/test';
import pg from 'pg';
import { CHANGELOG_MAX_CHARS } from '@/shared/schemas/club-api';
import { PASSWORD, snap, uniqueEmail } from './support';

/*
 * Club administration in the browser (the API side is in tests/api/clubs.test.ts, templates.test.ts
 * and template-use.test.ts): roles, removing, leaving, resending (with its confirmation or error)
 * and revoking invitations, new template versions (changelogs and the readable change list in
 * the recipe's notice), retiring, the managers' "Show retired" list and a use refused meanwhile. What is not under test is set up through the API with the
 * actor's own session cookies.
 */

const BASE_URL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:8181';

type Actor = { context: BrowserContext; page: Page; name: string; email: string };

/** A new account in its own browser context, signed up through the API (the UI path is covered elsewhere). */
async function actor(browser: Browser, info: TestInfo, name: string): Promise<Actor> {
  const email = uniqueEmail(name.toLowerCase().replace(/\W+/g, '-'));
  const context = await browser.newContext({ viewport: info.project.use.viewport ?? undefined, baseURL: BASE_URL });
  const res = await context.request.post('/api/auth/sign-up/email', { data: { name, email, password: PASSWORD }, headers: { Origin: BASE_URL } });
  expect(res.status(), await res.text()).toBe(200);
  return { context, page: await context.newPage(), name, email };
}

/** A JSON request with the actor's session cookies (shared with their page) and our Origin. */
async function api<T>(a: Actor, method: string, path: string, body?: unknown): Promise<T> {
  const res = await a.context.request.fetch(path, { method, data: body, headers: { Origin: BASE_URL } });
  if (!res.ok()) throw new Error(`${method} ${path} → ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Runs `act` and checks that the request it makes to a path ending in `path` succeeds. */
async function answered(page: Page, path: string, act: () => Promise<void>) {
  const response = page.waitForResponse((r) => new URL(r.url()).pathname.endsWith(path) && r.request().method() !== 'GET');
  await act();
  expect((await response).status()).toBe(200);
}

/** A club of `owner`'s, with the others invited under their roles and joined. */
async function club(owner: Actor, people: [Actor, 'admin' | 'member'][]): Promise<{ id: string; url: string; name: string }> {
  const name = `Heath Lane Imagers ${owner.email.split('@')[0]!.slice(-8)}`;
  const slug = name.toLowerCase().replace(/[^a-z0-9]+/g, '-');
  const { id } = await api<{ id: string }>(owner, 'POST', '/api/auth/organization/create', { name, slug });
  for (const [who, role] of people) {
    const inv = await api<{ id: string }>(owner, 'POST', '/api/auth/organization/invite-member', { email: who.email, role, organizationId: id });
    await api(who, 'POST', '/api/auth/organization/accept-invitation', { invitationId: inv.id });
  }
  return { id, url: `/clubs/${id}`, name };
}

/** Mail caught by the SMTP fake for one address, oldest first. */
async function mailTo(email: string): Promise<{ subject: string; text: string }[]> {
  const client = new pg.Client({ connectionString: process.env.E2E_DATABASE_URL });
  await client.connect();
  try {
    const { rows } = await client.query(`SELECT subject, text FROM dev_mail WHERE "to" @> $1::jsonb ORDER BY received_at`, [JSON.stringify([email])]);
    return rows as { subject: string; text: string }[];
  } finally {
    await client.end();
  }
}

const HA_OIII = [{ name: 'Ha 7nm', band: 'Ha' }, { name: 'OIII 7nm', band: 'OIII' }];
// NGC 6960, approximate J2000 centre of the Western Veil (from memory; any position serves here).
const WEST_VEIL = { designation: 'NGC 6960', name: 'Western Veil', type: 'supernova-remnant', raDeg: 311.4, decDeg: 30.7, majorArcmin: 70 };

/** A rig, a target and a starter recipe of the user's; returns the recipe id. */
async function starterRecipe(a: Actor, name: string): Promise<string> {
  const rig = await api<{ rig: { id: string } }>(a, 'POST', '/api/rigs', { name: `${a.name} rig`, filterWheel: { slots: HA_OIII } });
  const target = await api<{ target: { id: string } }>(a, 'POST', '/api/targets', WEST_VEIL);
  const made = await api<{ recipe: { id: string } }>(a, 'POST', '/api/recipes', { name, rigId: rig.rig.id, start: { kind: 'starter', targetIds: [target.target.id] } });
  return made.recipe.id;
}

async function publish(a: Actor, clubId: string, recipeId: string, title: string): Promise<string> {
  const t = await api<{ template: { id: string } }>(a, 'POST', `/api/clubs/${clubId}/templates`, { recipeId, title, description: 'Ha and OIII, alternating.', tags: ['narrowband'], changelog: 'First version' });
  return t.template.id;
}

test('an owner makes a member an admin, who then manages the club; a removed member loses the club', async ({ browser }, info) => {
  const owner = await actor(browser, info, 'Maren Tull');
  const rising = await actor(browser, info, 'Pell Asgard');
  const leaving = await actor(browser, info, 'Orrin Vael');
  const c = await club(owner, [[rising, 'member'], [leaving, 'member']]);

  // As a plain member: no publishing, no invitations.
  await rising.page.goto(c.url);
  await expect(rising.page.getByTestId(`club-member-${rising.email}`)).toContainText('Member');
  await expect(rising.page.getByTestId('club-publish')).toHaveCount(0);
  await expect(rising.page.getByTestId('club-invitations')).toHaveCount(0);

  await owner.page.goto(c.url);
  const risingRow = owner.page.getByTestId(`club-member-${rising.email}`);
  await answered(owner.page, '/organization/update-member-role', () => risingRow.getByTestId('club-member-role').selectOption('admin').then(() => undefined));
  await expect(risingRow.getByTestId('club-member-role')).toHaveValue('admin');
  await owner.page.reload();
  await expect(risingRow.getByTestId('club-member-role')).toHaveValue('admin');
  await risingRow.scrollIntoViewIfNeeded();
  await snap(owner.page, info, 'clubs-admin-01-role');

  await rising.page.reload();
  await expect(rising.page.getByTestId(`club-member-${rising.email}`)).toContainText('Admin');
  await expect(rising.page.getByTestId('club-publish')).toBeVisible();
  await expect(rising.page.getByTestId('club-invitations')).toBeVisible();
  await expect(rising.page.getByTestId('club-invite-email')).toBeVisible();
  await rising.page.getByTestId(`club-member-${rising.email}`).scrollIntoViewIfNeeded();
  await snap(rising.page, info, 'clubs-admin-02-now-admin');

  // The owner removes the other member, who then has no such club.
  await leaving.page.goto(c.url);
  await expect(leaving.page.getByTestId('club-screen')).toBeVisible();
  await answered(owner.page, '/organization/remove-member', () => owner.page.getByTestId(`club-member-${leaving.email}`).getByTestId('club-member-remove').click());
  await expect(owner.page.getByTestId(`club-member-${leaving.email}`)).toHaveCount(0);
  await expect(owner.page.getByTestId('club-members')).toContainText('2 members');
  await leaving.page.reload();
  await expect(leaving.page.getByTestId('error-view')).toContainText('Could not load this club');
  await snap(leaving.page, info, 'clubs-admin-03-removed');
  await leaving.page.goto('/clubs');
  await expect(leaving.page.getByTestId('clubs-empty')).toBeVisible();
  await expect(leaving.page.getByText(c.name)).toHaveCount(0);
});

test('a member leaves a club', async ({ browser }, info) => {
  const owner = await actor(browser, info, 'Sella Brink');
  const member = await actor(browser, info, 'Tomas Reyl');
  const c = await club(owner, [[member, 'member']]);

  await member.page.goto('/clubs');
  await member.page.getByRole('link', { name: c.name }).click();
  await expect(member.page).toHaveURL(new RegExp(`${c.url}$`));
  await member.page.getByTestId('club-leave').click();
  await snap(member.page, info, 'clubs-admin-04-leave');
  await answered(member.page, '/organization/leave', () => member.page.getByTestId('club-leave-confirm').click());
  await expect(member.page).toHaveURL(/\/clubs$/);
  await expect(member.page.getByTestId('clubs-empty')).toBeVisible();

  await owner.page.goto(c.url);
  await expect(owner.page.getByTestId('club-screen')).toBeVisible();
  await expect(owner.page.getByTestId(`club-member-${member.email}`)).toHaveCount(0);
  await expect(owner.page.getByTestId('club-members')).toContainText('1 member');
});

test('an owner resends and revokes an invitation; the revoked link says so', async ({ browser }, info) => {
  const owner = await actor(browser, info, 'Ivo Danneker');
  const invitee = await actor(browser, info, 'Runa Holt');
  const quick = await actor(browser, info, 'Bo Lindqvar');
  const c = await club(owner, []);
  const inv = await api<{ id: string }>(owner, 'POST', '/api/auth/organization/invite-member', { email: invitee.email, role: 'member', organizationId: c.id });
  const quickInv = await api<{ id: string }>(owner, 'POST', '/api/auth/organization/invite-member', { email: quick.email, role: 'member', organizationId: c.id });
  const link = `/invitations/${inv.id}`;
  await expect.poll(async () => (await mailTo(invitee.email)).length).toBe(1);

  await owner.page.goto(c.url);
  const row = owner.page.getByTestId(`club-invitation-${invitee.email}`);
  await answered(owner.page, '/organization/invite-member', () => row.getByTestId('club-invitation-resend').click());
  await expect(owner.page.getByTestId('club-invitation-resent')).toContainText(`Sent again to ${invitee.email}`);
  await expect.poll(async () => (await mailTo(invitee.email)).map((m) => m.text.includes(link))).toEqual([true, true]);
  await expect(row).toBeVisible();
  await row.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  await snap(owner.page, info, 'clubs-admin-05-invitation');

  // The other one joins in their own browser while the owner's page still lists them: the resend fails, and says why.
  await api(quick, 'POST', '/api/auth/organization/accept-invitation', { invitationId: quickInv.id });
  const refused = owner.page.waitForResponse((r) => new URL(r.url()).pathname.endsWith('/organization/invite-member'));
  await owner.page.getByTestId(`club-invitation-${quick.email}`).getByTestId('club-invitation-resend').click();
  expect((await refused).status()).toBe(400);
  const failed = owner.page.getByTestId('club-invitation-resend-error');
  await expect(failed).toContainText(`Could not resend to ${quick.email}`);
  await expect(failed).toContainText('They have joined the club in the meantime, so there is nothing to resend.');
  await expect(owner.page.getByTestId('club-invitation-resent')).toHaveCount(0);
  await expect(owner.page.getByTestId(`club-invitation-${quick.email}`)).toHaveCount(0);
  await failed.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  await snap(owner.page, info, 'clubs-admin-05b-resend-failed');

  await answered(owner.page, '/organization/cancel-invitation', () => row.getByTestId('club-invitation-revoke').click());
  await expect(row).toHaveCount(0);
  await expect(owner.page.getByTestId('club-invitations')).toContainText('No invitations waiting.');

  await invitee.page.goto(link);
  await expect(invitee.page.getByTestId('invitation-error')).toContainText('This invitation cannot be opened');
  await expect(invitee.page.getByTestId('invitation-accept')).toHaveCount(0);
  await snap(invitee.page, info, 'clubs-admin-06-revoked');
  // Signed out, the same link says the club withdrew it and offers no way to accept.
  const signedOut = await browser.newContext({ viewport: info.project.use.viewport ?? undefined, baseURL: BASE_URL });
  const visitor = await signedOut.newPage();
  await visitor.goto(link);
  await expect(visitor.getByTestId('invitation-error')).toContainText('The club withdrew this invitation.');
  await expect(visitor.getByTestId('invitation-sign-up')).toHaveCount(0);
  await snap(visitor, info, 'clubs-admin-06b-revoked-signed-out');
  await signedOut.close();
  await invitee.page.goto('/clubs');
  await expect(invitee.page.getByTestId('clubs-empty')).toBeVisible();
});

type Node = { kind: string; count?: number; children?: Node[] };
const firstExpose = (nodes: Node[]): Node | undefined => nodes.map((n) => (n.kind === 'expose' ? n : firstExpose(n.children ?? []))).find(Boolean);

test('an admin publishes a new version with a changelog; a member who used the old one sees what changed', async ({ browser }, info) => {
  const owner = await actor(browser, info, 'Hedda Marl');
  const admin = await actor(browser, info, 'Caspar Wold');
  const member = await actor(browser, info, 'Lio Fenn');
  const c = await club(owner, [[admin, 'admin'], [member, 'member']]);
  const source = await starterRecipe(admin, 'Western Veil bicolour');
  const templateId = await publish(admin, c.id, source, 'Western Veil bicolour');
  const templateUrl = `${c.url}/templates/${templateId}`;

  // The member takes version 1 onto a rig of their own.
  const rig = await api<{ rig: { id: string } }>(member, 'POST', '/api/rigs', { name: 'Garden newtonian', filterWheel: { slots: [{ name: 'H-alpha 6nm', band: 'Ha' }, { name: 'O3 6nm', band: 'OIII' }] } });
  const copy = await api<{ recipe: { id: string } }>(member, 'POST', `/api/clubs/${c.id}/templates/${templateId}/use`, { rigId: rig.rig.id });

  // The admin changes the source recipe: more frames in its first exposure block.
  const mine = await api<{ recipe: { tree: { children: Node[] } } }>(admin, 'GET', `/api/recipes/${source}`);
  const tree = structuredClone(mine.recipe.tree);
  const block = firstExpose(tree.children)!;
  const frames = (block.count ?? 1) + 37;
  block.count = frames;
  await api(admin, 'PUT', `/api/recipes/${source}`, { ...mine.recipe, tree });

  // … and publishes it as version 2 from the template page.
  await admin.page.goto(templateUrl);
  await expect(admin.page.getByTestId('template-admin')).toBeVisible();
  await admin.page.getByTestId('template-version-recipe').selectOption({ label: 'Western Veil bicolour' });
  // Longer than the old 500-character box: the form allows what the API accepts (CHANGELOG_MAX_CHARS).
  const changelogBox = admin.page.getByTestId('template-version-changelog');
  await expect(changelogBox).toHaveAttribute('maxlength', String(CHANGELOG_MAX_CHARS));
  const tail = 'Darks at the same set-point as before.';
  const changelog = `${frames} frames in the first block. ${'Longer Ha runs make the faint filaments stand out against the background. '.repeat(8)}${tail}`;
  expect(changelog.length).toBeGreaterThan(500);
  await changelogBox.fill(changelog);
  await expect(changelogBox).toHaveValue(changelog);
  const published = admin.page.waitForResponse((r) => r.url().endsWith(`/templates/${templateId}/versions`));
  await admin.page.getByTestId('template-new-version').click();
  expect((await published).status()).toBe(201);
  await expect(admin.page.getByTestId('template-version-published')).toBeVisible();
  await expect(admin.page.getByTestId('template-version-2')).toContainText(`${frames} frames in the first block`);
  await expect(admin.page.getByTestId('template-version-2')).toContainText(tail);
  await expect(admin.page.getByTestId('template-screen')).toContainText('Version 2');
  await snap(admin.page, info, 'clubs-admin-07-new-version');

  // The member is told by mail, and their recipe shows the notice with the changed block.
  await expect.poll(async () => (await mailTo(member.email)).map((m) => m.subject)).toContain('New version of Western Veil bicolour');
  await member.page.goto(`/recipes/${copy.recipe.id}`);
  const notice = member.page.getByTestId('composer-template-newer');
  await expect(notice).toContainText('“Western Veil bicolour” has version 2');
  await expect(notice).toContainText('This recipe started from version 1.');
  // What version 2 says, in the publisher's words.
  await expect(member.page.getByTestId('composer-template-changelog-2')).toContainText('Version 2');
  await expect(member.page.getByTestId('composer-template-changelog-2')).toContainText(`${frames} frames in the first block.`);
  await snap(member.page, info, 'clubs-admin-08-newer-notice');
  // What changed, step by step in plain words: the first block's frames, in the stage named by its target.
  await member.page.getByTestId('composer-template-compare').click();
  const changes = member.page.getByTestId('composer-template-changes');
  await expect(changes.getByRole('listitem')).toHaveCount(1);
  await expect(changes).toContainText(/^Changed in stage 'NGC 6960' › Repeat until the target sinks below 30° \(step 1\): Ha 3 × 300 s, .* → Ha \d+ × 300 s/);
  await expect(changes).toContainText(`→ Ha ${frames} × 300 s`);
  await expect(changes).not.toContainText('"count"');
  await changes.scrollIntoViewIfNeeded();
  await snap(member.page, info, 'clubs-admin-08b-compare');

  // The template page says which version was theirs and what version 2 is.
  await member.page.getByTestId('composer-template-open').click();
  await expect(member.page).toHaveURL(new RegExp(`${templateUrl}$`));
  await expect(member.page.getByTestId('template-version-2')).toContainText(`${frames} frames in the first block`);
  await expect(member.page.getByTestId('template-version-1')).toContainText('you started from this one');
  await expect(member.page.getByTestId('template-admin')).toHaveCount(0);
});

test('an admin retires a template; members are no longer offered it', async ({ browser }, info) => {
  const owner = await actor(browser, info, 'Ansel Pike');
  const admin = await actor(browser, info, 'Dagny Orme');
  const member = await actor(browser, info, 'Yusuf Trell');
  const c = await club(owner, [[admin, 'admin'], [member, 'member']]);
  const source = await starterRecipe(admin, 'Veil nights');
  await publish(admin, c.id, source, 'Veil keeper');
  const retiring = await publish(admin, c.id, source, 'Veil old timer');

  await member.page.goto(c.url);
  await expect(member.page.getByTestId('template-card-veil-keeper')).toBeVisible();
  await expect(member.page.getByTestId('template-card-veil-old-timer')).toBeVisible();
  await expect(member.page.getByTestId('club-templates-show-retired')).toHaveCount(0);

  // In a second tab the member is about to use it when the admin retires it.
  await api(member, 'POST', '/api/rigs', { name: 'Balcony refractor', filterWheel: { slots: HA_OIII } });
  const otherTab = await member.context.newPage();
  await otherTab.goto(`${c.url}/templates/${retiring}`);
  await otherTab.getByTestId('template-use').click();
  await otherTab.getByTestId('template-use-rig').selectOption({ label: 'Balcony refractor' });

  await admin.page.goto(`${c.url}/templates/${retiring}`);
  await admin.page.getByTestId('template-retire').click();
  await answered(admin.page, '/retire', () => admin.page.getByTestId('template-retire-confirm').click());
  await expect(admin.page.getByTestId('template-retired')).toBeVisible();
  await expect(admin.page.getByTestId('template-screen')).toContainText('Version 1 · retired');
  await expect(admin.page.getByTestId('template-use')).toBeDisabled();
  await snap(admin.page, info, 'clubs-admin-09-retired');

  // The other tab's copy is refused (409 template-retired) with the server's sentence, and the form closes.
  const refused = otherTab.waitForResponse((r) => new URL(r.url()).pathname.endsWith(`/templates/${retiring}/use`));
  await otherTab.getByTestId('template-use-confirm').click();
  expect((await refused).status()).toBe(409);
  await expect(otherTab.getByTestId('template-use-retired')).toContainText('Could not make your copy');
  await expect(otherTab.getByTestId('template-use-retired')).toContainText('This template is retired: members can no longer use it.');
  await expect(otherTab.getByTestId('template-use-form')).toHaveCount(0);
  await expect(otherTab.getByTestId('template-use')).toBeDisabled();
  await expect(otherTab.getByTestId('template-screen')).toContainText('Version 1 · retired');
  await snap(otherTab, info, 'clubs-admin-09b-retired-meanwhile');
  await otherTab.close();

  // Owners and admins can still list it, marked retired.
  await admin.page.goto(c.url);
  await expect(admin.page.getByTestId('template-card-veil-keeper')).toBeVisible();
  await expect(admin.page.getByTestId('template-card-veil-old-timer')).toHaveCount(0);
  const withRetired = admin.page.waitForResponse((r) => r.url().includes('/templates?') && new URL(r.url()).searchParams.get('retired') === '1');
  await admin.page.getByTestId('club-templates-show-retired').click();
  expect((await withRetired).status()).toBe(200);
  await expect(admin.page.getByTestId('club-templates-show-retired')).toHaveAttribute('aria-checked', 'true');
  const retiredCard = admin.page.getByTestId('template-card-veil-old-timer');
  await expect(retiredCard.getByTestId('template-card-retired')).toHaveText('Retired');
  await expect(admin.page.getByTestId('template-card-veil-keeper').getByTestId('template-card-retired')).toHaveCount(0);
  await retiredCard.scrollIntoViewIfNeeded();
  await snap(admin.page, info, 'clubs-admin-09c-show-retired');
  await admin.page.getByTestId('club-templates-show-retired').click();
  await expect(admin.page.getByTestId('template-card-veil-old-timer')).toHaveCount(0);

  await member.page.reload();
  await expect(member.page.getByTestId('template-card-veil-keeper')).toBeVisible();
  await expect(member.page.getByTestId('template-card-veil-old-timer')).toHaveCount(0);
  const searched = member.page.waitForResponse((r) => r.url().includes('/templates?') && new URL(r.url()).searchParams.get('q') === 'Veil');
  await member.page.getByTestId('club-templates-search').fill('Veil');
  expect((await searched).status()).toBe(200);
  await expect(member.page.getByTestId('template-card-veil-keeper')).toBeVisible();
  await expect(member.page.getByTestId('template-card-veil-old-timer')).toHaveCount(0);
  await snap(member.page, info, 'clubs-admin-10-member-list');
  await member.page.goto('/clubs');
  await expect(member.page.getByRole('link', { name: c.name })).toContainText('1 template');
  // An old link still opens it, but it can no longer be used.
  await member.page.goto(`${c.url}/templates/${retiring}`);
  await expect(member.page.getByTestId('template-screen')).toContainText('Version 1 · retired');
  await expect(member.page.getByTestId('template-use')).toBeDisabled();
});
