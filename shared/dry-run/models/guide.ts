import type { RigInput } from '@/shared/rig/schema';

/*
 * Guiding (trade-defaults.md "guiding": start incl. calibration 2 min, 1–5 min; restart
 * 20–60 s; S10, S11).
 */

export const GUIDE_MODEL = {
  /** Restart without calibration (after a flip, a re-centre): the middle of 20–60 s (S10, S11). */
  restartS: 40,
} as const;

/** Seconds to start guiding: the guider's start time with calibration, or a restart without. */
export function guideStartS(calibrate: boolean, guider: Pick<RigInput['guider'], 'startS'>): number {
  return calibrate ? guider.startS : GUIDE_MODEL.restartS;
}
