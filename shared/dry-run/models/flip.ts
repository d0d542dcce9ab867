/*
 * Meridian flip (dry-run.md "meridian flip"; trade-defaults.md "flip cost": 5 min, 3–12 min:
 * slew, centre, guide restart, optional refocus). Each part comes from its own model; this
 * module only adds them up and converts hour angles to clock time.
 */

import { SIDEREAL_PER_SOLAR } from '@/shared/ephemeris/sidereal';

export interface FlipParts {
  slewS: number;
  centreS: number;
  rotateS: number;
  guideS: number;
  focusS: number;
}

/** Total seconds of a flip: slew + centre + rotate back (if asked) + guide restart + refocus (if asked). */
export function flipCostS(p: FlipParts): number {
  return p.slewS + p.centreS + p.rotateS + p.guideS + p.focusS;
}

/**
 * Clock milliseconds after transit at which the hour angle reaches `minutesPast` minutes
 * (hour angle runs at the sidereal rate, 1.0027379 h per solar hour; Meeus ch. 12).
 */
export function msAfterTransit(minutesPast: number): number {
  return (minutesPast * 60_000) / SIDEREAL_PER_SOLAR;
}
