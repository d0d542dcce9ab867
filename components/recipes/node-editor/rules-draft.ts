import type { RuleDraft } from '@/components/recipes/node-editor/draft-types';
import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import type { RuleKind } from '@/shared/recipe/rules';
import type { RecipeRule } from '@/shared/recipe/types';
import { parseNumberText } from '@/lib/number-text';

/** What each rule is called in the editor. */
export const RULE_LABELS: Record<RuleKind, string> = {
  'refocus-on-temperature': 'Refocus on temperature change',
  'refocus-on-interval': 'Refocus at an interval',
  'recentre-on-drift': 'Recentre on drift',
};

/** The draft of one rule; fields of other rule kinds keep their starting values. */
export function ruleToDraft(rule: RecipeRule): RuleDraft {
  const draft = newRuleDraft(rule.kind, rule.id);
  if (rule.kind === 'refocus-on-temperature') return { ...draft, deltaC: String(rule.deltaC) };
  if (rule.kind === 'recentre-on-drift') return { ...draft, driftArcmin: String(rule.driftArcmin) };
  if (rule.every.frames !== undefined) return { ...draft, everyMode: 'frames', everyValue: String(rule.every.frames) };
  return { ...draft, everyMode: 'minutes', everyValue: String(rule.every.minutes ?? '') };
}

export function rulesToDrafts(rules: readonly RecipeRule[]): RuleDraft[] {
  return rules.map(ruleToDraft);
}

/** A new rule with the defaults of trade-defaults.md (RECIPE_DEFAULTS.rules). */
export function newRuleDraft(kind: RuleKind, id: string): RuleDraft {
  return {
    id,
    kind,
    deltaC: String(D.rules.refocusDeltaC),
    everyMode: 'minutes',
    everyValue: String(D.rules.refocusEveryMinutes),
    driftArcmin: String(D.rules.recentreDriftArcmin),
  };
}

/** The rules in the shape `ruleSchema` checks. */
export function ruleDraftsToInput(rules: readonly RuleDraft[]): Record<string, unknown>[] {
  return rules.map((r) => {
    switch (r.kind) {
      case 'refocus-on-temperature':
        return { id: r.id, kind: r.kind, deltaC: parseNumberText(r.deltaC) };
      case 'recentre-on-drift':
        return { id: r.id, kind: r.kind, driftArcmin: parseNumberText(r.driftArcmin) };
      case 'refocus-on-interval':
        return { id: r.id, kind: r.kind, every: { [r.everyMode]: parseNumberText(r.everyValue) } };
    }
  });
}

/**
 * Draft paths of a rule's fields, as the editor's testIDs and error keys name them:
 * `rules.0.deltaC`, `rules.1.every.minutes`, `rules.2.driftArcmin`.
 */
export function ruleFieldPath(index: number, rule: RuleDraft): string {
  if (rule.kind === 'refocus-on-temperature') return `rules.${index}.deltaC`;
  if (rule.kind === 'recentre-on-drift') return `rules.${index}.driftArcmin`;
  return `rules.${index}.every.${rule.everyMode}`;
}
