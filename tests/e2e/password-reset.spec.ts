import { expect, test } from '@playwright/test';
import { expectSignedIn, makeSiteAdmin, openSection, signInThroughUi, signUpThroughUi, snap, uniqueEmail } from './support';

test('a forgotten password is reset through the e-mailed link, read on the admin mail page', async ({ browser }, info) => {
  const forgetful = uniqueEmail('forgetful');
  const adminEmail = uniqueEmail('admin');

  // Someone who forgot their password asks for a link.
  const visitor = await browser.newPage({ viewport: info.project.use.viewport ?? undefined });
  await signUpThroughUi(visitor, 'Ode Farrow', forgetful);
  await expectSignedIn(visitor);
  await openSection(visitor, 'account');
  await visitor.getByTestId('sign-out').click();
  await visitor.goto('/forgot-password');
  await visitor.getByLabel('Email', { exact: true }).fill(forgetful);
  await visitor.getByTestId('forgot-submit').click();
  await expect(visitor.getByTestId('reset-requested')).toBeVisible();

  // A plain user has no Mail page; a site administrator has.
  const admin = await browser.newPage({ viewport: info.project.use.viewport ?? undefined });
  await signUpThroughUi(admin, 'Site Keeper', adminEmail);
  await expectSignedIn(admin);
  await expect(admin.getByTestId('nav-mail')).toHaveCount(0);
  await makeSiteAdmin(adminEmail);
  await admin.reload();
  await openSection(admin, 'mail');
  const link = admin.getByRole('link', { name: /\/api\/auth\/reset-password\// }).first();
  await expect(link).toBeVisible();
  await snap(admin, info, '06-mail');
  const href = await link.getAttribute('href');
  expect(href).toBeTruthy();

  // The visitor follows the link and chooses a new password.
  await visitor.goto(href!);
  await expect(visitor).toHaveURL(/reset-password\?token=/);
  await visitor.getByLabel('New password', { exact: true }).fill('fresh-start-2026');
  await visitor.getByLabel('Repeat new password', { exact: true }).fill('fresh-start-2026');
  await visitor.getByTestId('reset-submit').click();
  await expect(visitor.getByTestId('reset-done')).toBeVisible();
  await snap(visitor, info, '07-reset-done');
  await signInThroughUi(visitor, forgetful, 'fresh-start-2026');
  await expectSignedIn(visitor);
});
