import { isMap, isScalar, isSeq, type Document, type LineCounter } from 'yaml';
import type { z } from 'zod';
import { printablePath, treeLimitIssues } from '@/shared/recipe/limits';
import { checkFormat, PLAN_LIMITS } from '@/shared/plan/format';
import { planSchema, type Plan } from '@/shared/plan/schema';
import { firstAliasOffset, positionOf, readYaml, type PlanIssue } from '@/shared/plan/yaml-read';

export type { PlanIssue } from '@/shared/plan/yaml-read';

export type ImportResult = { ok: true; plan: Plan } | { ok: false; errors: PlanIssue[] };

const fail = (message: string, line: number | null = null, column: number | null = null, path = ''): ImportResult => ({ ok: false, errors: [{ line, column, path, message }] });

/** Size of text in UTF-8 bytes, without encoding more than needed to know it is too large. */
function utf8Bytes(text: string): number {
  if (text.length > PLAN_LIMITS.maxBytes) return text.length;
  return new TextEncoder().encode(text).length;
}

const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/**
 * Reads a plan (plan-format.md). In order, each step refusing with line, column and path:
 * the size limit (before any parsing), YAML syntax with duplicate keys refused and a token guard
 * against nesting bombs, a mapping at the top, `format` (another major version is refused,
 * minor additions are read), node count and depth, aliases (at most PLAN_LIMITS.maxAliasCount
 * expansions), the recipe tree's limits, then the zod schema. Never throws.
 */
export function importPlan(text: string): ImportResult {
  try {
    if (typeof text !== 'string') return fail('Send the plan as YAML text');
    const bytes = utf8Bytes(text);
    if (bytes > PLAN_LIMITS.maxBytes) return fail(`The plan is ${megabytes(bytes)}; at most ${megabytes(PLAN_LIMITS.maxBytes)} is read`);
    if (text.trim() === '') return fail('The plan is empty', 1, 1);
    const read = readYaml(text);
    if (!read.ok) return read;
    return checkDocument(read.doc, read.lines);
  } catch (err) {
    // Nothing above should throw; if a reader does, the answer is still a refusal, not a crash.
    return fail(`The plan could not be read (${err instanceof Error ? err.message : String(err)})`);
  }
}

function checkDocument(doc: Document.Parsed, lines: LineCounter): ImportResult {
  const root = doc.contents;
  if (!isMap(root)) {
    const what = isSeq(root) ? 'a list' : isScalar(root) ? 'a single value' : 'empty';
    const pos = positionOf(doc, lines, []);
    return fail(`A plan is a YAML mapping of sections (format, meta, site, rig, night, targets, recipe); this document is ${what}`, pos.line ?? 1, pos.column ?? 1);
  }
  const format = checkFormat(doc.get('format'));
  if (!format.ok) {
    const pos = doc.has('format') ? positionOf(doc, lines, ['format']) : { line: 1, column: 1 };
    return fail(format.message, pos.line, pos.column, 'format');
  }
  let data: unknown;
  try {
    data = doc.toJS({ maxAliasCount: PLAN_LIMITS.maxAliasCount });
  } catch {
    const offset = firstAliasOffset(root);
    const pos = offset === null ? null : lines.linePos(offset);
    return fail(`The plan expands YAML aliases too often (at most ${PLAN_LIMITS.maxAliasCount} expansions)`, pos?.line ?? null, pos?.col ?? null);
  }
  const recipe = (data as { recipe?: unknown }).recipe;
  const limits = treeLimitIssues(recipe);
  if (limits.length > 0) return { ok: false, errors: limits.map((issue) => located(doc, lines, ['recipe', ...issue.path], issue.message)) };
  const parsed = planSchema.safeParse(data);
  if (parsed.success) return { ok: true, plan: parsed.data };
  return { ok: false, errors: zodIssues(doc, lines, parsed.error.issues) };
}

function located(doc: Document.Parsed, lines: LineCounter, path: readonly PropertyKey[], message: string): PlanIssue {
  const printable = printablePath(path.map((p) => (typeof p === 'number' ? p : String(p))));
  return { ...positionOf(doc, lines, path), path: printable, message };
}

/** Zod issues with their YAML positions, in document order, at most PLAN_LIMITS.maxIssues. */
function zodIssues(doc: Document.Parsed, lines: LineCounter, issues: z.core.$ZodIssue[]): PlanIssue[] {
  const out = issues.slice(0, PLAN_LIMITS.maxIssues).map((issue) => located(doc, lines, issue.path, issue.message));
  out.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
  if (issues.length > PLAN_LIMITS.maxIssues) out.push({ line: null, column: null, path: '', message: `${issues.length - PLAN_LIMITS.maxIssues} more problems not listed` });
  return out;
}
