import { z } from 'zod';
import { between, clockTimeSchema, decDegSchema, exactlyOne, idSchema, positionAngleSchema, raDegSchema, sunEventSchema, timeOrSunEventSchema, whole } from '@/shared/recipe/fields';
import { treeLimitIssues } from '@/shared/recipe/limits';
import { rulesSchema } from '@/shared/recipe/rules';
import { nodeBaseShape, stepSchemas } from '@/shared/recipe/steps';

/*
 * The recipe tree of recipe.md: containers (`stage`, `repeat`, `group`) hold `children` and
 * `rules`; steps are leaves. One discriminated union on `kind`, recursive through zod 4 getters.
 * The same schemas validate the composer's forms, the API and the YAML plan import.
 */

/** A stage's own pointing, overriding the target's framing (J2000, PA east of north). */
export const framingOverrideSchema = z.object({ raDeg: raDegSchema, decDeg: decDegSchema, positionAngleDeg: positionAngleSchema });

export const stageWindowSchema = z.object({
  notBefore: timeOrSunEventSchema.optional(),
  endBy: timeOrSunEventSchema.optional(),
  /** Empty: the site's minimum altitude. */
  minAltitudeDeg: between('Minimum altitude', '°', 0, 89).optional(),
  maxMoonIlluminationPct: between('Largest Moon illumination', '%', 0, 100).optional(),
  minMoonSeparationDeg: between('Moon separation', '°', 0, 180).optional(),
});

export const repeatUntilSchema = exactlyOne('Repeat until', {
  count: whole('Repeat count', '', 1, 10000),
  clock: clockTimeSchema,
  /** The enclosing stage's target sinks below this altitude. */
  altitudeBelowDeg: between('Altitude', '°', -10, 89),
  sunEvent: sunEventSchema,
});

export const stageSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('stage'),
  targetId: idSchema.nullable().default(null),
  framing: framingOverrideSchema.optional(),
  window: stageWindowSchema.default({}),
  get children(): ChildrenSchema {
    return childrenSchema();
  },
  rules: rulesSchema,
});

export const repeatSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('repeat'),
  until: repeatUntilSchema,
  get children(): ChildrenSchema {
    return childrenSchema();
  },
  rules: rulesSchema,
});

export const groupSchema = z.object({
  ...nodeBaseShape,
  kind: z.literal('group'),
  get children(): ChildrenSchema {
    return childrenSchema();
  },
  rules: rulesSchema,
});

export const NODE_KINDS = ['stage', 'repeat', 'group', 'cool', 'warm', 'slew', 'centre', 'rotate', 'focus', 'expose', 'guide', 'meridian', 'wait', 'flats', 'darks', 'park', 'note'] as const;

/** Any node of a recipe, told apart by `kind`. */
export const nodeSchema = z
  .discriminatedUnion('kind', [stageSchema, repeatSchema, groupSchema, ...stepSchemas], { error: `Kind is one of ${NODE_KINDS.join(', ')}` })
  .meta({ id: 'RecipeNode', description: 'A recipe step or container, told apart by kind' });

type ChildrenSchema = z.ZodDefault<z.ZodArray<typeof nodeSchema>>;
let children: ChildrenSchema | undefined;
/** Built once, on first use (the getters above run after `nodeSchema` exists). */
function childrenSchema(): ChildrenSchema {
  children ??= z.array(nodeSchema).default([]);
  return children;
}

/** The root of a recipe: a list of nodes, at most 8 levels deep and 2000 nodes in all. */
export const recipeTreeSchema = z
  .object({ children: z.array(nodeSchema, { error: 'The recipe is a list of steps under children' }) })
  .superRefine((tree, ctx) => {
    for (const issue of treeLimitIssues(tree)) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  });

/** A saved recipe: name, notes, the rig and site it was composed for, and the tree. */
export const recipeSchema = z.object({
  name: z.string({ error: 'Name must be text' }).trim().min(1, 'Give the recipe a name').max(80, 'A name has at most 80 characters'),
  notes: z.string({ error: 'Notes must be text' }).max(4000, 'Notes have at most 4000 characters').default(''),
  rigId: idSchema.nullable().default(null),
  siteId: idSchema.nullable().default(null),
  tree: recipeTreeSchema,
});
