import { cameraDownloadTimeS } from '@/shared/rig/optics';
import type { FilterSlot, RigInput } from '@/shared/rig/schema';

/*
 * Autofocus runs (dry-run.md "focus"; trade-defaults.md "focus": 9 points, 5 s per point,
 * a run takes ~3 min, 2–5 min (practice)).
 */

export const FOCUS_MODEL = {
  /** One focuser move between points, seconds (common practice; the rig stores no focuser speed). */
  moveS: 5,
  /** Star measurement (half-flux radius) per point, seconds (common practice). */
  measureS: 3,
  /** No focus run within this many minutes before a flip (trade-defaults.md rule 2). */
  noRunBeforeFlipMin: 10,
  /** Refocus threshold when no rule says otherwise: every 1 °C (trade-defaults.md "focus … when", practice; S14). */
  driftLimitC: 1,
} as const;

export interface FocusParams {
  points: number;
  exposureS: number;
}

/**
 * Seconds for one autofocus run: points × (exposure + download + move + measure), then a
 * final move to the best position, plus one extra move when the focuser has backlash (the
 * overshoot-and-return compensation). With the defaults (9 points, 5 s, 26 MP on USB 3:
 * 0.51 s download): 9 × 13.51 + 5 = 126.6 s ≈ 2.1 min, inside the 2–5 min of practice.
 */
export function focusRunS(p: FocusParams, rig: Pick<RigInput, 'camera' | 'focuser'>): number {
  const perPoint = p.exposureS + cameraDownloadTimeS(rig.camera, 1) + FOCUS_MODEL.moveS + FOCUS_MODEL.measureS;
  const backlash = rig.focuser.backlashSteps > 0 ? FOCUS_MODEL.moveS : 0;
  return p.points * perPoint + FOCUS_MODEL.moveS + backlash;
}

/**
 * Seconds to change filters: the wheel's change time, plus one focuser move when the two
 * filters' focus offsets differ (offsets applied on filter change: trade-defaults.md "focus",
 * practice; S15). From no filter (start of night) the change time alone.
 */
export function filterChangeS(from: FilterSlot | undefined, to: FilterSlot | undefined, changeTimeS: number): number {
  if (from === to) return 0;
  const offsetMove = from && to && from.focusOffsetSteps !== to.focusOffsetSteps ? FOCUS_MODEL.moveS : 0;
  return changeTimeS + offsetMove;
}
