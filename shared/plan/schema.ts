import { z } from 'zod';
import { idSchema } from '@/shared/recipe/fields';
import { treeLimitIssues } from '@/shared/recipe/limits';
import { recipeSchema, recipeTreeSchema } from '@/shared/recipe/schema';
import { rigInputSchema } from '@/shared/rig/schema';
import { nightDateSchema } from '@/shared/schemas/night';
import { siteInputSchema } from '@/shared/schemas/site';
import { framingInputSchema } from '@/shared/schemas/target';
import { catalogueObjectSchema } from '@/shared/targets/schema';
import { planEstimateSchema } from '@/shared/plan/estimate-schema';
import { isoInstantSchema } from '@/shared/plan/fields';

/*
 * The plan (`format: nightloom.plan/1`), built from the same schemas that validate the forms and
 * the API: the site, the whole rig, the recipe tree. No transforms, so the JSON Schema in
 * `schemas/` is generated from these. Unknown keys are dropped (a minor version may add some).
 */

/** A section's own error: missing, or not a mapping. */
const section = (name: string) => ({
  error: (issue: { input?: unknown }) => (issue.input === undefined ? `The plan needs a ${name} section` : `${name} must be a mapping of keys and values`),
});

/** Who made the plan and from what. */
export const planMetaSchema = z.object({
  title: z.string({ error: 'Title must be text' }).trim().min(1, 'Give the plan a title').max(160, 'A title has at most 160 characters'),
  author: z.string({ error: 'Author must be text' }).trim().max(120, 'An author has at most 120 characters').default(''),
  /** When the plan was written, ISO 8601 with the site's offset. */
  created: isoInstantSchema,
  /** The recipe it was exported from (in the author's account), or null. */
  sourceRecipeId: idSchema.nullable().default(null),
  generator: z.string({ error: 'Generator must be text' }).trim().max(120, 'A generator has at most 120 characters').default(''),
}, section('meta'));

/** The site as the plan needs it (a user's "default" flag is theirs, not the plan's). */
export const planSiteSchema = z.object(siteInputSchema.omit({ isDefault: true }).shape, section('site'));

/** The night the plan was made for; darkness is astronomical (Sun below −18°), null when there is none. */
export const planNightSchema = z.object({
  date: nightDateSchema,
  darknessStart: isoInstantSchema.nullable().default(null),
  darknessEnd: isoInstantSchema.nullable().default(null),
}, section('night'));

/** A framing of a target; its `id` is what a flats step's `matchFramingOf.framingId` names. */
export const planFramingSchema = framingInputSchema
  .pick({ name: true, raDeg: true, decDeg: true, positionAngleDeg: true, mosaicCols: true, mosaicRows: true, overlapPct: true })
  .extend({ id: idSchema });

const o = catalogueObjectSchema.shape;

/** A target a stage points at: its catalogue facts (J2000, degrees) and framings, first one used. */
export const planTargetSchema = z.object({
  id: idSchema,
  designation: o.designation,
  aliases: o.aliases,
  name: o.name,
  type: o.type.default('other'),
  raDeg: o.raDeg,
  decDeg: o.decDeg,
  majorArcmin: o.majorArcmin.default(0),
  minorArcmin: o.minorArcmin,
  positionAngleDeg: o.positionAngleDeg,
  magnitude: o.magnitude,
  framings: z.array(planFramingSchema).max(50, 'At most 50 framings per target').default([]),
});

/** The recipe: its name, notes and tree (`children`), at most 8 levels deep and 2000 nodes. */
export const planRecipeSchema = z
  .object({ name: recipeSchema.shape.name, notes: recipeSchema.shape.notes, children: recipeTreeSchema.shape.children }, section('recipe'))
  .superRefine((recipe, ctx) => {
    for (const issue of treeLimitIssues(recipe)) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  });

export const PLAN_SECTIONS = ['format', 'meta', 'site', 'rig', 'night', 'targets', 'recipe', 'estimate'] as const;

/** A whole plan. Stages may only point at targets the plan carries. */
export const planSchema = z
  .object({
    format: z
      .string({ error: 'Format must be text' })
      .regex(/^nightloom\.plan\/1(\.\d+)?$/, 'Format is nightloom.plan/1')
      .describe('nightloom.plan/<major>[.<minor>]: a reader refuses another major version and ignores keys a newer minor adds'),
    meta: planMetaSchema.describe('Title, author, when it was written (ISO 8601 with the site offset), source recipe, generator'),
    site: planSiteSchema.describe('Where: coordinates in degrees, elevation in metres, IANA time zone, horizon profile, minimum altitude, night temperatures'),
    rig: z.object(rigInputSchema.shape, section('rig')).describe('The equipment: optics, camera, filter wheel with focus offsets, focuser, rotator, mount limits, guider'),
    night: planNightSchema.describe('The evening the night starts on and its astronomical darkness'),
    targets: z.array(planTargetSchema).max(200, 'A plan carries at most 200 targets').default([]).describe('The targets the stages point at (J2000, degrees) with their framings'),
    recipe: planRecipeSchema.describe('The recipe: name, notes and the tree of steps under children'),
    estimate: planEstimateSchema.optional().describe('The dry run at export time, for reading; never an input'),
  })
  .superRefine((plan, ctx) => {
    const ids = new Set<string>();
    plan.targets.forEach((t, i) => {
      if (ids.has(t.id)) ctx.addIssue({ code: 'custom', path: ['targets', i, 'id'], message: `Two targets have the id ${t.id}` });
      ids.add(t.id);
    });
    for (const { path, targetId } of stageTargets(plan.recipe.children, ['recipe', 'children'])) {
      if (!ids.has(targetId)) ctx.addIssue({ code: 'custom', path: [...path, 'targetId'], message: `No target with the id ${targetId} under targets` });
    }
  })
  .meta({ title: 'Nightloom plan', description: 'An imaging night: site, rig, night, targets and the recipe tree (format nightloom.plan/1).' });

export type Plan = z.output<typeof planSchema>;
export type PlanInput = z.input<typeof planSchema>;
export type PlanTarget = z.output<typeof planTargetSchema>;
export type PlanSite = z.output<typeof planSiteSchema>;

interface StageRef {
  path: (string | number)[];
  targetId: string;
}

/** Every stage that names a target, with its path, without recursion (trees are bounded anyway). */
function stageTargets(children: Plan['recipe']['children'], base: (string | number)[]): StageRef[] {
  const out: StageRef[] = [];
  const stack = [{ list: children, path: base }];
  while (stack.length) {
    const { list, path } = stack.pop()!;
    list.forEach((node, i) => {
      if (node.kind === 'stage' && node.targetId !== null) out.push({ path: [...path, i], targetId: node.targetId });
      if ('children' in node) stack.push({ list: node.children, path: [...path, i, 'children'] });
    });
  }
  return out;
}
