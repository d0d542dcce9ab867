import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import type { HistoryTarget, TargetHistory } from '@/shared/schemas/calibration-api';

/** Which target a light belongs to: nearest target whose centre is within 1° of the frame's WCS centre (else pointing), else OBJECT equal to a designation, name or alias (spaces and case ignored); null when none. */
export function linkLight(frame: StoredFrame, targets: readonly HistoryTargetRef[]): string | null {
  void frame;
  void targets;
  throw new Error('not implemented');
}

/** GET /api/history rows: every target with lights, and the unmatched lights grouped by OBJECT. `shares` maps target id → club ids. */
export function historySummary(lights: readonly StoredFrame[], targets: readonly HistoryTargetRef[], shares: ReadonlyMap<string, string[]>): HistoryTarget[] {
  void lights;
  void targets;
  void shares;
  throw new Error('not implemented');
}

/** GET /api/history/targets/:id: one target's recorded framings, nights and totals. */
export function targetHistory(target: HistoryTargetRef, lights: readonly StoredFrame[], sharedWith: string[]): TargetHistory {
  void target;
  void lights;
  void sharedWith;
  throw new Error('not implemented');
}
