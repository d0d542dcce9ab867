import { Document, isMap, isScalar, isSeq, Scalar, type Node } from 'yaml';
import { needsQuotes, PLAN_HEADER, SECTION_COMMENTS, unitComment } from '@/shared/plan/comments';
import { PLAN_FORMAT } from '@/shared/plan/format';
import { orderKeys } from '@/shared/plan/order';
import { planSchema, type PlanInput } from '@/shared/plan/schema';

/** Lists of alike items: only the first item carries unit comments. */
const REPEATED_LISTS = new Set(['horizon', 'slots', 'gainPresets', 'offsetPresets', 'framings', 'integrationByFilter', 'stages', 'frames', 'findings']);

/**
 * Writes a plan as YAML 1.2 (plan-format.md): block style, the key order of `order.ts`, unit
 * comments, strings a YAML 1.1 reader would misread in double quotes, no line folding. The plan
 * is parsed first (defaults filled, unknown keys dropped, `format` written as this version's),
 * so exporting an imported plan gives the same bytes. Throws a ZodError for an invalid plan.
 */
export function exportPlan(plan: PlanInput): string {
  const parsed = planSchema.parse(plan);
  const doc = new Document(orderKeys({ ...parsed, format: PLAN_FORMAT }), { version: '1.2' });
  doc.commentBefore = PLAN_HEADER;
  decorate(doc.contents as Node, null, true);
  return doc.toString({ lineWidth: 0, indent: 2, indentSeq: true });
}

/** Adds unit and section comments and quotes ambiguous strings, walking the document once. */
function decorate(node: Node, parentKey: string | null, withUnits: boolean): void {
  if (isSeq(node)) {
    node.items.forEach((item, i) => decorate(item as Node, parentKey, withUnits && !(i > 0 && parentKey !== null && REPEATED_LISTS.has(parentKey))));
    return;
  }
  if (isScalar(node)) {
    if (typeof node.value === 'string' && needsQuotes(node.value)) node.type = Scalar.QUOTE_DOUBLE;
    return;
  }
  if (!isMap(node)) return;
  const atRoot = parentKey === null;
  for (const pair of node.items) {
    const key = isScalar(pair.key) ? String(pair.key.value) : '';
    const value = pair.value as Node | null;
    if (atRoot && key !== 'format' && isScalar(pair.key)) {
      pair.key.spaceBefore = true;
      if (SECTION_COMMENTS[key]) pair.key.commentBefore = SECTION_COMMENTS[key];
    }
    const unit = withUnits ? unitComment(key) : undefined;
    if (unit && value && isScalar(value) && typeof value.value === 'number') value.comment = ` ${unit}`;
    else if (unit && value && (isSeq(value) || isMap(value)) && isScalar(pair.key)) pair.key.comment = ` ${unit}`;
    if (value) decorate(value, key, withUnits && key !== 'estimate');
  }
}
