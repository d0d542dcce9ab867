import { expect, test } from '@playwright/test';
import { expectSignedIn, openSection, PASSWORD, signInThroughUi, signUpThroughUi, snap, uniqueEmail } from './support';

test('sign up, add a site, see Tonight, switch the night view, sign out and in again', async ({ page }, info) => {
  const email = uniqueEmail('imager');
  await page.goto('/');
  await expect(page).toHaveURL(/sign-in/);
  await snap(page, info, '01-sign-in');

  await signUpThroughUi(page, 'Mara Quell', email);
  await expectSignedIn(page);
  // No site yet: Tonight invites the user to add one.
  await expect(page.getByTestId('tonight-no-site')).toBeVisible();
  await snap(page, info, '02-tonight-empty');

  await page.getByTestId('tonight-add-site').click();
  await page.getByLabel('Name', { exact: true }).fill('Hollow Pine Clearing');
  await page.getByLabel('Latitude (°)').fill('46.93');
  await page.getByLabel('Longitude (°)').fill('200');
  await page.getByLabel('Elevation (m)').fill('870');
  await page.getByLabel('Time zone').fill('Europe/Zurich');
  await page.getByTestId('site-form-submit').click();
  // Bad longitude: the field error shows and nothing is saved.
  await expect(page.getByText('Longitude is between -180 and 180')).toBeVisible();
  await snap(page, info, '03-site-form-error');
  await page.getByLabel('Longitude (°)').fill('7.62');
  await page.getByTestId('site-form-submit').click();

  await openSection(page, 'tonight');
  await expect(page.getByTestId('tonight-site-name')).toHaveText(/Hollow Pine Clearing/);
  await expect(page.getByTestId('night-band')).toBeVisible();
  await expect(page.getByTestId('tonight-times')).toContainText(/\d\d:\d\d/);
  await snap(page, info, '04-tonight');

  await openSection(page, 'account');
  const nightView = page.getByTestId('night-view-switch');
  await expect(nightView).toHaveAttribute('aria-checked', 'false');
  await nightView.click();
  await expect(nightView).toHaveAttribute('aria-checked', 'true');
  await openSection(page, 'tonight');
  await expect(page.getByTestId('night-band')).toBeVisible();
  await snap(page, info, '05-tonight-night-view');
  // The choice survives a reload.
  await page.reload();
  await openSection(page, 'account');
  await expect(page.getByTestId('night-view-switch')).toHaveAttribute('aria-checked', 'true');
  await page.getByTestId('night-view-switch').click();

  await page.getByTestId('sign-out').click();
  await expect(page).toHaveURL(/sign-in/);
  await signInThroughUi(page, email, 'not-the-password');
  await expect(page.getByTestId('sign-in-error')).toBeVisible();
  await signInThroughUi(page, email, PASSWORD);
  await expectSignedIn(page);
  await expect(page.getByTestId('tonight-site-name')).toHaveText(/Hollow Pine Clearing/);
});
