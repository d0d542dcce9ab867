import { z } from 'zod';
import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import { between, clockTimeSchema, decDegSchema, exactlyOne, idSchema, labelSchema, positionAngleSchema, raDegSchema, sunEventSchema, whole } from '@/shared/recipe/fields';

/*
 * The step kinds of recipe.md, parameters with units in their names. Hard limits here are
 * limits of plausible use; the usual ranges of trade-defaults.md are advice, not errors.
 * Where a default depends on context (the camera's rate, the filter's band, the flat source),
 * the field is optional and `undefined` means "the default for that context".
 */

/** Fields every node has. */
export const nodeBaseShape = {
  id: idSchema,
  label: labelSchema.optional(),
  enabled: z.boolean({ error: 'Enabled must be true or false' }).default(true),
};

/** A filter by the name of a slot in the rig's wheel (or a band name in a template). */
export const filterRefSchema = z.string({ error: 'Filter must be text' }).trim().min(1, 'Name a filter').max(24, 'A filter name has at most 24 characters');

const rateSchema = between('Rate', '°C/min', 0.1, 30);
const gainSchema = between('Gain', '', 0, 100000);
const offsetSchema = between('Offset', '', 0, 100000);
const binningSchema = whole('Binning', '', 1, 4);

export const coolStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('cool'),
  setpointC: between('Set-point', '°C', -60, 30).default(D.cool.setpointC),
  /** Empty: the camera's own rate from the rig. */
  maxRateCPerMin: rateSchema.optional(),
});

export const warmStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('warm'),
  /** Empty: ambient. */
  targetC: between('Warm-up target', '°C', -30, 40).optional(),
  maxRateCPerMin: rateSchema.optional(),
});

export const slewToSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('stage-target') }),
    z.object({ kind: z.literal('radec'), raDeg: raDegSchema, decDeg: decDegSchema }),
    z.object({ kind: z.literal('altaz'), altDeg: between('Altitude', '°', -90, 90), azDeg: between('Azimuth', '°', 0, 360).lt(360, 'Azimuth must be below 360°') }),
  ],
  { error: 'Slew to is one of stage-target, radec or altaz' },
);

export const slewStepSchema = z.object({ ...nodeBaseShape, kind: z.literal('slew'), to: slewToSchema });

export const centreStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('centre'),
  toleranceArcsec: between('Centring tolerance', '″', 1, 3600).default(D.centre.toleranceArcsec),
  maxAttempts: whole('Attempts', '', 1, 20).default(D.centre.maxAttempts),
  solveExposureS: between('Solve exposure', 's', 0.1, 120).default(D.centre.solveExposureS),
  filter: filterRefSchema.optional(),
});

export const rotateStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('rotate'),
  /** A sky position angle (degrees east of north) or the stage's framing. */
  to: exactlyOne('Rotate to', { positionAngleDeg: positionAngleSchema, matchFraming: z.literal(true, { error: 'matchFraming must be true' }) }),
  toleranceArcmin: between('Rotation tolerance', '′', 0.1, 60).default(D.rotate.toleranceArcmin),
});

export const focusStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('focus'),
  filter: filterRefSchema.optional(),
  points: whole('Focus points', '', 3, 50).default(D.focus.points),
  /** Focuser steps between points. */
  stepSize: whole('Focus step size', 'steps', 1, 100000).default(D.focus.stepSize),
  exposureS: between('Focus exposure', 's', 0.1, 120).default(D.focus.exposureS),
});

export const exposeStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('expose'),
  filter: filterRefSchema,
  exposureS: between('Exposure', 's', 0.001, 3600),
  count: whole('Frame count', '', 1, 10000),
  /** The camera's own unitless setting; empty: the camera's current setting. */
  gain: gainSchema.optional(),
  offset: offsetSchema.optional(),
  binning: binningSchema.default(D.expose.binning),
  /** Frames between dithers (a dither every n-th frame); 0 = never. */
  ditherEvery: whole('Dither every', 'frames', 0, 1000).default(D.expose.ditherEvery),
  frameType: z.literal('light', { error: 'Frame type is light' }).default('light'),
});

export const guideStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('guide'),
  settlePx: between('Settle threshold', 'px', 0.1, 10).default(D.guide.settlePx),
  settleTimeS: between('Settle time', 's', 0, 300).default(D.guide.settleTimeS),
  calibrate: z.boolean({ error: 'Calibrate must be true or false' }).default(D.guide.calibrate),
});

export const meridianPolicySchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('flip'),
      flipAfterMin: between('Flip after', 'min', 0, 240).default(D.meridian.flipAfterMin),
      refocus: z.boolean({ error: 'Refocus must be true or false' }).default(D.meridian.refocus),
      recentre: z.boolean({ error: 'Recentre must be true or false' }).default(D.meridian.recentre),
    }),
    z.object({ kind: z.literal('pause-before'), minutesBefore: between('Pause before', 'min', 0, 240).default(D.meridian.pauseMinutesBefore) }),
    z.object({ kind: z.literal('end-stage') }),
  ],
  { error: 'Meridian policy is one of flip, pause-before or end-stage' },
);

export const meridianStepSchema = z.object({ ...nodeBaseShape, kind: z.literal('meridian'), policy: meridianPolicySchema });

export const waitStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('wait'),
  until: exactlyOne('Wait until', {
    clock: clockTimeSchema,
    sunEvent: sunEventSchema,
    /** The stage target's altitude. */
    altitudeAboveDeg: between('Altitude', '°', -10, 89),
    durationS: between('Duration', 's', 1, 86400),
  }),
});

/** A rotator angle on the rotator's own scale (ROTATANG), 0 ≤ angle < 360. */
export const rotatorAngleSchema = z
  .number({ error: 'Rotator angle must be a number' })
  .min(0, 'Rotator angle must be between 0 and 360°')
  .lt(360, 'Rotator angle must be below 360°');

/**
 * The rotator angle and focuser position the lights were taken at (from their FITS headers), for
 * flats taken later: flats are valid while optical train, focus, filter and rotator angle are
 * unchanged (trade-defaults.md "flats valid while", S18). At least one of the two: the
 * refinement checks it, and the `anyOf` states it in the published JSON Schema, which cannot
 * see refinements.
 */
export const recordedPositionsSchema = z
  .object({
    kind: z.literal('positions'),
    rotatorAngleDeg: rotatorAngleSchema.optional(),
    focuserPositionSteps: whole('Focuser position', 'steps', 0, 1_000_000).optional(),
  })
  .refine((p) => p.rotatorAngleDeg !== undefined || p.focuserPositionSteps !== undefined, { message: 'Give a rotator angle, a focuser position or both' })
  .meta({ anyOf: [{ required: ['rotatorAngleDeg'] }, { required: ['focuserPositionSteps'] }] });

export const matchFramingOfSchema = z.discriminatedUnion(
  'kind',
  [z.object({ kind: z.literal('stage'), stageId: idSchema }), z.object({ kind: z.literal('framing'), framingId: idSchema }), recordedPositionsSchema],
  { error: 'Match the framing of a stage, a recorded framing, or recorded rotator and focuser positions' },
);

export const flatsStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('flats'),
  source: z.enum(['panel', 'sky'], { error: 'Flats come from the panel or the sky' }).default(D.flats.source),
  filters: z.array(filterRefSchema).min(1, 'Choose at least one filter').max(20, 'At most 20 filters'),
  count: whole('Flats per filter', '', 1, 500).default(D.flats.count),
  /** Percent of full scale above the offset; empty: 50 % for a panel, 30 % for the sky. */
  targetAduPct: between('Flat level', '%', 5, 95).optional(),
  matchFramingOf: matchFramingOfSchema.optional(),
});

export const darksStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('darks'),
  exposuresS: z.array(between('Dark exposure', 's', 0.001, 3600)).min(1, 'Give at least one exposure').max(50, 'At most 50 exposures'),
  count: whole('Darks per exposure', '', 1, 500).default(D.darks.count),
  temperatureC: between('Dark temperature', '°C', -60, 30).default(D.darks.temperatureC),
  gain: gainSchema.optional(),
  offset: offsetSchema.optional(),
  binning: binningSchema.default(D.darks.binning),
});

export const parkStepSchema = z.object({ ...nodeBaseShape, kind: z.literal('park') });

export const noteStepSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('note'),
  text: z.string({ error: 'Note must be text' }).trim().min(1, 'Write the note').max(2000, 'A note has at most 2000 characters'),
});

/** Every step schema (the leaves of a recipe). */
export const stepSchemas = [
  coolStepSchema,
  warmStepSchema,
  slewStepSchema,
  centreStepSchema,
  rotateStepSchema,
  focusStepSchema,
  exposeStepSchema,
  guideStepSchema,
  meridianStepSchema,
  waitStepSchema,
  flatsStepSchema,
  darksStepSchema,
  parkStepSchema,
  noteStepSchema,
] as const;
