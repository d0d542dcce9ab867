import type { RigInput } from '@/shared/rig/schema';
import type { PierSide } from '@/shared/dry-run/models/slew';

/*
 * Camera rotator (dry-run.md "rotate"; trade-defaults.md rule 12: nearest equivalent angle
 * within travel, never more than 360° of cable wrap).
 */

type Rotator = Pick<RigInput['rotator'], 'minDeg' | 'maxDeg' | 'speedDegPerS' | 'skyOffsetDeg'>;

const wrap360 = (deg: number) => ((deg % 360) + 360) % 360;

/**
 * Sky position angle (east of north) of the camera for a mechanical rotator angle:
 * PA = mechanical + skyOffset, plus 180° with the tube east of the pier (after a flip the
 * camera turns with the tube: checks.md "After a meridian flip … position angle + 180°").
 */
export function skyPositionAngleDeg(mechanicalDeg: number, skyOffsetDeg: number, pier: PierSide | null): number {
  return wrap360(mechanicalDeg + skyOffsetDeg + (pier === 'east' ? 180 : 0));
}

export interface RotatorMove {
  /** Mechanical angle after the move (unchanged when unreachable). */
  mechanicalDeg: number;
  moveDeg: number;
  durationS: number;
  /** False when no equivalent angle lies within the travel limits. */
  reachable: boolean;
}

/**
 * The move to a sky PA: among the mechanical angles that give it (m + 360k), the one within
 * [minDeg, maxDeg] nearest the current angle (the shortest allowed direction); none within travel
 * → unreachable, the rotator stays. Moves within `toleranceDeg` are skipped. Time = |Δ| / speed.
 */
export function planRotation(currentMechDeg: number, skyPaDeg: number, pier: PierSide | null, rotator: Rotator, toleranceDeg = 0): RotatorMove {
  const base = wrap360(skyPaDeg - rotator.skyOffsetDeg - (pier === 'east' ? 180 : 0));
  let best: number | null = null;
  for (let k = -2; k <= 2; k += 1) {
    const candidate = base + 360 * k;
    if (candidate < rotator.minDeg - 1e-9 || candidate > rotator.maxDeg + 1e-9) continue;
    if (best === null || Math.abs(candidate - currentMechDeg) < Math.abs(best - currentMechDeg)) best = candidate;
  }
  if (best === null) return { mechanicalDeg: currentMechDeg, moveDeg: 0, durationS: 0, reachable: false };
  const moveDeg = Math.abs(best - currentMechDeg);
  if (moveDeg <= toleranceDeg) return { mechanicalDeg: currentMechDeg, moveDeg: 0, durationS: 0, reachable: true };
  return { mechanicalDeg: best, moveDeg, durationS: moveDeg / rotator.speedDegPerS, reachable: true };
}

/** The rotator's starting angle: 0° if within travel, else the nearer limit (Nightloom assumption). */
export function initialRotatorDeg(rotator: Pick<Rotator, 'minDeg' | 'maxDeg'>): number {
  return Math.min(rotator.maxDeg, Math.max(rotator.minDeg, 0));
}
