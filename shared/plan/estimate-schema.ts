import { z } from 'zod';
import { idSchema } from '@/shared/recipe/fields';
import { nightDateSchema } from '@/shared/schemas/night';
import { isoInstantSchema } from '@/shared/plan/fields';

/*
 * The dry run's estimate at export time: informative (a reader may compare it with its own run),
 * never an input. Times are ISO 8601 with the site's offset.
 */

const text = (what: string, max: number) => z.string({ error: `${what} must be text` }).max(max, `${what} has at most ${max} characters`);
const frames = z.number({ error: 'Frames must be a number' }).int('Frames are a whole number').min(0, 'Frames cannot be negative');
const seconds = z.number({ error: 'Seconds must be a number' }).min(0, 'Seconds cannot be negative');

/** Light frames and shutter-open seconds of one filter. */
export const planFilterTotalSchema = z.object({ filter: text('Filter', 24), frames, seconds });

/** One stage of the timeline: when it starts and ends and what it takes. */
export const planStageEstimateSchema = z.object({
  nodeId: idSchema,
  /** Printable path in the tree, e.g. `children[1]`. */
  path: text('Path', 200),
  /** The stage's label, else its target's designation. */
  name: text('Name', 200),
  start: isoInstantSchema.nullable(),
  end: isoInstantSchema.nullable(),
  frames: z.array(planFilterTotalSchema).max(40, 'At most 40 filters'),
});

/** A finding of the dry run (severity stop, warn or info) with the step's path and a fix. */
export const planFindingSchema = z.object({
  code: text('Code', 60).min(1, 'Give a code'),
  severity: z.enum(['stop', 'warn', 'info'], { error: 'Severity is stop, warn or info' }),
  time: isoInstantSchema.nullable(),
  path: text('Path', 200).nullable(),
  message: text('Message', 2000),
  fix: text('Fix', 2000),
});

export const planEstimateSchema = z.object({
  generatedAt: isoInstantSchema,
  nightDate: nightDateSchema,
  /** When the last step ends. */
  nightEnd: isoInstantSchema.nullable(),
  /** Shutter-open time ÷ elapsed time, 0..1. */
  efficiency: z.number({ error: 'Efficiency must be a number' }).min(0, 'Efficiency is between 0 and 1').max(1, 'Efficiency is between 0 and 1'),
  shutterOpenS: seconds,
  integrationByFilter: z.array(planFilterTotalSchema).max(40, 'At most 40 filters'),
  stages: z.array(planStageEstimateSchema).max(2000, 'At most 2000 stages'),
  findings: z.array(planFindingSchema).max(2000, 'At most 2000 findings'),
});

export type PlanEstimate = z.output<typeof planEstimateSchema>;
export type PlanFilterTotal = z.output<typeof planFilterTotalSchema>;
export type PlanStageEstimate = z.output<typeof planStageEstimateSchema>;
export type PlanFinding = z.output<typeof planFindingSchema>;
