import { randomUUID } from 'node:crypto';
import { expect, type Page, type TestInfo } from '@playwright/test';
import pg from 'pg';

export const PASSWORD = 'night-sky-2026';

export const uniqueEmail = (prefix: string) => `${prefix}-${randomUUID().slice(0, 8)}@e2e.example`;

/** Saves a screenshot under artifacts/screenshots, named by viewport project and step. */
export async function snap(page: Page, info: TestInfo, name: string) {
  await page.screenshot({ path: `artifacts/screenshots/${info.project.name}-${name}.png`, fullPage: false });
}

export async function signUpThroughUi(page: Page, name: string, email: string, password = PASSWORD) {
  await page.goto('/sign-up');
  await page.getByLabel('Name', { exact: true }).fill(name);
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByTestId('sign-up-submit').click();
}

export async function signInThroughUi(page: Page, email: string, password = PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByTestId('sign-in-submit').click();
}

export type Section = 'tonight' | 'targets' | 'setup' | 'calibration' | 'club' | 'account' | 'mail';

/**
 * Opens a section from the tab bar (phone) or side rail (wide): both carry the same testIDs.
 * On phones a section that does not fit the bar sits under "More" (`nav-more`), as Calibration,
 * Club, Account and Mail do.
 */
export async function openSection(page: Page, id: Section) {
  const link = page.getByTestId(`nav-${id}`);
  const more = page.getByTestId('nav-more');
  // Wait for the navigation first: right after a load neither is visible yet, and the check below would skip "More".
  await expect(link.or(more).first()).toBeVisible();
  if (!(await link.isVisible()) && (await more.isVisible())) await more.click();
  await link.click();
}

/** Test fixtures write to the run's own database (never the demo data). */
export async function withDb<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: process.env.E2E_DATABASE_URL });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

export async function makeSiteAdmin(email: string) {
  await withDb((c) => c.query(`UPDATE "user" SET role = 'admin' WHERE email = $1`, [email]));
}

export async function expectSignedIn(page: Page) {
  await expect(page.getByTestId('nav-tonight')).toBeVisible();
}
