import { createNode } from '@/shared/recipe/factory';
import { moveByFlatIndex, type FlatRow } from '@/shared/recipe/flat';
import { duplicateNode, findNode, indentNode, indexesOf, insertNode, moveNode, nodeAt, outdentNode, removeNode, updateNode, type NodePatch, type TreeResult } from '@/shared/recipe/tree';
import type { NodeKind, RecipeNode, RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

/*
 * The composer's edits as pure functions of the tree: each returns the new tree and the step
 * to select afterwards, or an error sentence. Drops follow the drag rule of
 * `moveByFlatIndex`; keyboard moves stay among siblings (`moveAmongSiblings`).
 */

export type EditResult = { ok: true; tree: RecipeTree; select: string | null } | { ok: false; message: string };

const fromTree = (result: TreeResult, select: string | null): EditResult => (result.ok ? { ok: true, tree: result.tree, select } : { ok: false, message: result.error.message });

/**
 * Moves a step (a container with everything inside it) one place among its siblings; at the
 * first or last place it leaves its container, landing just before or after it. Entering a
 * container is Indent's job, so a keyboard move never jumps into a neighbour's children.
 */
export function moveAmongSiblings(tree: RecipeTree, id: string, delta: -1 | 1): EditResult {
  const indexes = indexesOf(tree, id);
  if (!indexes) return { ok: false, message: 'That step is gone' };
  const at = indexes[indexes.length - 1]!;
  const parentIndexes = indexes.slice(0, -1);
  const parent = parentIndexes.length ? nodeAt(tree, parentIndexes) : undefined;
  const siblings = parent && 'children' in parent ? parent.children : tree.children;
  const next = at + delta;
  if (next >= 0 && next < siblings.length) return fromTree(moveNode(tree, id, { parentId: parent?.id ?? null, index: next }), id);
  if (!parent) return { ok: false, message: delta < 0 ? 'Already the first step' : 'Already the last step' };
  const grandIndexes = parentIndexes.slice(0, -1);
  const grandparentId = grandIndexes.length ? nodeAt(tree, grandIndexes)!.id : null;
  const parentAt = parentIndexes[parentIndexes.length - 1]!;
  return fromTree(moveNode(tree, id, { parentId: grandparentId, index: delta < 0 ? parentAt : parentAt + 1 }), id);
}

/** A drag that the list dropped: `rows` are the rows as the list showed them. */
export function dropRow(tree: RecipeTree, rows: readonly FlatRow[], from: number, to: number): EditResult {
  const id = rows[from]?.id ?? null;
  return fromTree(moveByFlatIndex(tree, rows, from, to), id);
}

export const indentStep = (tree: RecipeTree, id: string): EditResult => fromTree(indentNode(tree, id), id);
export const outdentStep = (tree: RecipeTree, id: string): EditResult => fromTree(outdentNode(tree, id), id);

export function duplicateStep(tree: RecipeTree, id: string): EditResult {
  const result = duplicateNode(tree, id);
  return result.ok ? { ok: true, tree: result.tree, select: result.id } : { ok: false, message: result.error.message };
}

/** Removes a step; the row below it (or else above it) becomes selected. */
export function removeStep(tree: RecipeTree, rows: readonly FlatRow[], id: string): EditResult {
  const at = rows.findIndex((r) => r.id === id);
  const depth = rows[at]?.depth ?? 0;
  let next = at + 1;
  while (next < rows.length && rows[next]!.depth > depth) next++;
  const select = rows[next]?.id ?? rows[at - 1]?.id ?? null;
  return fromTree(removeNode(tree, id), select);
}

/**
 * Adds a new step of a kind with its defaults: first inside the selected row when that is an
 * expanded container (as a drop under its header), else right after the selected row, else
 * at the end. The new step becomes selected, so a run of additions keeps its order.
 */
export function addStep(tree: RecipeTree, rows: readonly FlatRow[], selectedId: string | null, kind: NodeKind, rig?: Pick<RigInput, 'filterWheel'>): EditResult {
  let node: RecipeNode;
  try {
    node = createNode(kind, {}, { rig });
  } catch {
    return { ok: false, message: `A ${kind} step could not be made with this rig's settings` };
  }
  const row = rows.find((r) => r.id === selectedId);
  const at = !row ? { parentId: null, index: tree.children.length } : row.isContainer && !row.collapsed ? { parentId: row.id, index: 0 } : { parentId: row.parentId, index: row.indexInParent + 1 };
  return fromTree(insertNode(tree, node, at), node.id);
}

export function toggleEnabled(tree: RecipeTree, id: string): EditResult {
  const node = findNode(tree, id);
  if (!node) return { ok: false, message: 'That step is gone' };
  return fromTree(updateNode(tree, id, { enabled: !node.enabled }), id);
}

/**
 * Puts an edited node (from the step editor) in place of the old one. Fields the editor left
 * out are cleared; structure (`children`) stays as the tree has it.
 */
export function applyNode(tree: RecipeTree, next: RecipeNode): EditResult {
  const old = findNode(tree, next.id);
  if (!old) return { ok: false, message: 'That step is gone' };
  if (old.kind !== next.kind) return { ok: false, message: 'A step cannot change its kind' };
  const patch: Record<string, unknown> = {};
  for (const key of Object.keys(old)) if (key !== 'id' && key !== 'kind' && key !== 'children' && !(key in next)) patch[key] = undefined;
  for (const [key, value] of Object.entries(next)) if (key !== 'id' && key !== 'kind' && key !== 'children') patch[key] = value;
  return fromTree(updateNode(tree, next.id, patch as NodePatch), next.id);
}

/** What the row actions can do for the selected row right now (buttons grey out otherwise). */
export function rowAbilities(rows: readonly FlatRow[], tree: RecipeTree, id: string | null) {
  const row = rows.find((r) => r.id === id);
  if (!row) return { up: false, down: false, indent: false, outdent: false, any: false };
  const siblings = row.parentId === null ? tree.children : ((findNode(tree, row.parentId) as { children?: RecipeNode[] } | undefined)?.children ?? []);
  const above = siblings[row.indexInParent - 1];
  const nested = row.depth > 0;
  return { up: row.indexInParent > 0 || nested, down: row.indexInParent < siblings.length - 1 || nested, indent: !!above && 'children' in above, outdent: nested, any: true };
}
