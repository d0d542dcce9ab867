import { cameraDownloadTimeS } from '@/shared/rig/optics';
import type { RigInput } from '@/shared/rig/schema';
import { correctionSlewS } from '@/shared/dry-run/models/slew';

/*
 * Centring by plate solving (dry-run.md "centre"; trade-defaults.md "centre": solve exposure
 * 5 s at bin 2 (practice), solve time 5 s (common practice), tolerance 30″ / 3 attempts, plan on
 * 2 rounds (practice)).
 */

export const CENTRE_MODEL = {
  /** Solver time per attempt, seconds (trade-defaults.md "centre": 5 s, common practice). */
  solveS: 5,
  /** Solve frames are binned 2 × 2 (trade-defaults.md "centre", practice). */
  solveBinning: 2,
  /** Pointing error after a long slew or a flip, arcsec: 5′ for a mount without a pointing model (common practice). */
  slewErrorArcsec: 300,
  /** Error left after one solve-and-correct round, as a fraction (common practice: ~90 % removed). */
  residualFraction: 0.1,
} as const;

/**
 * Solve rounds expected to bring an error within tolerance: the first solve measures the
 * error; each correction leaves `residualFraction` of it. Rounds = 1 when the error is within
 * tolerance, else 1 + ⌈log(tol / err) / log(r)⌉, capped at `maxAttempts`. With the defaults
 * (5′ error, 30″ tolerance, r = 0.1): 300″ → 30″ after one correction → 2 rounds, matching
 * "plan on 2 rounds" (trade-defaults.md, practice).
 */
export function expectedCentreAttempts(errorArcsec: number, toleranceArcsec: number, maxAttempts: number, residualFraction: number = CENTRE_MODEL.residualFraction): number {
  if (errorArcsec <= toleranceArcsec) return 1;
  const corrections = Math.ceil(Math.log(toleranceArcsec / errorArcsec) / Math.log(residualFraction) - 1e-9);
  return Math.max(1, Math.min(maxAttempts, 1 + corrections));
}

export interface CentreParams {
  toleranceArcsec: number;
  maxAttempts: number;
  solveExposureS: number;
  /** Error before centring, arcsec. */
  errorArcsec: number;
}

/**
 * Seconds to centre: attempts × (solve exposure + download at bin 2 + solve time + a small
 * correction slew of the error left at that attempt, with settle). The last attempt's
 * correction is the final nudge onto the target.
 */
export function centreDurationS(p: CentreParams, rig: Pick<RigInput, 'camera' | 'mount'>): { attempts: number; durationS: number } {
  const attempts = expectedCentreAttempts(p.errorArcsec, p.toleranceArcsec, p.maxAttempts);
  const download = cameraDownloadTimeS(rig.camera, CENTRE_MODEL.solveBinning);
  let durationS = 0;
  let error = p.errorArcsec;
  for (let i = 0; i < attempts; i += 1) {
    durationS += p.solveExposureS + download + CENTRE_MODEL.solveS + correctionSlewS(error, rig.mount);
    error *= CENTRE_MODEL.residualFraction;
  }
  return { attempts, durationS };
}
