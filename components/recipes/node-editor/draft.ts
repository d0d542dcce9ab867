import { getPath, setPath, type DraftValue, type DraftValues, type FieldSpec, type NodeDraft } from '@/components/recipes/node-editor/draft-types';
import { KIND_FIELDS } from '@/components/recipes/node-editor/kind-fields';
import { rulesToDrafts, ruleDraftsToInput } from '@/components/recipes/node-editor/rules-draft';
import { parseNumberText } from '@/lib/number-text';
import { isContainer, type RecipeNode } from '@/shared/recipe/types';
import { parseDec, parseRa } from '@/shared/targets/coordinates';

/** The draft value of one field, read from a node (or the field's starting value). */
function draftValueOf(spec: FieldSpec, node: RecipeNode): DraftValue {
  const raw = getPath(node, spec.path);
  switch (spec.type) {
    case 'mode':
      return spec.derive ? spec.derive(node) : (spec.initial ?? '');
    case 'keep':
      return raw !== undefined;
    case 'flag':
    case 'true':
      return typeof raw === 'boolean' ? raw : (spec.initial ?? false);
    case 'numberList':
    case 'textList':
      return Array.isArray(raw) ? raw.map(String).join(', ') : '';
    case 'number':
    case 'optionalNumber':
    case 'ra':
    case 'dec':
      return typeof raw === 'number' ? String(raw) : (spec.initial ?? '');
    default:
      return typeof raw === 'string' ? raw : (spec.initial ?? '');
  }
}

/** The editable draft of a node: every parameter of its kind as text, flags and choices. */
export function nodeToDraft(node: RecipeNode): NodeDraft {
  const values: DraftValues = { label: node.label ?? '', enabled: node.enabled };
  for (const spec of KIND_FIELDS[node.kind]) values[spec.path] = draftValueOf(spec, node);
  return { kind: node.kind, values, rules: isContainer(node) ? rulesToDrafts(node.rules) : [] };
}

/** Text of a coordinate: plain degrees, or what the shared sexagesimal parser reads. */
function coordinate(text: string, parse: typeof parseRa): { value: number; error?: string } {
  const degrees = parseNumberText(text);
  if (Number.isFinite(degrees) || text.trim() === '') return { value: degrees };
  const result = parse(text);
  return result.ok ? { value: result.valueDeg } : { value: Number.NaN, error: result.error };
}

const listItems = (text: string, separator: RegExp) =>
  text
    .split(separator)
    .map((s) => s.trim())
    .filter((s) => s !== '');

/** A field's value for the node; `skip` leaves the parameter out, `error` is a parse message. */
type Parsed = { skip: true } | { skip: false; value: unknown; error?: string };

function parseField(spec: FieldSpec, value: DraftValue | undefined, base: RecipeNode): Parsed {
  const text = typeof value === 'string' ? value : '';
  switch (spec.type) {
    case 'mode':
      return { skip: true };
    case 'keep': {
      const kept = getPath(base, spec.path);
      return value === true && kept !== undefined ? { skip: false, value: kept } : { skip: true };
    }
    case 'flag':
      return { skip: false, value: value === true };
    case 'true':
      return { skip: false, value: true };
    case 'optionalNumber':
      return text.trim() === '' ? { skip: true } : { skip: false, value: parseNumberText(text) };
    case 'number':
      return { skip: false, value: parseNumberText(text) };
    case 'ra':
    case 'dec':
      return { skip: false, ...coordinate(text, spec.type === 'ra' ? parseRa : parseDec) };
    case 'numberList':
      // A comma in a list separates items, so decimals take a point here.
      return { skip: false, value: listItems(text, /[,;\s]+/).map(parseNumberText) };
    case 'textList':
      return { skip: false, value: listItems(text, /[,;]/) };
    case 'nullableId':
      return { skip: false, value: text === '' ? null : text };
    case 'optionalText':
      return text.trim() === '' ? { skip: true } : { skip: false, value: text };
    default:
      return { skip: false, value: text };
  }
}

/**
 * The draft in the shape `nodeSchema` checks: the node's id, kind and children unchanged, the
 * parameters parsed from text. `parseErrors` holds messages for text no number reads from
 * (coordinates), keyed by draft path; the schema reports everything else.
 */
export function draftToInput(draft: NodeDraft, base: RecipeNode): { input: Record<string, unknown>; parseErrors: Record<string, string> } {
  const input: Record<string, unknown> = { id: base.id, kind: base.kind, enabled: draft.values.enabled !== false };
  const label = typeof draft.values.label === 'string' ? draft.values.label : '';
  if (label.trim() !== '') input.label = label;
  const parseErrors: Record<string, string> = {};
  for (const spec of KIND_FIELDS[base.kind]) {
    if (spec.include && !spec.include(draft.values)) continue;
    const parsed = parseField(spec, draft.values[spec.path], base);
    if (parsed.skip) continue;
    setPath(input, spec.path, parsed.value);
    if (parsed.error) parseErrors[spec.path] = parsed.error;
  }
  if (isContainer(base)) {
    input.children = base.children;
    input.rules = ruleDraftsToInput(draft.rules);
  }
  return { input, parseErrors };
}
