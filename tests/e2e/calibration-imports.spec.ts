import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { cameraFrame, type CameraFrameSpec } from '../helpers/fits';
import { expectSignedIn, openSection, signUpThroughUi, snap, uniqueEmail } from './support';

/*
 * "Imports": a folder of synthetic lights of four objects over two nights (and two darks) is
 * imported, then a single dark; the Imports list shows both, newest first, with counts, nights
 * and objects. Removing the folder's import (after a confirmation naming its counts) takes its
 * frames out of the capture history.
 */

const lightOf = (object: string, dateObs: string): CameraFrameSpec => ({ type: 'Light Frame', dateObs, exposureS: 180, object, filter: 'L', gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10 });
const dark = (dateObs: string): CameraFrameSpec => ({ type: 'Dark Frame', dateObs, exposureS: 180, gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10 });

function writeFiles(): { dir: string; single: string } {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'nightloom-imports-'));
  const dir = path.join(root, 'wrong-folder');
  fs.mkdirSync(dir);
  const write = (file: string, spec: CameraFrameSpec) => fs.writeFileSync(file, cameraFrame(spec, { dataBytes: 5_000 }));
  // UTC evenings of 8 and 9 Oct 2026: the nights of the 8th and the 9th at a Zurich site.
  write(path.join(dir, 'M31_1.fits'), lightOf('M 31', '2026-10-08T20:00:00'));
  write(path.join(dir, 'M31_2.fits'), lightOf('M 31', '2026-10-08T20:05:00'));
  write(path.join(dir, 'M33_1.fits'), lightOf('M 33', '2026-10-08T22:00:00'));
  write(path.join(dir, 'NGC891_1.fits'), lightOf('NGC 891', '2026-10-09T20:00:00'));
  write(path.join(dir, 'IC1396_1.fits'), lightOf('IC 1396', '2026-10-09T21:00:00'));
  write(path.join(dir, 'dark_1.fits'), dark('2026-10-10T09:00:00'));
  write(path.join(dir, 'dark_2.fits'), dark('2026-10-10T09:05:00'));
  const single = path.join(root, 'dark_later.fits');
  write(single, dark('2026-10-20T09:00:00'));
  return { dir, single };
}

async function showPart(page: Page, part: 'frames' | 'history', isPhone: boolean) {
  if (isPhone) await page.getByTestId(`calibration-tab-${part}`).click();
}

test('past imports are listed with what they recorded, and removing one takes its frames out of the history', async ({ page }, info) => {
  test.setTimeout(90_000);
  const isPhone = info.project.name === 'phone';
  const { dir, single } = writeFiles();

  await signUpThroughUi(page, 'Ilse Marwick', uniqueEmail('imports'));
  await expectSignedIn(page);
  const site = await page.evaluate(async () => {
    const res = await fetch('/api/sites', { method: 'POST', credentials: 'include', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ name: 'Ridge', latitudeDeg: 47, longitudeDeg: 8, elevationM: 600, timeZone: 'Europe/Zurich', isDefault: true }) });
    return res.status;
  });
  expect(site).toBe(201);

  await openSection(page, 'calibration');
  await showPart(page, 'frames', isPhone);
  await expect(page.getByTestId('imports-empty')).toBeVisible();
  await page.getByTestId('intake-folder-input').setInputFiles(dir);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 5 lights and 2 darks');
  await page.getByTestId('intake-again').click();
  await page.getByTestId('intake-files-input').setInputFiles([single]);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 1 dark');

  // Newest first: the single dark, then the folder with its nights and objects.
  const rows = page.getByTestId('imports-list').getByRole('listitem');
  await expect(rows).toHaveCount(2);
  await expect(rows.nth(0).getByTestId('import-counts')).toHaveText('1 dark');
  await expect(rows.nth(0).getByTestId('import-objects')).toHaveCount(0);
  const folder = rows.nth(1);
  await expect(folder.getByTestId('import-counts')).toHaveText('5 lights and 2 darks');
  await expect(folder.getByTestId('import-nights')).toHaveText('Thu 8 Oct 2026 – Fri 9 Oct 2026');
  await expect(folder.getByTestId('import-objects')).toHaveText('IC 1396, M 31, M 33 and 1 more');
  await expect(folder.getByTestId('import-when')).toHaveText(/^\d{1,2} [A-Z][a-z]{2} \d{4}, \d{2}:\d{2}$/);
  await page.getByTestId('imports-section').scrollIntoViewIfNeeded();
  await snap(page, info, 'imports-01-list');

  await showPart(page, 'history', isPhone);
  await expect(page.getByTestId('history-row-unmatched')).toHaveCount(4);

  // Remove the wrong folder: the confirmation names the counts; "Keep" leaves it.
  await showPart(page, 'frames', isPhone);
  await folder.getByTestId('import-remove').click();
  const dialog = page.getByRole('alertdialog', { name: 'Remove these frames?' });
  await expect(dialog).toContainText('Remove 5 lights and 2 darks of this import');
  await dialog.scrollIntoViewIfNeeded();
  await snap(page, info, 'imports-02-confirm');
  await dialog.getByTestId('import-keep').click();
  await expect(dialog).toHaveCount(0);
  await folder.getByTestId('import-remove').click();
  await page.getByRole('alertdialog').getByTestId('import-remove-confirm').click();
  await expect(rows).toHaveCount(1);
  await expect(rows.first().getByTestId('import-counts')).toHaveText('1 dark');

  await showPart(page, 'history', isPhone);
  await expect(page.getByTestId('history-empty')).toBeVisible();
  await expect(page.getByTestId('history-row-unmatched')).toHaveCount(0);
  await snap(page, info, 'imports-03-removed');

  // The last import (still shown in the result panel) removed from the list: the panel's own
  // undo then finds nothing left to undo and says so, without an error.
  await showPart(page, 'frames', isPhone);
  await rows.first().getByTestId('import-remove').click();
  await page.getByRole('alertdialog').getByTestId('import-remove-confirm').click();
  await expect(page.getByTestId('imports-empty')).toBeVisible();
  await page.getByTestId('intake-undo').click();
  await expect(page.getByTestId('intake-undone')).toContainText('Import undone');
  await expect(page.getByTestId('intake-undo-error')).toHaveCount(0);
});
