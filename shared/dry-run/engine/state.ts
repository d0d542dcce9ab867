import type { FilterSlot, RigInput } from '@/shared/rig/schema';
import type { MoonAvoidance } from '@/shared/dry-run/models/moon-avoidance';
import type { PierSide } from '@/shared/dry-run/models/slew';
import type { Recorder } from '@/shared/dry-run/engine/record';
import type { NightSky } from '@/shared/dry-run/sky/night-sky';
import type { TargetSky } from '@/shared/dry-run/sky/target-sky';
import type { DryRunInput, DryRunSite } from '@/shared/dry-run/types';

/** Where the telescope points: parked, tracking a J2000 position, or held at a fixed alt/az. */
export type Pointing =
  | { kind: 'park' }
  | { kind: 'radec'; raDeg: number; decDeg: number; sky: TargetSky; targetId: string | null; label: string }
  | { kind: 'altaz'; altDeg: number; azDeg: number };

export interface FocusState {
  ms: number;
  tempC: number;
  /** Light frames since this focus. */
  frames: number;
}

export interface ResolvedOptions {
  sunAvoidanceDeg: number;
  unguidedLimitS: number;
  moon: { broadband: MoonAvoidance; narrowband: MoonAvoidance };
  darkValidityMonths: number;
}

/** The simulation's state: the clock and the rig's condition, plus the recorder. */
export interface Sim {
  input: DryRunInput;
  rig: RigInput;
  site: DryRunSite;
  sky: NightSky;
  opts: ResolvedOptions;
  /** Node id → printable path. */
  paths: Map<string, string>;
  out: Recorder;
  t: number;
  pointing: Pointing;
  pier: PierSide | null;
  rotatorDeg: number;
  filter: FilterSlot | undefined;
  sensorC: number;
  cooled: boolean;
  setpointC: number | null;
  guiding: boolean;
  /** The guide step's settle time (dithers wait this long). */
  guideSettleS: number;
  lastFocus: FocusState | null;
  /** Last centring (or slew) on the current pointing, for the drift rule. */
  lastCentreMs: number | null;
  /** Pointing error left by the last slew or centring, arcsec. */
  pointingErrorArcsec: number;
  framesSinceDither: number;
}
