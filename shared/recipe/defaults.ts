import type { FilterBand } from '@/shared/rig/schema';

/*
 * Starting values for new recipe steps and the check thresholds, each with its basis as
 * trade-defaults.md gives it: a numbered source (S…), "practice", "common practice", or
 * "Nightloom choice" where the design documents are silent (a placeholder the user changes).
 */
export const RECIPE_DEFAULTS = {
  cool: {
    // cooling set-point −10 °C, range 0 to −20 °C for CMOS (S1, S35).
    setpointC: -10,
  },
  centre: {
    // tolerance 30″ / 3 attempts (practice); solve exposure 5 s (practice).
    toleranceArcsec: 30,
    maxAttempts: 3,
    solveExposureS: 5,
  },
  rotate: {
    // Nightloom choice: 3′ repeats a framing well inside any stacking tolerance.
    toleranceArcmin: 3,
  },
  focus: {
    // 9 points, 5 s per point (practice); the step size depends on the focuser: placeholder.
    points: 9,
    exposureS: 5,
    stepSize: 50,
  },
  expose: {
    // dither every frame (S13); binning 1 (Nightloom choice).
    ditherEvery: 1,
    binning: 1,
  },
  guide: {
    // settle threshold 1.5 px, minimum settle time 10 s (practice; S4); start incl. calibration (S10, S11).
    settlePx: 1.5,
    settleTimeS: 10,
    calibrate: true,
  },
  meridian: {
    // flip 5 min past the meridian (practice; S39); after a flip centre, refocus if asked (rule 2,
    // "focus … after a flip", practice).
    flipAfterMin: 5,
    refocus: true,
    recentre: true,
    // Nightloom choice: stop 5 min before the meridian, mirroring the flip delay.
    pauseMinutesBefore: 5,
  },
  flats: {
    // 30 frames per set (S44, S18).
    count: 30,
    source: 'panel' as const,
  },
  darks: {
    // 30 frames per set (S44, S18); set-point equals the lights' default (rule 3).
    count: 30,
    temperatureC: -10,
    binning: 1,
  },
  rules: {
    // refocus every 1 °C and every 60 min (practice; S14).
    refocusDeltaC: 1,
    refocusEveryMinutes: 60,
    // Nightloom choice: 2′ of drift, four times the default centring tolerance.
    recentreDriftArcmin: 2,
  },
} as const;

/**
 * Default sub length by band (trade-defaults.md "exposure": L 180 s, RGB 120 s, narrowband
 * 300 s; S25, S4, S35). A custom filter gets the luminance value (Nightloom choice).
 */
export function defaultExposureS(band: FilterBand): number {
  switch (band) {
    case 'R':
    case 'G':
    case 'B':
      return 120;
    case 'Ha':
    case 'OIII':
    case 'SII':
      return 300;
    default:
      return 180;
  }
}

/**
 * Flat level as a percentage of full scale above the offset (trade-defaults.md "flat level"):
 * panel 50 % (S16, S17, S18, S42); sky flats 30 %, the middle of the sky range 20–40 %.
 */
export function defaultFlatAduPct(source: 'panel' | 'sky'): number {
  return source === 'sky' ? 30 : 50;
}

/** Thresholds of the static checks, with their basis. */
export const CHECK_DEFAULTS = {
  // Longest exposure without a guide step: 120 s (common practice).
  unguidedLimitS: 120,
  // At least 12 dithers per stack (S13; common practice).
  minDithersPerFilter: 12,
  // A focus run needs at least 5 points (trade-defaults.md, rule 11; practice).
  minFocusPoints: 5,
} as const;

/** Structural limits of a recipe tree (plan-format.md: import limits node count and depth). */
export const TREE_LIMITS = {
  maxDepth: 8,
  maxNodes: 2000,
} as const;
