import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { cameraFrame, type CameraFrameSpec } from '../helpers/fits';
import { expectSignedIn, openSection, signUpThroughUi, uniqueEmail } from './support';

/*
 * A real night's folder: 300 lights plus one full-size 60 MB frame. The browser reads only the
 * header blocks (file slices), so the one intake request carries about 1.2 MB (one 2,880-byte
 * block per file, base64) instead of the 80 MB the big frame alone would be, and every frame is
 * recorded.
 */

const FULL_FRAME_BYTES = 60 * 1024 * 1024;
const light = (i: number): CameraFrameSpec => ({
  type: 'Light Frame',
  dateObs: new Date(Date.UTC(2026, 9, 14, 19, 0, 0) + i * 65_000).toISOString().slice(0, 19),
  exposureS: 60,
  object: 'NGC 7000',
  filter: i % 2 === 0 ? 'Ha' : 'OIII',
  gain: 100,
  offset: 50,
  binning: 1,
  setTempC: -10,
  sensorTempC: -10,
});

test('a folder of 301 frames, one of them 60 MB, is read by its headers and recorded in one small request', async ({ page }) => {
  test.setTimeout(120_000);
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'nightloom-scale-'));
  for (let i = 0; i < 300; i += 1) fs.writeFileSync(path.join(dir, `L_${String(i).padStart(4, '0')}.fits`), cameraFrame(light(i), { dataBytes: 2_000 }));
  fs.writeFileSync(path.join(dir, 'L_full.fits'), cameraFrame(light(300), { dataBytes: FULL_FRAME_BYTES }));

  await signUpThroughUi(page, 'Pavel Odri', uniqueEmail('scale'));
  await expectSignedIn(page);
  await openSection(page, 'calibration');

  const sent = page.waitForRequest((r) => r.url().endsWith('/api/calibration/intake') && r.method() === 'POST');
  await page.getByTestId('intake-folder-input').setInputFiles(dir);
  const body = (await sent).postDataBuffer();
  // 301 one-block headers as base64 (3,840 characters each) plus names and JSON.
  expect(body).not.toBeNull();
  expect(body!.length).toBeLessThan(301 * 4_000 + 64_000);
  const parsed = JSON.parse(body!.toString('utf8')) as { files: { name: string; headerBase64: string }[] };
  expect(parsed.files).toHaveLength(301);
  expect(Buffer.from(parsed.files.find((f) => f.name.endsWith('L_full.fits'))!.headerBase64, 'base64').length).toBe(2880);
  await expect(page.getByTestId('intake-recorded')).toContainText('Recorded 301 lights', { timeout: 60_000 });
  fs.rmSync(dir, { recursive: true, force: true });
});
