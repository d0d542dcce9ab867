import { cloneWithFreshIds, collectIds, defaultNewId, type NewId } from '@/shared/recipe/ids';
import { findNode, indexesOf, isSelfOrDescendant, nodeAt } from '@/shared/recipe/tree-read';
import { isContainer, type RecipeNode, type RecipeTree } from '@/shared/recipe/types';

export { countNodes, depthOf, findNode, indexesOf, isSelfOrDescendant, nodeAt, pathOf, printableIndexes, walk, type WalkControl, type WalkInfo } from '@/shared/recipe/tree-read';

/*
 * Pure, immutable edits of a recipe tree: every operation returns a new tree that shares the
 * untouched subtrees with the old one, or an error result; nothing throws, nothing mutates.
 */

export type TreeErrorCode = 'not-found' | 'parent-not-found' | 'not-a-container' | 'into-itself' | 'duplicate-id' | 'nothing-above' | 'above-not-container' | 'at-top-level' | 'bad-patch';
export interface TreeError {
  code: TreeErrorCode;
  message: string;
}
export type TreeResult<Extra extends object = object> = ({ ok: true; tree: RecipeTree } & Extra) | { ok: false; error: TreeError };

/** Where a node goes: its new parent (null for the top level) and its index there. */
export interface Placement {
  parentId: string | null;
  index: number;
}

/** Any field of a node except `id`, `kind` and `children` (structure has its own operations). */
export type NodePatch = RecipeNode extends infer N ? (N extends RecipeNode ? Partial<Omit<N, 'id' | 'kind' | 'children'>> : never) : never;

const fail = (code: TreeErrorCode, message: string): { ok: false; error: TreeError } => ({ ok: false, error: { code, message } });

/** The list at `parentIndexes` replaced by `fn(list)`, copying only the nodes on the way. */
function mapListAt(children: RecipeNode[], parentIndexes: readonly number[], fn: (list: RecipeNode[]) => RecipeNode[]): RecipeNode[] {
  if (parentIndexes.length === 0) return fn(children);
  const [head, ...rest] = parentIndexes as [number, ...number[]];
  const node = children[head];
  if (!node || !isContainer(node)) return children;
  const copy = children.slice();
  copy[head] = { ...node, children: mapListAt(node.children, rest, fn) };
  return copy;
}

function editList(tree: RecipeTree, parentIndexes: readonly number[], fn: (list: RecipeNode[]) => RecipeNode[]): RecipeTree {
  return { ...tree, children: mapListAt(tree.children, parentIndexes, fn) };
}

/** Indexes of a parent container (or [] for the top level), or an error. */
function parentIndexes(tree: RecipeTree, parentId: string | null): number[] | TreeError {
  if (parentId === null) return [];
  const indexes = indexesOf(tree, parentId);
  if (!indexes) return { code: 'parent-not-found', message: `No container with id ${parentId}` };
  const parent = nodeAt(tree, indexes)!;
  if (!isContainer(parent)) return { code: 'not-a-container', message: `A ${parent.kind} step cannot hold other steps` };
  return indexes;
}

const clamp = (index: number, length: number) => Math.max(0, Math.min(Number.isFinite(index) ? Math.trunc(index) : length, length));

/**
 * Inserts a node (with its subtree) under `parentId` at `index` (clamped to the list).
 * Refuses a node whose ids already occur in the tree.
 */
export function insertNode(tree: RecipeTree, node: RecipeNode, at: Placement): TreeResult {
  const parent = parentIndexes(tree, at.parentId);
  if (!Array.isArray(parent)) return { ok: false, error: parent };
  const existing = new Set(collectIds(tree));
  const clash = collectIds(node).find((id) => existing.has(id));
  if (clash) return fail('duplicate-id', `The id ${clash} is already in the recipe`);
  return { ok: true, tree: editList(tree, parent, (list) => [...list.slice(0, clamp(at.index, list.length)), node, ...list.slice(clamp(at.index, list.length))]) };
}

/** Removes a node and everything inside it; `removed` is the node taken out. */
export function removeNode(tree: RecipeTree, id: string): TreeResult<{ removed: RecipeNode }> {
  const indexes = indexesOf(tree, id);
  if (!indexes) return fail('not-found', `No step with id ${id}`);
  const removed = nodeAt(tree, indexes)!;
  const at = indexes[indexes.length - 1]!;
  return { ok: true, removed, tree: editList(tree, indexes.slice(0, -1), (list) => list.filter((_, i) => i !== at)) };
}

/**
 * Moves a node (a container with its children) to a new place. `index` is the node's index
 * in the new parent's list after the move (so it counts the list without the node itself).
 * Never into itself or one of its descendants.
 */
export function moveNode(tree: RecipeTree, id: string, to: Placement): TreeResult {
  if (!findNode(tree, id)) return fail('not-found', `No step with id ${id}`);
  if (to.parentId !== null && isSelfOrDescendant(tree, id, to.parentId)) return fail('into-itself', 'A container cannot be moved into itself or into one of its own containers');
  const removed = removeNode(tree, id);
  if (!removed.ok) return removed;
  const parent = parentIndexes(removed.tree, to.parentId);
  if (!Array.isArray(parent)) return { ok: false, error: parent };
  const node = removed.removed;
  return { ok: true, tree: editList(removed.tree, parent, (list) => [...list.slice(0, clamp(to.index, list.length)), node, ...list.slice(clamp(to.index, list.length))]) };
}

/** Moves a node into the container just above it (its previous sibling), as the last child. */
export function indentNode(tree: RecipeTree, id: string): TreeResult {
  const indexes = indexesOf(tree, id);
  if (!indexes) return fail('not-found', `No step with id ${id}`);
  const at = indexes[indexes.length - 1]!;
  if (at === 0) return fail('nothing-above', 'There is no step above to move into');
  const above = nodeAt(tree, [...indexes.slice(0, -1), at - 1])!;
  if (!isContainer(above)) return fail('above-not-container', `The ${above.kind} step above cannot hold other steps`);
  return moveNode(tree, id, { parentId: above.id, index: above.children.length });
}

/** Moves a node out of its container, to the container's parent, right after the container. */
export function outdentNode(tree: RecipeTree, id: string): TreeResult {
  const indexes = indexesOf(tree, id);
  if (!indexes) return fail('not-found', `No step with id ${id}`);
  if (indexes.length === 1) return fail('at-top-level', 'The step is already at the top level');
  const grandparentIndexes = indexes.slice(0, -2);
  const grandparentId = grandparentIndexes.length === 0 ? null : nodeAt(tree, grandparentIndexes)!.id;
  return moveNode(tree, id, { parentId: grandparentId, index: indexes[indexes.length - 2]! + 1 });
}

/** A deep copy of a node with fresh ids, placed right after the original; `id` is the copy's. */
export function duplicateNode(tree: RecipeTree, id: string, newId: NewId = defaultNewId): TreeResult<{ id: string }> {
  const indexes = indexesOf(tree, id);
  if (!indexes) return fail('not-found', `No step with id ${id}`);
  const copy = cloneWithFreshIds(nodeAt(tree, indexes)!, newId);
  const at = indexes[indexes.length - 1]!;
  return { ok: true, id: copy.id, tree: editList(tree, indexes.slice(0, -1), (list) => [...list.slice(0, at + 1), copy, ...list.slice(at + 1)]) };
}

/**
 * Changes fields of a node. An `undefined` value clears an optional field. The patch is not
 * validated here: forms validate with the step's schema first, imports parse the whole tree.
 */
export function updateNode(tree: RecipeTree, id: string, patch: NodePatch): TreeResult {
  const keys = Object.keys(patch);
  const forbidden = keys.find((k) => k === 'id' || k === 'kind' || k === 'children');
  if (forbidden) return fail('bad-patch', `${forbidden} cannot be changed with an update`);
  const indexes = indexesOf(tree, id);
  if (!indexes) return fail('not-found', `No step with id ${id}`);
  const node = nodeAt(tree, indexes)!;
  const at = indexes[indexes.length - 1]!;
  const updated = { ...node, ...patch } as RecipeNode;
  return { ok: true, tree: editList(tree, indexes.slice(0, -1), (list) => list.map((n, i) => (i === at ? updated : n))) };
}
