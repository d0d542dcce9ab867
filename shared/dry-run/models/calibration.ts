import { cameraDownloadTimeS } from '@/shared/rig/optics';
import type { RigInput } from '@/shared/rig/schema';

/*
 * Flats and darks (trade-defaults.md "calibration").
 */

export const FLAT_MODEL = {
  /** Panel flat exposure: ≥1 s (S21). */
  panelExposureS: 1,
  /** Sky flat exposure: a few seconds as the sky darkens (common practice; S21: ≥3 s with a mechanical shutter). */
  skyExposureS: 3,
  /** Sky-flat windows, Sun altitude in degrees (trade-defaults.md "sky-flat window": practice; S19, S20). */
  duskWindow: { fromDeg: -4, toDeg: -10 },
  dawnWindow: { fromDeg: -10, toDeg: -7 },
} as const;

/**
 * Seconds for flats: per filter, count × (exposure + download), plus a filter change per filter
 * (trade-defaults.md rule 5: count × (exposure + download) over all filters).
 */
export function flatsDurationS(source: 'panel' | 'sky', filters: number, count: number, rig: Pick<RigInput, 'camera' | 'filterWheel'>): { exposureS: number; durationS: number } {
  const exposureS = source === 'sky' ? FLAT_MODEL.skyExposureS : FLAT_MODEL.panelExposureS;
  const perFilter = count * (exposureS + cameraDownloadTimeS(rig.camera, 1)) + rig.filterWheel.changeTimeS;
  return { exposureS, durationS: filters * perFilter };
}

/** Seconds for darks: count × Σ(exposure + download) over the exposures (S44, S18: 30 per set). */
export function darksDurationS(exposuresS: readonly number[], count: number, binning: number, camera: RigInput['camera']): number {
  const download = cameraDownloadTimeS(camera, binning);
  return exposuresS.reduce((sum, e) => sum + count * (e + download), 0);
}
