import type { MountType, RigInput } from '@/shared/rig/schema';

/*
 * Slew durations (dry-run.md "slew"): each axis follows a trapezoidal velocity profile,
 * the slower axis decides, then the mount settles. Defaults from the rig: max rate 3.5 °/s,
 * 1 s to full rate, settle 5 s (trade-defaults.md "slew": practice; S9; acceleration common practice).
 */

export type PierSide = 'east' | 'west';

/** Where the mount points, in both frames (equator of date and horizon). */
export interface MountPosition {
  haH: number;
  decDeg: number;
  altDeg: number;
  azDeg: number;
  /** The park (home) position: counterweight down on an equatorial mount. */
  park?: boolean;
}

/** Mechanical angles of the two axes: axis 1 = RA (or azimuth), axis 2 = Dec (or altitude). */
export interface AxisAngles {
  axis1Deg: number;
  axis2Deg: number;
}

type SlewMount = Pick<RigInput['mount'], 'type' | 'maxSlewRateDegPerS' | 'accelerationS' | 'settleS'>;

const wrap180 = (deg: number) => ((((deg + 180) % 360) + 360) % 360) - 180;

/**
 * Seconds for one axis to turn `distanceDeg` from rest to rest: accelerate to `maxRateDegPerS`
 * over `timeToFullRateS` (a = v / tₐ), cruise, decelerate. Long moves take d / v + tₐ; moves
 * shorter than v·tₐ never reach full rate and take 2·√(d / a) (a triangular profile).
 * Example: 90° at 3.5 °/s with 1 s to full rate → 90 / 3.5 + 1 = 26.714 s.
 */
export function axisMoveS(distanceDeg: number, maxRateDegPerS: number, timeToFullRateS: number): number {
  const d = Math.abs(distanceDeg);
  if (d === 0) return 0;
  if (timeToFullRateS <= 0) return d / maxRateDegPerS;
  const rampDeg = maxRateDegPerS * timeToFullRateS;
  if (d >= rampDeg) return d / maxRateDegPerS + timeToFullRateS;
  const accel = maxRateDegPerS / timeToFullRateS;
  return 2 * Math.sqrt(d / accel);
}

/**
 * Axis angles of a position. German equatorial: axis 1 = 15·H + 90° with the tube west of the
 * pier (looking east, before the meridian) and 15·H − 90° east of it, so both sides stay in
 * the counterweight-down range −90..90° and a flip turns axis 1 by 180°; axis 2 = δ on the west
 * side and 180° − δ on the east side (through the pole). Fork: H and δ. Alt-az: azimuth and
 * altitude. The park position of an equatorial mount is counterweight down (axis 1 = 0).
 */
export function mountAxes(type: MountType, pos: MountPosition, pier: PierSide | null): AxisAngles {
  if (type === 'alt-az') return { axis1Deg: pos.azDeg, axis2Deg: pos.altDeg };
  if (type === 'fork') return { axis1Deg: pos.park ? 0 : wrap180(pos.haH * 15), axis2Deg: pos.decDeg };
  if (pos.park) return { axis1Deg: 0, axis2Deg: pos.decDeg };
  const ha = wrap180(pos.haH * 15);
  return pier === 'east' ? { axis1Deg: ha - 90, axis2Deg: 180 - pos.decDeg } : { axis1Deg: ha + 90, axis2Deg: pos.decDeg };
}

/** Degrees each axis turns between two positions (azimuth and fork hour angle the short way round). */
export function axisDistancesDeg(type: MountType, from: AxisAngles, to: AxisAngles): [number, number] {
  const d1 = type === 'german-equatorial' ? to.axis1Deg - from.axis1Deg : wrap180(to.axis1Deg - from.axis1Deg);
  return [Math.abs(d1), Math.abs(to.axis2Deg - from.axis2Deg)];
}

/**
 * Seconds to slew between two axis positions: the slower axis's trapezoid (`axisMoveS`) plus
 * the settle time when `settle` (a park needs none). Example (trade-defaults.md defaults):
 * 90° on one axis → 26.714 s + 5 s settle = 31.714 s.
 */
export function slewDurationS(from: AxisAngles, to: AxisAngles, mount: SlewMount, settle = true): number {
  const [d1, d2] = axisDistancesDeg(mount.type, from, to);
  const t1 = axisMoveS(d1, mount.maxSlewRateDegPerS.axis1, mount.accelerationS);
  const t2 = axisMoveS(d2, mount.maxSlewRateDegPerS.axis2, mount.accelerationS);
  const move = Math.max(t1, t2);
  return move === 0 ? 0 : move + (settle ? mount.settleS : 0);
}

/** Seconds for a small correction of `errorArcsec` (centring, dithering large moves): one axis plus settle. */
export function correctionSlewS(errorArcsec: number, mount: SlewMount): number {
  const deg = errorArcsec / 3600;
  return axisMoveS(deg, Math.min(mount.maxSlewRateDegPerS.axis1, mount.maxSlewRateDegPerS.axis2), mount.accelerationS) + mount.settleS;
}
