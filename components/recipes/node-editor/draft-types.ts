import type { RuleKind } from '@/shared/recipe/rules';
import type { NodeKind, RecipeNode } from '@/shared/recipe/types';

/*
 * The editor's draft: every field as the user sees it, keyed by the parameter's dotted path in
 * the node ("exposureS", "until.count", "window.minAltitudeDeg"). Numbers stay text until
 * Apply, so "-4", "3," or an empty box can be edited. Keys ending in ".mode" live only in the
 * draft: they say which branch of a union is shown (e.g. which `until` key a repeat uses).
 */

export type DraftValue = string | boolean;
export type DraftValues = Record<string, DraftValue>;

/** One rule of a container, keyed by its id so list rows keep their identity. */
export type RuleDraft = {
  id: string;
  kind: RuleKind;
  deltaC: string;
  /** Which key `every` uses: "minutes" or "frames". */
  everyMode: 'minutes' | 'frames';
  everyValue: string;
  driftArcmin: string;
};

export type NodeDraft = {
  kind: NodeKind;
  values: DraftValues;
  rules: RuleDraft[];
};

/** How a field's draft text becomes (part of) the node. */
export type FieldType =
  /** A number; blank is an error. */
  | 'number'
  /** A number; blank leaves the parameter out (the context's default). */
  | 'optionalNumber'
  /** Right ascension: degrees, or hours as 05:35:17 / 5.59h. */
  | 'ra'
  /** Declination: degrees, or ±DD:MM:SS. */
  | 'dec'
  /** Text; blank is kept (the schema says what is missing). */
  | 'text'
  /** Text; blank leaves the parameter out. */
  | 'optionalText'
  /** A comma list of numbers ("300, 120"). */
  | 'numberList'
  /** A comma list of names ("L, R, G"). */
  | 'textList'
  | 'flag'
  /** A fixed word written as is (a union's `kind`, a flats source). */
  | 'choice'
  /** A target id; blank is null. */
  | 'nullableId'
  /** Always `true` while included (rotate's `matchFraming`). */
  | 'true'
  /** Draft only: keeps the node's current value at this path when the flag is on. */
  | 'keep'
  /** Draft only: which branch of a union is shown. */
  | 'mode';

export type FieldSpec = {
  /** Draft key; also the node path unless the type is draft-only. */
  path: string;
  type: FieldType;
  /** Draft value when the node has none at `path` (a hidden branch, a new field). */
  initial?: DraftValue;
  /** Part of the node only while this holds (a union's chosen branch). */
  include?: (values: DraftValues) => boolean;
  /** For 'mode': the draft value read from a node. */
  derive?: (node: RecipeNode) => string;
};

/** The value at a dotted path of a plain object, or undefined. */
export function getPath(root: unknown, path: string): unknown {
  let node: unknown = root;
  for (const key of path.split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node;
}

/** Writes `value` at a dotted path, creating plain objects on the way (mutates `root`). */
export function setPath(root: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split('.');
  const last = keys.pop();
  if (last === undefined) return;
  let node = root;
  for (const key of keys) {
    const next = node[key];
    if (next === null || typeof next !== 'object') node[key] = {};
    node = node[key] as Record<string, unknown>;
  }
  node[last] = value;
}

/** A draft value as text ('' for a flag). */
export function textOf(values: DraftValues, path: string): string {
  const v = values[path];
  return typeof v === 'string' ? v : '';
}

/** A draft value as a flag. */
export function flagOf(values: DraftValues, path: string): boolean {
  return values[path] === true;
}
