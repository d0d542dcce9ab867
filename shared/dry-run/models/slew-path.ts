/*
 * Sun safety along a slew (trade-defaults.md "safety": 30° from the Sun, S31). The path is taken
 * as the great circle from the start to the end direction (dry-run.md "path checked for sun
 * avoidance"); its closest approach to the Sun is found exactly rather than by sampling.
 */

export type Vec3 = [number, number, number];

const RAD = Math.PI / 180;

/** Unit vector of a horizontal direction: x north, y east, z up. */
export function horizonVector(altDeg: number, azDeg: number): Vec3 {
  const alt = altDeg * RAD;
  const az = azDeg * RAD;
  return [Math.cos(alt) * Math.cos(az), Math.cos(alt) * Math.sin(az), Math.sin(alt)];
}

const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: Vec3) => Math.hypot(a[0], a[1], a[2]);

/** Angle between two unit vectors in degrees, atan2(|a×b|, a·b) (stable at all angles). */
export function angleDeg(a: Vec3, b: Vec3): number {
  return Math.atan2(norm(cross(a, b)), dot(a, b)) / RAD;
}

/**
 * Smallest angle in degrees between a direction `s` and the shorter great-circle arc from `a`
 * to `b`. The foot of the perpendicular from `s` onto the circle's plane lies on the arc when it
 * is on the near side of both ends; then the distance is asin|s·n| (n the circle's pole),
 * otherwise the nearer end point. Equivalent to sampling the arc infinitely finely.
 */
export function arcClosestApproachDeg(a: Vec3, b: Vec3, s: Vec3): number {
  const n = cross(a, b);
  const len = norm(n);
  const ends = Math.min(angleDeg(a, s), angleDeg(b, s));
  if (len < 1e-12) return ends;
  const pole: Vec3 = [n[0] / len, n[1] / len, n[2] / len];
  const onPlane: Vec3 = [s[0] - pole[0] * dot(s, pole), s[1] - pole[1] * dot(s, pole), s[2] - pole[2] * dot(s, pole)];
  if (norm(onPlane) < 1e-12) return ends;
  const insideArc = dot(cross(a, onPlane), n) >= 0 && dot(cross(onPlane, b), n) >= 0;
  if (!insideArc) return ends;
  return Math.asin(Math.min(1, Math.abs(dot(s, pole)))) / RAD;
}

/** Closest approach to `s` along a path through several waypoints (e.g. a flip through the pole). */
export function pathClosestApproachDeg(waypoints: Vec3[], s: Vec3): number {
  if (waypoints.length === 1) return angleDeg(waypoints[0]!, s);
  let best = Infinity;
  for (let i = 1; i < waypoints.length; i += 1) best = Math.min(best, arcClosestApproachDeg(waypoints[i - 1]!, waypoints[i]!, s));
  return best;
}
