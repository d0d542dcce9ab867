import { runDryRun } from '@/shared/dry-run';
import { computeNight } from '@/shared/ephemeris/night';
import type { RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';
import { isoWithOffset } from '@/shared/time';
import { planDryRunInput, planEstimate } from '@/shared/plan/estimate';
import { PLAN_FORMAT } from '@/shared/plan/format';
import { planSchema, type Plan, type PlanSite, type PlanTarget } from '@/shared/plan/schema';

export interface PlanSource {
  recipe: { id: string | null; name: string; notes: string; tree: RecipeTree };
  site: PlanSite;
  rig: RigInput;
  /** The targets the tree's stages point at, with their framings (first one used). */
  targets: PlanTarget[];
  /** The evening the night starts on, YYYY-MM-DD (local at the site). */
  nightDate: string;
  author: string;
  generator: string;
  now: Date;
  /** Run the dry run and add its summary and findings as `estimate`. */
  withEstimate: boolean;
}

/**
 * A plan from a recipe and what it needs: the night's astronomical darkness from the ephemeris,
 * every time with the site's offset, and optionally the dry run's estimate. The result is
 * parsed by the plan schema, so it exports exactly as it will import. Throws a ZodError when
 * the data do not make a valid plan (e.g. a stage pointing at a target that is not given).
 */
export function buildPlan(src: PlanSource): Plan {
  const zone = src.site.timeZone;
  const night = computeNight(src.site, src.nightDate);
  const plan = planSchema.parse({
    format: PLAN_FORMAT,
    meta: {
      title: `${src.recipe.name} · ${src.nightDate}`,
      author: src.author,
      created: isoWithOffset(src.now, zone),
      sourceRecipeId: src.recipe.id,
      generator: src.generator,
    },
    site: src.site,
    rig: src.rig,
    night: {
      date: src.nightDate,
      darknessStart: night.darkStart ? isoWithOffset(night.darkStart, zone) : null,
      darknessEnd: night.darkEnd ? isoWithOffset(night.darkEnd, zone) : null,
    },
    targets: src.targets,
    recipe: { name: src.recipe.name, notes: src.recipe.notes, children: src.recipe.tree.children },
  });
  if (!src.withEstimate) return plan;
  const input = planDryRunInput(plan);
  return { ...plan, estimate: planEstimate(runDryRun(input), input, src.now) };
}
