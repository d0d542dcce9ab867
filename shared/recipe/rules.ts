import { z } from 'zod';
import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import { between, exactlyOne, idSchema, whole } from '@/shared/recipe/fields';

/** Standing conditions attached to a container, checked while it runs (recipe.md "Rules"). */
export const ruleSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      id: idSchema,
      kind: z.literal('refocus-on-temperature'),
      deltaC: between('Temperature change', '°C', 0.1, 10).default(D.rules.refocusDeltaC),
    }),
    z.object({
      id: idSchema,
      kind: z.literal('refocus-on-interval'),
      every: exactlyOne('Refocus every', {
        minutes: between('Refocus interval', 'min', 1, 1440),
        frames: whole('Refocus interval', 'frames', 1, 10000),
      }),
    }),
    z.object({
      id: idSchema,
      kind: z.literal('recentre-on-drift'),
      driftArcmin: between('Drift', '′', 0.1, 60).default(D.rules.recentreDriftArcmin),
    }),
  ],
  { error: 'Rule is one of refocus-on-temperature, refocus-on-interval or recentre-on-drift' },
);

export const rulesSchema = z.array(ruleSchema).max(20, 'At most 20 rules on a container').default([]);

export const RULE_KINDS = ['refocus-on-temperature', 'refocus-on-interval', 'recentre-on-drift'] as const;
export type RuleKind = (typeof RULE_KINDS)[number];
