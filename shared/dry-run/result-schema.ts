import { z } from 'zod';
import { RECIPE_CHECK_CODES, type RecipeCheckCode } from '@/shared/recipe/checks-types';
import { nightSchema } from '@/shared/schemas/night';

/** Finding codes of the dry run (dry-run.md "Findings"). */
export const DRY_RUN_CODES = [
  'sun-near',
  'below-horizon',
  'never-rises',
  'daylight',
  'low-altitude',
  'moon-near',
  'past-dawn',
  'meridian-unhandled',
  'not-cooled',
  'filter-missing',
  'rotator-limit',
  'focus-drift',
  'darks-missing',
  'darks-stale',
  'unguided-long',
  'endless-repeat',
] as const;

export type DryRunCode = (typeof DRY_RUN_CODES)[number];
export type FindingCode = DryRunCode | RecipeCheckCode;

/** Every code a dry-run result carries: its own and the static checks' (merged in). */
export const FINDING_CODES = [...new Set<FindingCode>([...DRY_RUN_CODES, ...RECIPE_CHECK_CODES])] as unknown as readonly [FindingCode, ...FindingCode[]];

/** What a timeline event is: a step kind, a meridian `flip` (and its parts), a meridian `pause`. */
export const TIMELINE_KINDS = ['cool', 'warm', 'slew', 'centre', 'rotate', 'focus', 'expose', 'guide', 'flip', 'pause', 'wait', 'flats', 'darks', 'park'] as const;

/** Where the night's non-imaging time went. */
export const OVERHEAD_KINDS = ['cool', 'warm', 'slew', 'centre', 'rotate', 'focus', 'guide', 'flip', 'download', 'dither', 'filter-change', 'lost', 'flats', 'darks', 'park'] as const;

const iso = z.string();
const num = z.number();

export const timelineEventSchema = z.object({
  start: iso,
  end: iso,
  nodeId: z.string().nullable(),
  /** Printable path of the node, e.g. `children[2].children[0]`. */
  path: z.string().nullable(),
  kind: z.enum(TIMELINE_KINDS),
  /** Plain words, e.g. "L 20 × 180 s". */
  what: z.string(),
  altDeg: num.nullable(),
  azDeg: num.nullable(),
  hourAngleH: num.nullable(),
  pierSide: z.enum(['east', 'west']).nullable(),
  airmass: num.nullable(),
  moonSepDeg: num.nullable(),
  /** Sky position angle of the camera (east of north), when known. */
  skyPaDeg: num.nullable(),
  targetId: z.string().nullable(),
  filter: z.string().optional(),
  frames: z.number().int().optional(),
});

export const dryRunFindingSchema = z.object({
  code: z.enum(FINDING_CODES),
  severity: z.enum(['stop', 'warn', 'info']),
  time: iso.nullable(),
  nodeId: z.string().nullable(),
  path: z.string().nullable(),
  message: z.string(),
  fix: z.string(),
});

const frameTotal = z.object({ frames: z.number().int(), seconds: num });

export const dryRunTotalsSchema = z.object({
  /** Target id ('' for explicit pointing outside stages) → filter → frames and shutter seconds. */
  integrationByTargetAndFilter: z.record(z.string(), z.record(z.string(), frameTotal)),
  overheadByKind: z.record(z.string(), num),
  idleS: num,
  shutterOpenS: num,
  /** Shutter-open seconds of blocks with no sky finding (daylight, Moon, altitude, Sun). */
  usableShutterS: num,
  elapsedS: num,
  /** shutterOpenS ÷ elapsedS (trade-defaults.md rule 9: 65–90 % typical). */
  efficiency: num,
  stageFinish: z.array(z.object({ nodeId: z.string(), start: iso.nullable(), end: iso.nullable() })),
  nightEnd: iso.nullable(),
  /** Astronomical dawn. */
  dawn: iso.nullable(),
  slackBeforeFixed: z.array(z.object({ nodeId: z.string(), fixedAt: iso, slackS: num })),
});

export const darksNeededSchema = z.object({
  exposureS: num,
  gain: num.nullable(),
  offset: num.nullable(),
  binning: z.number().int(),
  readoutMode: z.string().nullable(),
  temperatureC: num,
  lightFrames: z.number().int(),
  /** A library set (any age) or tonight's darks step matches. */
  covered: z.boolean(),
  /** A match within the library's validity. */
  fresh: z.boolean(),
  nodeIds: z.array(z.string()),
});

export const dryRunSkySchema = nightSchema.extend({
  /** Days from full Moon at the middle of the night (the age of the moon-separation formula). */
  moonDaysFromFull: num,
});

/** The dry run's answer, as the API returns it. */
export const dryRunResultSchema = z.object({
  timeline: z.array(timelineEventSchema),
  findings: z.array(dryRunFindingSchema),
  totals: dryRunTotalsSchema,
  sky: dryRunSkySchema,
  darksNeeded: z.array(darksNeededSchema),
});
