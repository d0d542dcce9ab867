import type { z } from 'zod';
import type { RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';
import type { SiteInput } from '@/shared/schemas/site';
import type { MoonAvoidance } from '@/shared/dry-run/models/moon-avoidance';
import type { darksNeededSchema, dryRunFindingSchema, dryRunResultSchema, dryRunSkySchema, dryRunTotalsSchema, OVERHEAD_KINDS, timelineEventSchema, TIMELINE_KINDS } from '@/shared/dry-run/result-schema';

export { DRY_RUN_CODES, dryRunResultSchema, FINDING_CODES, OVERHEAD_KINDS, TIMELINE_KINDS } from '@/shared/dry-run/result-schema';
export type { MoonAvoidance } from '@/shared/dry-run/models/moon-avoidance';
export type { PierSide } from '@/shared/dry-run/models/slew';

/** The site as the dry run needs it. */
export type DryRunSite = Pick<SiteInput, 'latitudeDeg' | 'longitudeDeg' | 'elevationM' | 'timeZone' | 'horizon' | 'minAltitudeDeg' | 'duskTempC' | 'dawnTempC'>;

/** A framing of a target: centre (J2000) and sky position angle east of north. */
export interface DryRunFraming {
  id?: string;
  name?: string;
  raDeg: number;
  decDeg: number;
  positionAngleDeg: number;
}

export interface DryRunTarget {
  designation: string;
  name: string;
  raDeg: number;
  decDeg: number;
  /** The first framing is the one a stage uses unless it has its own. */
  framings?: DryRunFraming[];
}

/** One set of the user's dark library. */
export interface DarkSet {
  exposureS: number;
  /** The camera's gain setting; null when the set's frames did not record one (it then matches only lights without a gain). */
  gain: number | null;
  /** Likewise for the offset. */
  offset: number | null;
  binning: number;
  readoutMode?: string;
  temperatureC: number;
  frames: number;
  /** When the set was taken, ISO 8601. */
  takenAt: string;
}

export interface DryRunOptions {
  /** Degrees from the Sun no pointing or slew may come while it is up (default 30°, S31). */
  sunAvoidanceDeg?: number;
  /** Longest sub without guiding (default 120 s, common practice). */
  unguidedLimitS?: number;
  /** Moon-avoidance parameters D and W per band (defaults: trade-defaults.md "moon separation"). */
  moonAvoidance?: { broadband?: MoonAvoidance; narrowband?: MoonAvoidance };
}

export interface DryRunInput {
  tree: RecipeTree;
  rig: RigInput;
  site: DryRunSite;
  /** The evening the night starts on, YYYY-MM-DD (local at the site). */
  nightDate: string;
  /** When the first step starts, ISO 8601; default sunset (the span's start when the Sun does not set). */
  startTime?: string;
  targets: Record<string, DryRunTarget>;
  darkLibrary?: DarkSet[];
  /** Darks older than this are stale (default 6 months: trade-defaults.md, S22). */
  darkValidityMonths?: number;
  options?: DryRunOptions;
}

export type TimelineKind = (typeof TIMELINE_KINDS)[number];
export type OverheadKind = (typeof OVERHEAD_KINDS)[number];
export type TimelineEvent = z.infer<typeof timelineEventSchema>;
export type DryRunFinding = z.infer<typeof dryRunFindingSchema>;
export type DryRunTotals = z.infer<typeof dryRunTotalsSchema>;
export type DarksNeeded = z.infer<typeof darksNeededSchema>;
export type DryRunSky = z.infer<typeof dryRunSkySchema>;
export type DryRunResult = z.infer<typeof dryRunResultSchema>;
export type { DryRunCode, FindingCode } from '@/shared/dry-run/result-schema';
