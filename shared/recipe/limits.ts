import { TREE_LIMITS } from '@/shared/recipe/defaults';

export interface LimitIssue {
  path: (string | number)[];
  message: string;
}

/** `children[2].children[0]` from `['children', 2, 'children', 0]`. */
export function printablePath(path: readonly (string | number)[]): string {
  let out = '';
  for (const part of path) out += typeof part === 'number' ? `[${part}]` : out === '' ? part : `.${part}`;
  return out;
}

const MAX_REPORTED = 10;

/**
 * Size and nesting limits of a recipe tree (plan-format.md: import limits node count and
 * depth): at most `maxDepth` levels (top-level nodes are level 1) and `maxNodes` nodes.
 * Iterative and tolerant of any input, so an importer can run it before parsing a hostile
 * document; the tree schema runs it as a refinement.
 */
export function treeLimitIssues(root: unknown, limits: { maxDepth: number; maxNodes: number } = TREE_LIMITS): LimitIssue[] {
  const issues: LimitIssue[] = [];
  let count = 0;
  const stack: { list: unknown; path: (string | number)[]; level: number }[] = [{ list: childrenOf(root), path: ['children'], level: 1 }];
  while (stack.length > 0) {
    const { list, path, level } = stack.pop()!;
    if (!Array.isArray(list)) continue;
    for (let i = 0; i < list.length; i++) {
      count++;
      const here = [...path, i];
      if (level > limits.maxDepth) {
        if (issues.length < MAX_REPORTED) issues.push({ path: here, message: `${printablePath(here)} is nested ${level} levels deep; a recipe allows at most ${limits.maxDepth}` });
        continue;
      }
      const children = childrenOf(list[i]);
      if (Array.isArray(children)) stack.push({ list: children, path: [...here, 'children'], level: level + 1 });
    }
  }
  if (count > limits.maxNodes) issues.unshift({ path: ['children'], message: `The recipe has ${count} steps and containers; at most ${limits.maxNodes} are allowed` });
  return issues;
}

function childrenOf(value: unknown): unknown {
  return typeof value === 'object' && value !== null ? (value as { children?: unknown }).children : undefined;
}
