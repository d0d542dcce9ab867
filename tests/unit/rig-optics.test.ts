import { describe, expect, it } from 'vitest';
import {
  cameraDownloadTimeS,
  ditherMainPxToGuidePx,
  downloadTimeS,
  effectiveFocalLengthMm,
  fieldOfViewDeg,
  focalRatio,
  guidePixelScaleArcsecPerPx,
  pixelScaleArcsecPerPx,
  rigImaging,
  skyAreaDeg2,
} from '@/shared/rig/optics';
import { defaultRigInput } from '@/shared/rig/schema';

describe('image scale and field (checks.md "Definitions")', () => {
  it('3.76 µm at 530 mm → 1.4633″/px (checks.md, computed)', () => {
    expect(pixelScaleArcsecPerPx(3.76, 530)).toBeCloseTo(1.4633, 4);
  });

  it('6248 × 4176 px of 3.76 µm at 530 mm → 2.5392° × 1.6973° (checks.md, computed)', () => {
    expect(fieldOfViewDeg(6248, 3.76, 530)).toBeCloseTo(2.5392, 4);
    expect(fieldOfViewDeg(4176, 3.76, 530)).toBeCloseTo(1.6973, 4);
  });

  it('effective focal length and focal ratio with a 0.8× reducer', () => {
    expect(effectiveFocalLengthMm(530, 0.8)).toBeCloseTo(424, 10);
    expect(focalRatio(530, 106)).toBeCloseTo(5, 10);
    expect(focalRatio(530, 106, 0.8)).toBeCloseTo(4, 10);
  });

  it('sky area: about width × height for a small field; a 90° × 90° field is one cube face (4π/6 sr)', () => {
    const w = fieldOfViewDeg(6248, 3.76, 530);
    const h = fieldOfViewDeg(4176, 3.76, 530);
    expect(skyAreaDeg2(w, h) / (w * h)).toBeCloseTo(1, 3);
    const sphereDeg2 = 4 * Math.PI * (180 / Math.PI) ** 2;
    expect(skyAreaDeg2(90, 90)).toBeCloseTo(sphereDeg2 / 6, 8);
  });
});

describe('downloadTimeS (trade-defaults.md "download", S7)', () => {
  const pixels = 6248 * 4176; // 26.1 MP

  it('a 26 MP 16-bit sensor on USB 3 ≈ 0.5 s (trade-defaults.md, S7)', () => {
    expect(downloadTimeS(pixels, 'usb3', 16)).toBeCloseTo(0.5, 1);
    expect(downloadTimeS(pixels, 'usb3', 16)).toBeCloseTo((2 * pixels) / 250e6 + 0.3, 12);
  });

  it('USB 2 at 35 MB/s (computed from the same model: ≈ 1.79 s)', () => {
    expect(downloadTimeS(pixels, 'usb2', 16)).toBeCloseTo((2 * pixels) / 35e6 + 0.3, 12);
    expect(downloadTimeS(pixels, 'usb2', 16)).toBeCloseTo(1.79, 2);
  });

  it('8-bit frames move one byte per pixel; a measured link wins', () => {
    expect(downloadTimeS(1e6, 'usb2', 8)).toBeCloseTo(1e6 / 35e6 + 0.3, 12);
    expect(downloadTimeS(pixels, { measuredDownloadS: 2.5 })).toBe(2.5);
  });

  it('binning reduces the pixels sent', () => {
    const camera = defaultRigInput().camera;
    expect(cameraDownloadTimeS(camera, 2)).toBeCloseTo((2 * pixels) / 4 / 250e6 + 0.3, 12);
  });
});

describe('guide camera', () => {
  it('guide scale 3.75 µm at 200 mm ≈ 3.8675″/px (computed, 206.265 p / f)', () => {
    expect(guidePixelScaleArcsecPerPx({ pixelSizeUm: 3.75, focalLengthMm: 200 })).toBeCloseTo(3.8675, 4);
  });

  it('a 5 px dither on the main camera is the same angle in guide pixels', () => {
    const main = pixelScaleArcsecPerPx(3.76, 530);
    const guide = pixelScaleArcsecPerPx(3.75, 200);
    const guidePx = ditherMainPxToGuidePx(5, main, guide);
    expect(guidePx * guide).toBeCloseTo(5 * main, 12);
    expect(guidePx).toBeCloseTo(1.8918, 4);
  });
});

describe('rigImaging', () => {
  it('summarises the default rig', () => {
    const s = rigImaging(defaultRigInput());
    expect(s.effectiveFocalLengthMm).toBe(530);
    expect(s.focalRatio).toBeCloseTo(5, 10);
    expect(s.pixelScaleArcsecPerPx).toBeCloseTo(1.4633, 4);
    expect(s.fieldWidthDeg).toBeCloseTo(2.5392, 4);
    expect(s.fieldHeightDeg).toBeCloseTo(1.6973, 4);
    expect(s.skyAreaDeg2).toBeCloseTo(4.31, 2);
    expect(s.fullFrameDownloadS).toBeCloseTo(0.5, 1);
  });
});
