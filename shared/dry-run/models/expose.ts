import { cameraDownloadTimeS } from '@/shared/rig/optics';
import type { RigInput } from '@/shared/rig/schema';

/*
 * Light frames (dry-run.md "expose"): count × (exposure + download) + a dither settle every
 * `ditherEvery` frames + the filter change (see focus.ts `filterChangeS`).
 */

export const DITHER_MODEL = {
  /** Guide pulses of the dither move itself and the first guide frames after it, seconds (common practice). */
  moveS: 2,
} as const;

/**
 * Seconds per frame: exposure + download. Download (trade-defaults.md "download", S7):
 * 2 bytes × pixels ÷ link + 0.3 s; a 26 MP 16-bit sensor on USB 3 ≈ 0.5 s.
 */
export function frameS(exposureS: number, binning: number, camera: RigInput['camera']): number {
  return exposureS + cameraDownloadTimeS(camera, binning);
}

/**
 * Seconds for one dither: the move plus the guider's minimum settle time when guiding
 * (trade-defaults.md "dither": settle 1.5 px, min time 10 s, timeout 60 s; practice; S4), or
 * the move plus the mount's settle time when unguided.
 */
export function ditherS(guiding: boolean, settleTimeS: number, mountSettleS: number): number {
  return DITHER_MODEL.moveS + (guiding ? settleTimeS : mountSettleS);
}

/** True when a dither is due before the next frame: `ditherEvery` frames since the last one (0 = never). */
export function ditherDue(framesSinceDither: number, ditherEvery: number): boolean {
  return ditherEvery > 0 && framesSinceDither >= ditherEvery;
}

/**
 * Seconds for a whole uninterrupted block: n × (exposure + download) + dithers between frames
 * + one filter change. A check value for the models' tests; the engine runs frame by frame.
 */
export function exposeBlockS(n: number, exposureS: number, downloadS: number, ditherEvery: number, ditherEachS: number, filterChange: number): number {
  const dithers = ditherEvery > 0 ? Math.floor((n - 1) / ditherEvery) : 0;
  return n * (exposureS + downloadS) + dithers * ditherEachS + filterChange;
}
