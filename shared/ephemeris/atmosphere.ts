/**
 * Airmass and refraction: the formula functions, in degrees and arcminutes.
 */

const RAD = Math.PI / 180;

/** The refraction formulas diverge a few degrees below the horizon; they are held at this altitude below it. */
const REFRACTION_FLOOR_DEG = -1;

/**
 * Relative airmass after Kasten & Young 1989 (Applied Optics 28, 4735):
 * X = 1 / [cos z + 0.50572 (96.07995° − z)^−1.6364], z = 90° − apparent altitude.
 * Returns Infinity below the horizon (apparent altitude < 0°).
 */
export function airmassKastenYoung(altitudeDeg: number): number {
  if (altitudeDeg < 0) return Infinity;
  const zenithDeg = 90 - altitudeDeg;
  return 1 / (Math.cos(zenithDeg * RAD) + 0.50572 * Math.pow(96.07995 - zenithDeg, -1.6364));
}

/**
 * Relative airmass after Pickering 2002 (DIO 12): X = 1 / sin(h + 244 / (165 + 47 h^1.1)),
 * h = apparent altitude in degrees. Returns Infinity below the horizon.
 */
export function airmassPickering(altitudeDeg: number): number {
  if (altitudeDeg < 0) return Infinity;
  const h = altitudeDeg;
  return 1 / Math.sin((h + 244 / (165 + 47 * Math.pow(h, 1.1))) * RAD);
}

/**
 * Refraction in arcminutes for an APPARENT (observed) altitude, Bennett 1982 as given in
 * Meeus, Astronomical Algorithms 2nd ed., eq. 16.3: R = cot(h0 + 7.31 / (h0 + 4.4)).
 * Altitudes below −1° are treated as −1°; the result is never negative.
 */
export function refractionBennettArcmin(apparentAltDeg: number): number {
  const h = Math.max(apparentAltDeg, REFRACTION_FLOOR_DEG);
  return Math.max(0, 1 / Math.tan((h + 7.31 / (h + 4.4)) * RAD));
}

/**
 * Refraction in arcminutes for a TRUE (airless, geometric) altitude, Saemundsson 1986 as given
 * in Meeus, Astronomical Algorithms 2nd ed., eq. 16.4: R = 1.02 cot(h + 10.3 / (h + 5.11)).
 * Altitudes below −1° are treated as −1°; the result is never negative.
 */
export function refractionSaemundssonArcmin(trueAltDeg: number): number {
  const h = Math.max(trueAltDeg, REFRACTION_FLOOR_DEG);
  return Math.max(0, 1.02 / Math.tan((h + 10.3 / (h + 5.11)) * RAD));
}
