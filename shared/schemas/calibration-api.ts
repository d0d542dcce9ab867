import { z } from 'zod';
import { nightDateSchema } from '@/shared/schemas/night';

/*
 * The calibration and capture-history API (issue 8): FITS header intake, the dark library,
 * flats matched to the lights, capture history and "continue this target". One set of schemas
 * for the server's input checks, the client's forms and the typed responses.
 */

const id = z.string().uuid('Not an id');

export const FRAME_TYPES = ['light', 'dark', 'flat', 'bias'] as const;
export type CaptureFrameType = (typeof FRAME_TYPES)[number];

/** Most files one intake takes (a night's folder is a few hundred). */
export const INTAKE_MAX_FILES = 2000;
/** Most header bytes per file (40 blocks: far more than any camera writes). */
export const INTAKE_MAX_HEADER_BYTES = 40 * 2880;

/** Body of POST /api/calibration/intake: the header bytes of each picked file, base64. */
export const intakeRequestSchema = z.object({
  files: z
    .array(
      z.object({
        name: z.string({ error: 'Each file needs a name' }).trim().min(1, 'Each file needs a name').max(260, 'A file name has at most 260 characters'),
        /** The file's first bytes up to and including the END card's block (standard base64). */
        headerBase64: z
          .string({ error: 'Header bytes must be base64 text' })
          .min(1, 'A file sent no header bytes')
          .max(Math.ceil(INTAKE_MAX_HEADER_BYTES / 3) * 4, `A header has at most ${INTAKE_MAX_HEADER_BYTES} bytes`)
          .regex(/^[A-Za-z0-9+/]*={0,2}$/, 'Header bytes must be base64 text'),
      }),
      { error: 'Send a list of files' },
    )
    .min(1, 'Pick at least one file')
    .max(INTAKE_MAX_FILES, `At most ${INTAKE_MAX_FILES} files at once`),
});
export type IntakeRequest = z.infer<typeof intakeRequestSchema>;

/** A file that was not recorded, and why (the parser's words, or the missing keyword). */
export const intakeRejectSchema = z.object({ name: z.string(), reason: z.string(), kind: z.string() });

/** Answer of POST /api/calibration/intake. */
export const intakeResultSchema = z.object({
  intakeId: z.string(),
  /** New frames stored, by type. */
  recorded: z.object({ light: z.number().int(), dark: z.number().int(), flat: z.number().int(), bias: z.number().int() }),
  /** Frames already in the library (same header fingerprint), including repeats within this intake. */
  duplicates: z.number().int(),
  rejected: z.array(intakeRejectSchema),
});
export type IntakeResult = z.infer<typeof intakeResultSchema>;

/** One past import in GET /api/calibration/intakes: what it recorded (still on record), by type. */
export const intakeSummarySchema = z.object({
  intakeId: z.string(),
  /** When it was imported: the earliest record time of its frames (ISO, UTC). */
  importedAt: z.string(),
  frames: z.object({ light: z.number().int(), dark: z.number().int(), flat: z.number().int(), bias: z.number().int() }),
  /** The nights its frames belong to, first and last (YYYY-MM-DD). */
  firstNight: nightDateSchema,
  lastNight: nightDateSchema,
  /** Up to three OBJECT names of its lights, by name; `objectCount` counts them all. */
  objects: z.array(z.string()),
  objectCount: z.number().int(),
});
export type IntakeSummary = z.infer<typeof intakeSummarySchema>;

/** Answer of GET /api/calibration/intakes?limit&cursor: newest first; `nextCursor` asks for the next page. */
export const intakeListSchema = z.object({ intakes: z.array(intakeSummarySchema), nextCursor: z.string().nullable() });
export type IntakeList = z.infer<typeof intakeListSchema>;

/** Body of POST /api/calibration/dark-sets (and PUT with `version`): a set entered by hand. */
export const darkSetInputSchema = z.object({
  exposureS: z.number({ error: 'Exposure must be a number' }).positive('Exposure must be above 0 s').max(3600, 'Exposure is at most 3600 s'),
  gain: z.number({ error: 'Gain must be a number' }).min(0, 'Gain is 0 or more').max(100000, 'Gain is at most 100000').nullable().default(null),
  offset: z.number({ error: 'Offset must be a number' }).min(0, 'Offset is 0 or more').max(100000, 'Offset is at most 100000').nullable().default(null),
  binning: z.number({ error: 'Binning must be a number' }).int('Binning is a whole number').min(1, 'Binning is 1 to 4').max(4, 'Binning is 1 to 4').default(1),
  readoutMode: z.string().trim().max(60, 'A readout mode has at most 60 characters').nullable().default(null),
  temperatureC: z.number({ error: 'Temperature must be a number' }).min(-60, 'Temperature is −60 °C or warmer').max(30, 'Temperature is 30 °C or colder'),
  frames: z.number({ error: 'Frame count must be a number' }).int('Frame count is a whole number').min(1, 'At least one frame').max(10000, 'At most 10000 frames'),
  takenOn: nightDateSchema,
  notes: z.string().max(2000, 'Notes have at most 2000 characters').default(''),
});
export type DarkSetInput = z.input<typeof darkSetInputSchema>;

/** One set of the dark library as the API lists it. */
export const darkLibrarySetSchema = z.object({
  /** A hand set's id, or `intake:<key>` for a set grouped from recorded dark frames. */
  id: z.string(),
  source: z.enum(['hand', 'intake']),
  version: z.number().int().nullable(),
  exposureS: z.number(),
  gain: z.number().nullable(),
  offset: z.number().nullable(),
  binning: z.number().int(),
  readoutMode: z.string().nullable(),
  temperatureC: z.number(),
  frames: z.number().int(),
  /** YYYY-MM-DD: the date the set was taken (the latest night of its frames). */
  takenOn: z.string(),
  stale: z.boolean(),
  notes: z.string(),
});
export type DarkLibrarySet = z.infer<typeof darkLibrarySetSchema>;

/** One bias set grouped from recorded bias frames (they calibrate flats at the same gain, offset and binning). */
export const biasLibrarySetSchema = z.object({
  /** `bias:<key>`; removed through DELETE /api/calibration/dark-library/bias/:key. */
  id: z.string(),
  source: z.literal('intake'),
  gain: z.number().nullable(),
  offset: z.number().nullable(),
  binning: z.number().int(),
  readoutMode: z.string().nullable(),
  /** Rounded to 1 °C; null when the frames recorded no temperature. */
  temperatureC: z.number().nullable(),
  frames: z.number().int(),
  /** YYYY-MM-DD: the night of its frames. */
  takenOn: z.string(),
  /** Older than the dark validity. */
  stale: z.boolean(),
});
export type BiasLibrarySet = z.infer<typeof biasLibrarySetSchema>;

/** Answer of GET /api/calibration/dark-library. */
export const darkLibrarySchema = z.object({ validityMonths: z.number().int(), sets: z.array(darkLibrarySetSchema), biasSets: z.array(biasLibrarySetSchema) });
export type DarkLibrary = z.infer<typeof darkLibrarySchema>;

/** Body of PUT /api/calibration/settings. */
export const calibrationSettingsSchema = z.object({
  darkValidityMonths: z.number({ error: 'Validity must be a number of months' }).int('Whole months').min(1, 'At least 1 month').max(12, 'At most 12 months'),
});

/** One dark set to shoot (from a dry run's `darksNeeded`, or picked by hand). */
export const darkToShootSchema = z.object({
  exposureS: z.number().positive('Exposure must be above 0 s').max(3600, 'Exposure is at most 3600 s'),
  gain: z.number().min(0).max(100000).nullable(),
  offset: z.number().min(0).max(100000).nullable(),
  binning: z.number().int().min(1).max(4),
  temperatureC: z.number().min(-60).max(30),
});
export type DarkToShoot = z.infer<typeof darkToShootSchema>;

/** Body of POST /api/calibration/darks-recipe: the sets → a new `darks` recipe for a cloudy night. */
export const darksRecipeRequestSchema = z.object({
  darks: z.array(darkToShootSchema).min(1, 'Choose at least one dark set').max(200, 'At most 200 dark sets'),
  /** Frames per set; default 30 (trade-defaults.md "frames per set", S44, S18). */
  count: z.number().int().min(1, 'At least one frame').max(500, 'At most 500 frames').optional(),
  name: z.string().trim().min(1).max(80).optional(),
  rigId: id.nullable().optional(),
});

/** A (filter, rotator angle, focus position) the lights of a night used, and the flats on record for it. */
export const flatComboSchema = z.object({
  filter: z.string().nullable(),
  rotatorAngleDeg: z.number().nullable(),
  focuserPositionSteps: z.number().int().nullable(),
  lightFrames: z.number().int(),
  /** Flat frames on record with the same filter, rotator angle (±0.5°) and focus (±1 step) taken from that night to 3 days later. */
  flatFrames: z.number().int(),
  /** True when a fresh bias set matches the gain, offset and binning of every light of the combination (flats are taken at the lights' settings). */
  biasOnRecord: z.boolean(),
});
export type FlatCombo = z.infer<typeof flatComboSchema>;

/** Answer of GET /api/calibration/flats?night=YYYY-MM-DD (night optional: the latest with lights). */
export const flatsPlanSchema = z.object({
  nights: z.array(z.string()),
  nightDate: z.string().nullable(),
  combos: z.array(flatComboSchema),
});
export type FlatsPlan = z.infer<typeof flatsPlanSchema>;

/** Body of POST /api/calibration/flats-recipe. */
export const flatsRecipeRequestSchema = z.object({
  nightDate: nightDateSchema,
  source: z.enum(['panel', 'sky'], { error: 'Flats come from the panel or the sky' }),
  /** Flats per filter; default 25 (the composer's default). */
  count: z.number().int().min(1).max(500).optional(),
  rigId: id.nullable().optional(),
});

/** Integration of one filter. */
export const filterIntegrationSchema = z.object({ filter: z.string().nullable(), frames: z.number().int(), seconds: z.number() });
export type FilterIntegration = z.infer<typeof filterIntegrationSchema>;

/** One row of GET /api/history: a target (or an object name no target matches). */
export const historyTargetSchema = z.object({
  targetId: z.string().nullable(),
  /** The target's designation, or the frames' OBJECT text for unmatched frames. */
  label: z.string(),
  name: z.string(),
  frames: z.number().int(),
  seconds: z.number(),
  nights: z.number().int(),
  firstNight: z.string(),
  lastNight: z.string(),
  byFilter: z.array(filterIntegrationSchema),
  /** Club ids the owner shared this target's summary with. */
  sharedWith: z.array(z.string()),
});
export type HistoryTarget = z.infer<typeof historyTargetSchema>;

export const historyListSchema = z.object({ targets: z.array(historyTargetSchema) });

/** Frames of one target that share a framing: centre within 1′ and PA equal modulo 180° (within 1°). */
export const recordedFramingSchema = z.object({
  key: z.string(),
  raDeg: z.number(),
  decDeg: z.number(),
  /** The PA most of its integration was taken at. */
  positionAngleDeg: z.number(),
  frames: z.number().int(),
  seconds: z.number(),
  /** Integration at PA + 180° (after a meridian flip without restoring the rotator). */
  flippedFrames: z.number().int(),
  flippedSeconds: z.number(),
  /** The user's framing of this target this one matches (centre within 1′, PA within 1° or 180° ± 1°). */
  framingId: z.string().nullable(),
  /** True when that framing's PA is 180° from the recorded one. */
  framingFlipped: z.boolean(),
  byFilter: z.array(filterIntegrationSchema),
});
export type RecordedFraming = z.infer<typeof recordedFramingSchema>;

/** One night of a target. */
export const historyNightSchema = z.object({ nightDate: z.string(), byFilter: z.array(filterIntegrationSchema), seconds: z.number() });

/** Answer of GET /api/history/targets/:id (or /api/history/objects/:label for unmatched frames). */
export const targetHistorySchema = z.object({
  target: historyTargetSchema,
  framings: z.array(recordedFramingSchema),
  /** Oldest first. */
  nights: z.array(historyNightSchema),
  /** Lights without a plate solution (counted in nights and totals, not in framings). */
  unsolvedFrames: z.number().int(),
});
export type TargetHistory = z.infer<typeof targetHistorySchema>;

/** Body of POST /api/history/targets/:id/continue. */
export const continueRequestSchema = z.object({
  framingKey: z.string().min(1, 'Choose a recorded framing'),
  /** The PA to continue at: the recorded one or the one 180° from it (the user decides). */
  positionAngleDeg: z.number().min(0).lt(360),
  /** Add the stage to this recipe (with its version), else create a new recipe. */
  recipeId: id.optional(),
  version: z.number().int().positive().optional(),
});

/** Body of POST/DELETE /api/history/targets/:id/shares. */
export const captureShareSchema = z.object({ organizationId: z.string().min(1, 'Choose a club') });

/** One row of GET /api/clubs/:id/captures: a member's shared target summary. */
export const sharedCaptureSchema = z.object({
  ownerName: z.string(),
  designation: z.string(),
  name: z.string(),
  frames: z.number().int(),
  seconds: z.number(),
  nights: z.number().int(),
  lastNight: z.string(),
  byFilter: z.array(filterIntegrationSchema),
});
export type SharedCapture = z.infer<typeof sharedCaptureSchema>;
