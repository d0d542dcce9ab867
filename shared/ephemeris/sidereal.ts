import { SiderealTime } from 'astronomy-engine';

/** Unix epoch milliseconds of J2000.0 (2000-01-01 12:00 UT). */
const J2000_MS = Date.UTC(2000, 0, 1, 12);
const DAY_MS = 86_400_000;

/** Ratio of a mean solar day to a sidereal day (Meeus, Astronomical Algorithms, ch. 12). */
export const SIDEREAL_PER_SOLAR = 1.00273790935;

/** Wraps hours into [0, 24). */
export function wrapHours24(hours: number): number {
  return ((hours % 24) + 24) % 24;
}

/** Wraps hours into [-12, 12). */
export function wrapHours12(hours: number): number {
  return wrapHours24(hours + 12) - 12;
}

/**
 * Greenwich mean sidereal time in hours [0, 24), IAU 1982 expression in the form of
 * Meeus, Astronomical Algorithms 2nd ed., eq. 12.4:
 * θ0 = 280.46061837° + 360.98564736629° d + 0.000387933° T² − T³/38710000°,
 * d = days of UT from J2000.0, T = d / 36525. `Date` is taken as UT.
 */
export function greenwichMeanSiderealTimeH(date: Date): number {
  const d = (date.getTime() - J2000_MS) / DAY_MS;
  const t = d / 36525;
  // 360° × d is split off first: only its fraction of a turn matters, and dropping the whole
  // turns keeps the sum small enough for sub-millisecond precision.
  const fractionOfDay = d - Math.floor(d);
  const deg = 280.46061837 + 360 * fractionOfDay + 0.98564736629 * d + 0.000387933 * t * t - (t * t * t) / 38710000;
  return wrapHours24(deg / 15);
}

/**
 * Greenwich apparent sidereal time in hours [0, 24): mean sidereal time plus the equation of
 * the equinoxes (nutation in right ascension), from astronomy-engine's `SiderealTime`
 * (IAU 2006 Earth rotation angle with IAU 2000B nutation).
 */
export function greenwichApparentSiderealTimeH(date: Date): number {
  return SiderealTime(date);
}

/**
 * Local apparent sidereal time in hours [0, 24): Greenwich apparent sidereal time plus the
 * east longitude in hours (Meeus, Astronomical Algorithms, ch. 12–13).
 */
export function localApparentSiderealTimeH(date: Date, longitudeDeg: number): number {
  return wrapHours24(greenwichApparentSiderealTimeH(date) + longitudeDeg / 15);
}
