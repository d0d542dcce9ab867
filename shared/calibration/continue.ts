import type { RecordedFraming } from '@/shared/schemas/calibration-api';
import type { NodeOf } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

/** "Continue this target": a new stage at the recorded framing's centre and the chosen PA, with an expose step per recorded filter (its most used exposure), sized for the rig's filters. */
export function continueStage(targetId: string, targetLabel: string, framing: RecordedFraming, positionAngleDeg: number, exposures: readonly { filter: string | null; exposureS: number; gain: number | null; offset: number | null; binning: number }[], rig: RigInput): NodeOf<'stage'> {
  void targetId;
  void targetLabel;
  void framing;
  void positionAngleDeg;
  void exposures;
  void rig;
  throw new Error('not implemented');
}
