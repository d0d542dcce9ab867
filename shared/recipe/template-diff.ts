import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

/*
 * A simple structural diff of two template trees, by position: the n-th child of a list is
 * compared with the n-th child of the other. Ids are ignored (a copy has fresh ones); a flats
 * step's reference to a stage is compared by the stage's position. A node whose kind differs
 * is one 'changed' entry (children included); extra or missing children are 'added'/'removed'.
 */

export interface TreeChange {
  /** Positions from the root, 0-based, joined by dots: "2.6.0" is the first child of the 7th child of the 3rd node. */
  path: string;
  kind: 'added' | 'removed' | 'changed';
  before?: unknown;
  after?: unknown;
}

/** Every node id of a tree → its position path. */
function positions(tree: RecipeTree): Map<string, string> {
  const out = new Map<string, string>();
  const visit = (node: RecipeNode, path: string) => {
    out.set(node.id, path);
    if ('children' in node) node.children.forEach((c, i) => visit(c, `${path}.${i}`));
  };
  tree.children.forEach((c, i) => visit(c, String(i)));
  return out;
}

/** A node's own settings without ids or children, in a comparable form. */
function ownPart(node: RecipeNode, where: Map<string, string>): Record<string, unknown> {
  const copy = JSON.parse(JSON.stringify(node)) as Record<string, unknown>;
  delete copy.id;
  delete copy.children;
  if (Array.isArray(copy.rules)) copy.rules = (copy.rules as Record<string, unknown>[]).map(({ id: _id, ...rest }) => rest);
  const ref = copy.matchFramingOf as { kind: string; stageId?: string } | undefined;
  if (ref?.kind === 'stage' && ref.stageId) copy.matchFramingOf = { kind: 'stage', stagePath: where.get(ref.stageId) ?? null };
  return copy;
}

/** Stable JSON (sorted keys) so key order never counts as a change. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    return `{${entries.sort(([a], [b]) => (a < b ? -1 : 1)).map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** The changes that turn `from` into `to` (see the module comment for the rules). */
export function diffTemplateTrees(from: RecipeTree, to: RecipeTree): TreeChange[] {
  const whereFrom = positions(from);
  const whereTo = positions(to);
  const changes: TreeChange[] = [];
  const whole = (node: RecipeNode, where: Map<string, string>): unknown => ({ ...ownPart(node, where), ...('children' in node ? { children: node.children.map((c) => whole(c, where)) } : {}) });
  const compareLists = (a: RecipeNode[], b: RecipeNode[], prefix: string) => {
    for (let i = 0; i < Math.max(a.length, b.length); i++) {
      const path = prefix ? `${prefix}.${i}` : String(i);
      const x = a[i];
      const y = b[i];
      if (!x && y) changes.push({ path, kind: 'added', after: whole(y, whereTo) });
      else if (x && !y) changes.push({ path, kind: 'removed', before: whole(x, whereFrom) });
      else if (x && y) compareNodes(x, y, path);
    }
  };
  const compareNodes = (x: RecipeNode, y: RecipeNode, path: string) => {
    if (x.kind !== y.kind) {
      changes.push({ path, kind: 'changed', before: whole(x, whereFrom), after: whole(y, whereTo) });
      return;
    }
    const before = ownPart(x, whereFrom);
    const after = ownPart(y, whereTo);
    if (canonical(before) !== canonical(after)) changes.push({ path, kind: 'changed', before, after });
    if ('children' in x && 'children' in y) compareLists(x.children, y.children, path);
  };
  compareLists(from.children, to.children, '');
  return changes;
}
