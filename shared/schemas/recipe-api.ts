import { z } from 'zod';
import { recipeSchema, recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeTree } from '@/shared/recipe/types';

const id = z.string().uuid('Not an id');

/** How a new recipe starts: empty, a built-in starter for chosen targets, a copy, or a given tree. */
export const recipeStartSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('empty') }),
    z.object({ kind: z.literal('starter'), targetIds: z.array(id).max(20, 'At most 20 targets').default([]) }),
    z.object({ kind: z.literal('copy'), recipeId: id }),
    z.object({ kind: z.literal('tree'), tree: recipeTreeSchema }),
  ],
  { error: 'Start from empty, starter, copy or tree' },
);

export const recipeCreateSchema = z.object({
  name: recipeSchema.shape.name.optional(),
  notes: recipeSchema.shape.notes,
  rigId: recipeSchema.shape.rigId,
  siteId: recipeSchema.shape.siteId,
  start: recipeStartSchema.default({ kind: 'empty' }),
});
export type RecipeCreate = z.input<typeof recipeCreateSchema>;

/** A save: the whole recipe plus the version the client last saw. */
export const recipeSaveSchema = recipeSchema.extend({ version: z.number().int().positive() });
export type RecipeSave = z.input<typeof recipeSaveSchema>;

export interface RecipeDetail {
  id: string;
  name: string;
  notes: string;
  rigId: string | null;
  siteId: string | null;
  tree: RecipeTree;
  version: number;
  createdAt: string;
  updatedAt: string;
  deletedAt: string | null;
}

export interface RecipeListItem {
  id: string;
  name: string;
  rigId: string | null;
  rigName: string | null;
  siteId: string | null;
  siteName: string | null;
  nodeCount: number;
  targetCount: number;
  plannedExposureS: number;
  /** End of the night's plan from the last dry run, when one was made (ISO). */
  lastDryRunEnd: string | null;
  /** True when the recipe changed after its last dry run; null when it has none. */
  lastDryRunStale: boolean | null;
  version: number;
  updatedAt: string;
  deletedAt: string | null;
}

export interface RecipeRevisionSummary {
  version: number;
  name: string;
  nodeCount: number;
  createdAt: string;
}

export const recipeListQuerySchema = z.object({
  q: z.string().max(100).optional(),
  sort: z.enum(['updated', 'name', 'exposure']).default('updated'),
});
