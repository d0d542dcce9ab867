import type { FilterBand } from '@/shared/rig/schema';

/*
 * Moon avoidance (trade-defaults.md "moon separation": D / (1 + (age/W)²), S40 for the formula;
 * broadband D 120°, W 14 d; narrowband D 40°, W 7 d, common practice).
 */

export interface MoonAvoidance {
  /** D: separation wanted at full Moon, degrees. */
  separationDeg: number;
  /** W: width in days. */
  widthDays: number;
}

export const MOON_AVOIDANCE_DEFAULTS: Record<'broadband' | 'narrowband', MoonAvoidance> = {
  broadband: { separationDeg: 120, widthDays: 14 },
  narrowband: { separationDeg: 40, widthDays: 7 },
};

/** Synodic month, days (mean lunation). */
export const SYNODIC_MONTH_DAYS = 29.530589;

/** Narrowband bands tolerate moonlight and −12° twilight (trade-defaults.md "darkness"). */
export function isNarrowband(band: FilterBand): boolean {
  return band === 'Ha' || band === 'OIII' || band === 'SII';
}

/** Days from full Moon for an ecliptic phase angle (0 new, 180 full): |phase − 180| / 360 × synodic month. */
export function daysFromFullMoon(phaseDeg: number): number {
  return (Math.abs(phaseDeg - 180) / 360) * SYNODIC_MONTH_DAYS;
}

/**
 * Separation wanted from the Moon, degrees: D / (1 + (age / W)²), age in days from full Moon
 * (S40). Example: broadband at full Moon → 120°; 7 days from full → 120 / 1.25 = 96°.
 */
export function requiredMoonSeparationDeg(daysFromFull: number, p: MoonAvoidance): number {
  return p.separationDeg / (1 + (daysFromFull / p.widthDays) ** 2);
}
