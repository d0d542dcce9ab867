/*
 * Small spherical helpers for matching frames to targets and to each other by their centres and
 * position angles.
 */

const RAD = Math.PI / 180;

export const wrap360 = (deg: number) => ((deg % 360) + 360) % 360;

/** Great-circle distance between two positions, degrees: haversine formula (Sinnott 1984, Sky & Telescope 68, 159), well-conditioned for small angles. */
export function separationDeg(ra1Deg: number, dec1Deg: number, ra2Deg: number, dec2Deg: number): number {
  const h = Math.sin(((dec2Deg - dec1Deg) * RAD) / 2) ** 2 + Math.cos(dec1Deg * RAD) * Math.cos(dec2Deg * RAD) * Math.sin(((ra2Deg - ra1Deg) * RAD) / 2) ** 2;
  return (2 * Math.asin(Math.min(1, Math.sqrt(h)))) / RAD;
}

/** Smallest difference between two angles, degrees, 0..180. */
export function angleDiffDeg(a: number, b: number): number {
  const d = wrap360(a - b);
  return Math.min(d, 360 - d);
}

/** Difference of two position angles modulo 180° (a frame turned half a turn frames the same field), degrees, 0..90. */
export function paDiffMod180Deg(a: number, b: number): number {
  const d = angleDiffDeg(a, b);
  return Math.min(d, 180 - d);
}

/** Circular mean of angles, degrees in [0, 360): the direction of the summed unit vectors. */
export function circularMeanDeg(anglesDeg: readonly number[]): number {
  let s = 0;
  let c = 0;
  for (const a of anglesDeg) {
    s += Math.sin(a * RAD);
    c += Math.cos(a * RAD);
  }
  return wrap360(Math.atan2(s, c) / RAD);
}

/** Mean of positions on the sphere: the direction of the summed unit vectors (RA in [0, 360)). */
export function meanPosition(points: readonly { raDeg: number; decDeg: number }[]): { raDeg: number; decDeg: number } {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const p of points) {
    const cd = Math.cos(p.decDeg * RAD);
    x += cd * Math.cos(p.raDeg * RAD);
    y += cd * Math.sin(p.raDeg * RAD);
    z += Math.sin(p.decDeg * RAD);
  }
  return { raDeg: wrap360(Math.atan2(y, x) / RAD), decDeg: Math.atan2(z, Math.hypot(x, y)) / RAD };
}
