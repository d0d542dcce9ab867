import type { RigInput } from '@/shared/rig/schema';
import type { SiteInput } from '@/shared/schemas/site';

export type FindingSeverity = 'stop' | 'warn' | 'info';

/** Severity order for sorting: a stop first. */
export const SEVERITY_ORDER: Record<FindingSeverity, number> = { stop: 0, warn: 1, info: 2 };

export const RECIPE_CHECK_CODES = [
  'duplicate-id',
  'filter-missing',
  'no-target',
  'endless-repeat',
  'setpoint-unreachable',
  'no-rotator',
  'unguided-long',
  'empty-container',
  'darks-uncapped',
  'stage-no-target',
  'dither-sanity',
  'focus-points-low',
] as const;
export type RecipeCheckCode = (typeof RECIPE_CHECK_CODES)[number];

/** One result of the static checks: what is wrong, where, and what to do about it. */
export interface RecipeFinding {
  code: RecipeCheckCode;
  severity: FindingSeverity;
  /** The node (or rule) the finding is about. */
  nodeId: string;
  /** Printable path from the root, e.g. `children[2].children[0]`. */
  path: string;
  message: string;
  fix: string;
}

export interface CheckOptions {
  /** The rig the recipe will run on; without it the rig checks are skipped. */
  rig?: Pick<RigInput, 'name' | 'filterWheel' | 'rotator' | 'camera' | 'guider'>;
  /** The site; its dusk temperature is the ambient for the cooling check. */
  site?: Pick<SiteInput, 'duskTempC'>;
  /** Longest sub without a guide step (default 120 s, common practice). */
  unguidedLimitS?: number;
  /** Dithers wanted per filter and target (default 12; S13, common practice). */
  minDithersPerFilter?: number;
  /** Fewest focus points (default 5; practice). */
  minFocusPoints?: number;
}
