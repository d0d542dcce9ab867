/*
 * Pointing drift for the `recentre-on-drift` rule (common practice: differential flexure and
 * polar-alignment residuals move a guided field by about an arcminute an hour; unguided
 * tracking drifts several times faster). A constant rate is a simplification; real drift
 * depends on the mount, the load and where in the sky it points.
 */

export const DRIFT_MODEL = {
  /** Guided drift, arcmin per hour (common practice). */
  guidedArcminPerHour: 1,
  /** Unguided drift, arcmin per hour (common practice). */
  unguidedArcminPerHour: 5,
} as const;

/** Drift accumulated over `elapsedS`, arcmin: rate × time. */
export function driftArcmin(elapsedS: number, guiding: boolean): number {
  const rate = guiding ? DRIFT_MODEL.guidedArcminPerHour : DRIFT_MODEL.unguidedArcminPerHour;
  return (rate * elapsedS) / 3600;
}

/** Seconds until the drift reaches `limitArcmin` from `alreadyArcmin`. */
export function secondsUntilDrift(limitArcmin: number, alreadyArcmin: number, guiding: boolean): number {
  const rate = guiding ? DRIFT_MODEL.guidedArcminPerHour : DRIFT_MODEL.unguidedArcminPerHour;
  return Math.max(0, ((limitArcmin - alreadyArcmin) / rate) * 3600);
}
