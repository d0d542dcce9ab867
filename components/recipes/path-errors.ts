import type { FieldErrors } from '@/lib/api';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

export interface PathErrors {
  /** Messages by the id of the step they are about. */
  byNode: Map<string, string[]>;
  /** Messages about the recipe as a whole (its name, the step count, …). */
  other: string[];
}

/**
 * Sorts a refused save's field errors onto the steps: a key such as
 * `tree.children.1.children.0.exposureS` is followed through the tree that was sent, so the
 * message stays on that step (by id) even after later edits move it.
 */
export function pathErrors(tree: RecipeTree, fields: FieldErrors): PathErrors {
  const byNode = new Map<string, string[]>();
  const other: string[] = [];
  for (const [key, messages] of Object.entries(fields)) {
    const node = key.startsWith('tree.') ? nodeAtPath(tree, key.slice('tree.'.length).split('.')) : undefined;
    if (!node) {
      other.push(...messages);
      continue;
    }
    const list = byNode.get(node.id) ?? [];
    for (const m of messages.map(onStep)) if (!list.includes(m)) list.push(m);
    byNode.set(node.id, list);
  }
  return { byNode, other: [...new Set(other)] };
}

/** "children[0].children[3] is nested 9 levels deep…" → "This step is nested 9 levels deep…": the row already says which. */
const onStep = (message: string) => message.replace(/^children\[\d+\](?:\.children\[\d+\])* is /, 'This step is ');

/** The deepest node a path like ['children', '1', 'children', '0', 'exposureS'] reaches. */
function nodeAtPath(tree: RecipeTree, parts: string[]): RecipeNode | undefined {
  let list: RecipeNode[] | undefined = tree.children;
  let node: RecipeNode | undefined;
  for (let i = 0; i + 1 < parts.length && parts[i] === 'children' && list; i += 2) {
    const index = Number(parts[i + 1]);
    const next: RecipeNode | undefined = Number.isInteger(index) ? list[index] : undefined;
    if (!next) break;
    node = next;
    list = 'children' in next ? next.children : undefined;
  }
  return node;
}
