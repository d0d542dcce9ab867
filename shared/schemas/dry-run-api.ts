import { z } from 'zod';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { nightDateSchema } from '@/shared/schemas/night';

const id = z.string().uuid('Not an id');

/** Body of POST /api/recipes/:id/dry-runs: the night, and optionally another rig or site. */
export const dryRunRequestSchema = z.object({
  date: nightDateSchema.optional(),
  startTime: z.iso.datetime({ offset: true, error: 'Use an ISO 8601 time with its offset' }).optional(),
  rigId: id.nullable().optional(),
  siteId: id.nullable().optional(),
});

/** Body of POST /api/dry-runs: an unsaved tree (the composer's current state). */
export const dryRunTreeRequestSchema = dryRunRequestSchema.extend({ tree: recipeTreeSchema });

/** Query of GET /api/recipes/:id/scan (Server-Sent Events). */
export const scanQuerySchema = z.object({
  from: nightDateSchema,
  nights: z.coerce.number().int().min(1, 'At least one night').max(366, 'At most a year (366 nights)'),
  siteId: id.optional(),
  rigId: id.optional(),
});
