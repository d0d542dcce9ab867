import { draftToInput } from '@/components/recipes/node-editor/draft';
import type { NodeDraft } from '@/components/recipes/node-editor/draft-types';
import { KIND_FIELDS } from '@/components/recipes/node-editor/kind-fields';
import { ruleFieldPath } from '@/components/recipes/node-editor/rules-draft';
import { nodeSchema } from '@/shared/recipe/schema';
import type { RecipeNode } from '@/shared/recipe/types';

/** Field errors by draft path; `_` holds what belongs to no field. */
export type FieldErrorMap = Record<string, string>;

export type ApplyResult = { ok: true; node: RecipeNode } | { ok: false; errors: FieldErrorMap };

/** Every draft path that has a field on screen for this draft. */
export function draftFieldPaths(draft: NodeDraft): Set<string> {
  const paths = new Set(['label', 'enabled', ...KIND_FIELDS[draft.kind].map((s) => s.path)]);
  draft.rules.forEach((rule, i) => {
    paths.add(ruleFieldPath(i, rule));
    if (rule.kind === 'refocus-on-interval') paths.add(`rules.${i}.every.mode`);
  });
  return paths;
}

// The shared `exactlyOne` reports a bad branch on the union as "What: key is not valid (inner)".
const UNION_BRANCH = /^[^:]+: (\w+) is not valid \((.*)\)$/s;

/**
 * The field an issue belongs to: its own path when that is a field; the chosen branch of a
 * union ("until" → "until.count", with the inner message); the union's chooser ("until.mode");
 * else the nearest enclosing field ("exposuresS.1" → "exposuresS").
 */
export function fieldForIssue(path: readonly PropertyKey[], message: string, fields: Set<string>): { field: string; message: string } {
  const key = path.map(String).join('.');
  if (fields.has(key)) return { field: key, message };
  const branch = UNION_BRANCH.exec(message);
  if (branch && fields.has(`${key}.${branch[1]}`)) return { field: `${key}.${branch[1]}`, message: branch[2] ?? message };
  if (fields.has(`${key}.mode`)) return { field: `${key}.mode`, message };
  for (let n = path.length - 1; n > 0; n--) {
    const parent = path.slice(0, n).map(String).join('.');
    if (fields.has(parent)) return { field: parent, message };
    if (fields.has(`${parent}.mode`)) return { field: `${parent}.mode`, message };
  }
  return { field: '_', message };
}

const CLOCK_ONLY = 'Use a time as HH:MM (24-hour, local at the site) or ISO 8601 with an offset';

/**
 * Parses the draft into a node of the same id, kind and children and checks it with the shared
 * `nodeSchema`. Errors come back keyed by the draft path of the field they belong under.
 */
export function applyDraft(draft: NodeDraft, base: RecipeNode): ApplyResult {
  const { input, parseErrors } = draftToInput(draft, base);
  const parsed = nodeSchema.safeParse(input);
  if (parsed.success && Object.keys(parseErrors).length === 0) return { ok: true, node: parsed.data };
  const fields = draftFieldPaths(draft);
  const errors: FieldErrorMap = { ...parseErrors };
  for (const issue of parsed.success ? [] : parsed.error.issues) {
    const { field, message } = fieldForIssue(issue.path, issue.message, fields);
    // A window edge typed as a clock time needs only the clock half of the shared message.
    if (!(field in errors)) errors[field] = draft.values[`${field}.mode`] === 'clock' ? CLOCK_ONLY : message;
  }
  return { ok: false, errors };
}
