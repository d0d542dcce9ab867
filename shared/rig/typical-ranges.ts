import type { RigInput } from '@/shared/rig/schema';

/** A usual range from trade-defaults.md, with its basis as given there. */
export interface TypicalRange {
  path: string;
  label: string;
  unit: string;
  min: number;
  max: number;
  basis: string;
  read: (rig: RigInput) => number;
  /** When the field matters at all (e.g. guider settings only with a guider). */
  applies?: (rig: RigInput) => boolean;
}

const withGuider = (r: RigInput) => r.guider.present;

/**
 * Usual ranges of trade-defaults.md for rig fields. Values outside are allowed (real hardware
 * varies) but worth a hint beside the field.
 */
export const RIG_TYPICAL_RANGES: readonly TypicalRange[] = [
  { path: 'camera.cooling.maxDeltaBelowAmbientC', label: 'Largest drop below ambient', unit: '°C', min: 25, max: 40, basis: 'S2', read: (r) => r.camera.cooling.maxDeltaBelowAmbientC },
  { path: 'camera.cooling.rateCPerMin', label: 'Cooling rate', unit: '°C/min', min: 1, max: 10, basis: 'practice; S3', read: (r) => r.camera.cooling.rateCPerMin },
  { path: 'mount.maxSlewRateDegPerS.axis1', label: 'Slew rate of axis 1', unit: '°/s', min: 2.5, max: 6.5, basis: 'practice', read: (r) => r.mount.maxSlewRateDegPerS.axis1 },
  { path: 'mount.maxSlewRateDegPerS.axis2', label: 'Slew rate of axis 2', unit: '°/s', min: 2.5, max: 6.5, basis: 'practice', read: (r) => r.mount.maxSlewRateDegPerS.axis2 },
  { path: 'mount.accelerationS', label: 'Time to full slew rate', unit: 's', min: 0.5, max: 3, basis: 'common practice', read: (r) => r.mount.accelerationS },
  { path: 'mount.settleS', label: 'Settle time', unit: 's', min: 2, max: 30, basis: 'practice; S9', read: (r) => r.mount.settleS },
  { path: 'mount.meridian.flipDelayS', label: 'Flip delay', unit: 's', min: 0, max: 1800, basis: 'practice; S39', read: (r) => r.mount.meridian.flipDelayS, applies: (r) => r.mount.type === 'german-equatorial' },
  { path: 'guider.settlePx', label: 'Settle threshold', unit: 'px', min: 0.5, max: 1.5, basis: 'practice; S4', read: (r) => r.guider.settlePx, applies: withGuider },
  { path: 'guider.settleTimeS', label: 'Settle time', unit: 's', min: 5, max: 15, basis: 'practice; S4', read: (r) => r.guider.settleTimeS, applies: withGuider },
  { path: 'guider.settleTimeoutS', label: 'Settle timeout', unit: 's', min: 40, max: 120, basis: 'practice; S4', read: (r) => r.guider.settleTimeoutS, applies: withGuider },
  { path: 'guider.startS', label: 'Guiding start time', unit: 's', min: 60, max: 300, basis: 'S10, S11', read: (r) => r.guider.startS, applies: withGuider },
];

export interface UnusualRigValue {
  path: string;
  value: number;
  min: number;
  max: number;
  basis: string;
  message: string;
}

/** Fields of a valid rig outside the usual ranges of trade-defaults.md (advice, not errors). */
export function unusualRigValues(rig: RigInput): UnusualRigValue[] {
  const out: UnusualRigValue[] = [];
  for (const t of RIG_TYPICAL_RANGES) {
    if (t.applies && !t.applies(rig)) continue;
    const value = t.read(rig);
    if (value >= t.min && value <= t.max) continue;
    const message = `${t.label} of ${value} ${t.unit} is outside the usual ${t.min}–${t.max} ${t.unit} (${t.basis})`;
    out.push({ path: t.path, value, min: t.min, max: t.max, basis: t.basis, message });
  }
  return out;
}
