import type { CameraLink, RigInput } from '@/shared/rig/schema';

/** Arcseconds per radian divided by 1000 (µm per mm): the "206.265" of the pixel-scale formula. */
export const ARCSEC_PER_RAD_PER_1000 = (180 / Math.PI) * 3.6;

/** Link rates of trade-defaults.md "download" (S7, opto-e.com/basics/usb-3-0), bytes per second. */
export const LINK_BYTES_PER_S = { usb3: 250e6, usb2: 35e6 } as const;
/** Fixed per-frame overhead of the download model in trade-defaults.md (S7). */
export const DOWNLOAD_OVERHEAD_S = 0.3;

const RAD_TO_DEG = 180 / Math.PI;
const DEG_TO_RAD = Math.PI / 180;

/** Effective focal length with a reducer (< 1) or barlow (> 1): f_eff = f × factor. */
export function effectiveFocalLengthMm(focalLengthMm: number, reducerFactor = 1): number {
  return focalLengthMm * reducerFactor;
}

/** Focal ratio N = f_eff / D (aperture is unchanged by a reducer or barlow). */
export function focalRatio(focalLengthMm: number, apertureMm: number, reducerFactor = 1): number {
  return effectiveFocalLengthMm(focalLengthMm, reducerFactor) / apertureMm;
}

/**
 * Image scale in arcsec per pixel: 206.265 × p[µm] / f[mm] (checks.md "Definitions";
 * 206.265 = arcsec per radian / 1000). Example (checks.md, computed): 3.76 µm at 530 mm → 1.4633″/px.
 */
export function pixelScaleArcsecPerPx(pixelSizeUm: number, focalLengthMm: number): number {
  return (ARCSEC_PER_RAD_PER_1000 * pixelSizeUm) / focalLengthMm;
}

/**
 * Field of view along one sensor axis, degrees: 2·atan(N·p / 2f) with N pixels of p µm at
 * f mm (checks.md "Definitions"). Example: 6248 px × 3.76 µm at 530 mm → 2.5392°.
 */
export function fieldOfViewDeg(sizePx: number, pixelSizeUm: number, focalLengthMm: number): number {
  const halfSizeMm = (sizePx * pixelSizeUm * 1e-3) / 2;
  return 2 * Math.atan(halfSizeMm / focalLengthMm) * RAD_TO_DEG;
}

/**
 * Solid angle of a rectangular field of full angles a × b, in square degrees:
 * Ω = 4·asin(sin(a/2)·sin(b/2)) sr (solid angle of a right rectangular pyramid at its apex),
 * × (180/π)². Close to a·b for small fields; a 90° × 90° field is one cube face, 4π/6 sr.
 */
export function skyAreaDeg2(widthDeg: number, heightDeg: number): number {
  const sr = 4 * Math.asin(Math.sin((widthDeg * DEG_TO_RAD) / 2) * Math.sin((heightDeg * DEG_TO_RAD) / 2));
  return sr * RAD_TO_DEG * RAD_TO_DEG;
}

/**
 * Time to download one frame, seconds (trade-defaults.md "download", S7):
 * bytes per pixel × pixels ÷ link rate + 0.3 s, with USB 3 ≈ 250 MB/s and USB 2 ≈ 35 MB/s;
 * 2 bytes per pixel above 8 bits. A measured link returns the measured time as is.
 * Example (trade-defaults.md): a 26 MP 16-bit sensor on USB 3 ≈ 0.5 s.
 */
export function downloadTimeS(pixels: number, link: CameraLink, bitDepth = 16): number {
  if (typeof link === 'object') return link.measuredDownloadS;
  const bytes = (bitDepth <= 8 ? 1 : 2) * pixels;
  return bytes / LINK_BYTES_PER_S[link] + DOWNLOAD_OVERHEAD_S;
}

/** Download time of one frame of a rig's main camera at a binning (pixels ÷ binning²). */
export function cameraDownloadTimeS(camera: RigInput['camera'], binning = 1): number {
  const pixels = (camera.sensorWidthPx * camera.sensorHeightPx) / (binning * binning);
  return downloadTimeS(pixels, camera.link, camera.bitDepth);
}

/** Guide camera scale, arcsec per guide pixel: 206.265 × p / f (checks.md "Definitions"). */
export function guidePixelScaleArcsecPerPx(guider: Pick<RigInput['guider'], 'pixelSizeUm' | 'focalLengthMm'>): number {
  return pixelScaleArcsecPerPx(guider.pixelSizeUm, guider.focalLengthMm);
}

/**
 * A dither given in main-camera pixels expressed in guide-camera pixels:
 * d_guide = d_main × scale_main / scale_guide (the same angle on the sky).
 */
export function ditherMainPxToGuidePx(ditherMainPx: number, mainScaleArcsecPerPx: number, guideScaleArcsecPerPx: number): number {
  return (ditherMainPx * mainScaleArcsecPerPx) / guideScaleArcsecPerPx;
}

export interface RigImaging {
  effectiveFocalLengthMm: number;
  focalRatio: number;
  pixelScaleArcsecPerPx: number;
  fieldWidthDeg: number;
  fieldHeightDeg: number;
  skyAreaDeg2: number;
  fullFrameDownloadS: number;
  guidePixelScaleArcsecPerPx: number;
}

/** The derived numbers a rig page shows, from the formulas above (binning 1). */
export function rigImaging(rig: RigInput): RigImaging {
  const f = effectiveFocalLengthMm(rig.optics.focalLengthMm, rig.optics.reducerFactor);
  const { camera } = rig;
  const fieldWidthDeg = fieldOfViewDeg(camera.sensorWidthPx, camera.pixelSizeUm, f);
  const fieldHeightDeg = fieldOfViewDeg(camera.sensorHeightPx, camera.pixelSizeUm, f);
  return {
    effectiveFocalLengthMm: f,
    focalRatio: focalRatio(rig.optics.focalLengthMm, rig.optics.apertureMm, rig.optics.reducerFactor),
    pixelScaleArcsecPerPx: pixelScaleArcsecPerPx(camera.pixelSizeUm, f),
    fieldWidthDeg,
    fieldHeightDeg,
    skyAreaDeg2: skyAreaDeg2(fieldWidthDeg, fieldHeightDeg),
    fullFrameDownloadS: cameraDownloadTimeS(camera),
    guidePixelScaleArcsecPerPx: guidePixelScaleArcsecPerPx(rig.guider),
  };
}
