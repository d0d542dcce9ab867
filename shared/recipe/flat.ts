import { moveNode, type Placement, type TreeError, type TreeResult } from '@/shared/recipe/tree';
import { isContainer, type NodeKind, type RecipeNode, type RecipeTree } from '@/shared/recipe/types';

/** One row of the composer's drag list: a node at an indentation level. */
export interface FlatRow {
  id: string;
  /** Indentation: 0 at the top level. */
  depth: number;
  kind: NodeKind;
  isContainer: boolean;
  hasChildren: boolean;
  /** A container whose children are hidden. */
  collapsed: boolean;
  parentId: string | null;
  indexInParent: number;
}

/**
 * The tree as one list of rows in document order, children of collapsed containers left out
 * (stack-notes.md: one flattened list with indentation levels, not a nested list).
 */
export function flattenTree(tree: RecipeTree, collapsedIds: ReadonlySet<string> | readonly string[] = []): FlatRow[] {
  const collapsedSet: ReadonlySet<string> = collapsedIds instanceof Set ? collapsedIds : new Set(collapsedIds as readonly string[]);
  const rows: FlatRow[] = [];
  const visit = (children: RecipeNode[], depth: number, parentId: string | null) => {
    children.forEach((node, indexInParent) => {
      const container = isContainer(node);
      const collapsed = container && collapsedSet.has(node.id);
      rows.push({ id: node.id, depth, kind: node.kind, isContainer: container, hasChildren: container && node.children.length > 0, collapsed, parentId, indexInParent });
      if (container && !collapsed) visit(node.children, depth + 1, node.id);
    });
  };
  visit(tree.children, 0, null);
  return rows;
}

const fail = (code: TreeError['code'], message: string): { ok: false; error: TreeError } => ({ ok: false, error: { code, message } });

/**
 * Applies a drag of the row at `fromIndex` that the list dropped at `toIndex` (the row's index
 * in the list after the drop, as a draggable list reports it). The rule, from the rows around
 * the drop (the dragged row's visible descendants do not count as neighbours):
 *
 * 1. No row above: the node becomes the first top-level node.
 * 2. The row above is an expanded container: the node becomes its first child.
 * 3. Otherwise the node becomes the next sibling of the row above, at that row's depth.
 * 4. `depth` (optional, e.g. from a sideways drag) picks a shallower level instead: any depth
 *    from the row below's depth up to the default; the node then follows the row above's
 *    ancestor at that depth. Out-of-range values are clamped.
 *
 * A container carries all its children (visible or collapsed). A drop whose row above is one
 * of the dragged container's own descendants is refused (`into-itself`). Dropping a row where
 * it was, with no `depth`, changes nothing.
 */
export function moveByFlatIndex(tree: RecipeTree, rows: readonly FlatRow[], fromIndex: number, toIndex: number, options: { depth?: number } = {}): TreeResult<{ placement: Placement | null }> {
  const row = rows[fromIndex];
  if (!row) return fail('not-found', `No row at position ${fromIndex}`);
  const to = Math.max(0, Math.min(toIndex, rows.length - 1));
  if (to === fromIndex && options.depth === undefined) return { ok: true, tree, placement: null };
  const block = new Set([row.id]);
  for (let i = fromIndex + 1; i < rows.length && rows[i]!.depth > row.depth; i++) block.add(rows[i]!.id);
  const rest = rows.filter((_, i) => i !== fromIndex);
  const above = rest[to - 1];
  if (above && block.has(above.id)) return fail('into-itself', 'A container cannot be dropped inside itself');
  let belowIndex = to;
  while (rest[belowIndex] && block.has(rest[belowIndex]!.id)) belowIndex++;
  const placement = dropPlacement(rows, row, above, rest[belowIndex], options.depth);
  const moved = moveNode(tree, row.id, placement);
  return moved.ok ? { ok: true, tree: moved.tree, placement } : moved;
}

/** Where the dragged row goes, given its neighbours after the drop (rules 1–4 above). */
function dropPlacement(rows: readonly FlatRow[], row: FlatRow, above: FlatRow | undefined, below: FlatRow | undefined, depthHint: number | undefined): Placement {
  if (!above) return { parentId: null, index: 0 };
  const maxDepth = above.isContainer && !above.collapsed ? above.depth + 1 : above.depth;
  const minDepth = Math.min(below ? below.depth : 0, maxDepth);
  const depth = depthHint === undefined ? maxDepth : Math.max(minDepth, Math.min(Math.trunc(depthHint), maxDepth));
  if (depth > above.depth) return { parentId: above.id, index: 0 };
  const byId = new Map(rows.map((r) => [r.id, r]));
  let anchor = above;
  while (anchor.depth > depth && anchor.parentId !== null) {
    const parent = byId.get(anchor.parentId);
    if (!parent) break;
    anchor = parent;
  }
  const shift = row.parentId === anchor.parentId && row.indexInParent < anchor.indexInParent ? 1 : 0;
  return { parentId: anchor.parentId, index: anchor.indexInParent + 1 - shift };
}
