import { printablePath } from '@/shared/recipe/limits';
import { isContainer, type ContainerNode, type NodeList, type RecipeNode } from '@/shared/recipe/types';

/** Where a node sits: its parent (null at the top level), depth (0 at the top level), index. */
export interface WalkInfo {
  parent: ContainerNode | null;
  depth: number;
  index: number;
  /** Indexes from the root: [2, 0] is `children[2].children[0]`. */
  indexes: readonly number[];
}

/** 'skip' leaves out the node's children; 'stop' ends the walk. */
export type WalkControl = void | 'skip' | 'stop';

/**
 * Visits every node in document order (a container before its children), with its place.
 * The visitor may skip a subtree or stop. Returns false when stopped.
 */
export function walk(list: NodeList, visit: (node: RecipeNode, info: WalkInfo) => WalkControl): boolean {
  return walkList(list.children, null, 0, [], visit);
}

function walkList(children: RecipeNode[], parent: ContainerNode | null, depth: number, prefix: number[], visit: (node: RecipeNode, info: WalkInfo) => WalkControl): boolean {
  for (let index = 0; index < children.length; index++) {
    const node = children[index]!;
    const indexes = [...prefix, index];
    const control = visit(node, { parent, depth, index, indexes });
    if (control === 'stop') return false;
    if (control !== 'skip' && isContainer(node) && !walkList(node.children, node, depth + 1, indexes, visit)) return false;
  }
  return true;
}

/** Indexes from the root to a node, or undefined when no node has this id. */
export function indexesOf(list: NodeList, id: string): number[] | undefined {
  let found: number[] | undefined;
  walk(list, (node, info) => {
    if (node.id !== id) return;
    found = [...info.indexes];
    return 'stop';
  });
  return found;
}

/** The node at a list of indexes from the root. */
export function nodeAt(list: NodeList, indexes: readonly number[]): RecipeNode | undefined {
  let children = list.children;
  let node: RecipeNode | undefined;
  for (const i of indexes) {
    node = children[i];
    if (!node) return undefined;
    children = isContainer(node) ? node.children : [];
  }
  return node;
}

/** The first node with this id, in document order. */
export function findNode(list: NodeList, id: string): RecipeNode | undefined {
  const indexes = indexesOf(list, id);
  return indexes ? nodeAt(list, indexes) : undefined;
}

/** A node's indexes from the root and the printable path, e.g. `children[2].children[0]`. */
export function pathOf(list: NodeList, id: string): { indexes: number[]; path: string } | undefined {
  const indexes = indexesOf(list, id);
  return indexes ? { indexes, path: printableIndexes(indexes) } : undefined;
}

/** `[2, 0]` → `children[2].children[0]`. */
export function printableIndexes(indexes: readonly number[]): string {
  return printablePath(indexes.flatMap((i) => ['children', i]));
}

/** Nodes in the tree (containers and steps; rules are not nodes). */
export function countNodes(list: NodeList): number {
  let count = 0;
  walk(list, () => {
    count++;
  });
  return count;
}

/** Nesting depth of a node: 0 at the top level, 1 inside a top-level container, … */
export function depthOf(list: NodeList, id: string): number | undefined {
  const indexes = indexesOf(list, id);
  return indexes ? indexes.length - 1 : undefined;
}

/** True when `id` is `ancestorId` itself or lies anywhere below it. */
export function isSelfOrDescendant(list: NodeList, ancestorId: string, id: string): boolean {
  const ancestor = findNode(list, ancestorId);
  if (!ancestor) return false;
  if (ancestor.id === id) return true;
  return isContainer(ancestor) && indexesOf(ancestor, id) !== undefined;
}
