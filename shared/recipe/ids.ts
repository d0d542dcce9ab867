import type { NodeList, RecipeNode, RecipeTree } from '@/shared/recipe/types';

/** Makes a fresh id; injectable so tests and imports can be deterministic. */
export type NewId = () => string;

/** `crypto.randomUUID` of the global Web Crypto (browsers and Node 20 alike). */
export const defaultNewId: NewId = () => globalThis.crypto.randomUUID();

/**
 * A deep copy of a node with fresh ids for it, its descendants and their rules. A flats step's
 * `matchFramingOf` that points at a stage inside the copy follows the copy; one that points
 * outside keeps its target. `idMap` (old → new) collects the renames.
 */
export function cloneWithFreshIds(node: RecipeNode, newId: NewId, idMap: Map<string, string> = new Map()): RecipeNode {
  const copy = renameDeep(node, newId, idMap);
  return remapStageRefs(copy, idMap);
}

function renameDeep(node: RecipeNode, newId: NewId, idMap: Map<string, string>): RecipeNode {
  const id = newId();
  idMap.set(node.id, id);
  if (!('children' in node)) return { ...structuredCopy(node), id };
  const rules = node.rules.map((rule) => {
    const ruleId = newId();
    idMap.set(rule.id, ruleId);
    return { ...structuredCopy(rule), id: ruleId };
  });
  const children = node.children.map((child) => renameDeep(child, newId, idMap));
  return { ...structuredCopy({ ...node, children: [], rules: [] }), id, children, rules } as RecipeNode;
}

function remapStageRefs(node: RecipeNode, idMap: Map<string, string>): RecipeNode {
  if (node.kind === 'flats' && node.matchFramingOf?.kind === 'stage') {
    const stageId = idMap.get(node.matchFramingOf.stageId);
    return stageId ? { ...node, matchFramingOf: { kind: 'stage', stageId } } : node;
  }
  if (!('children' in node)) return node;
  return { ...node, children: node.children.map((c) => remapStageRefs(c, idMap)) };
}

/** A deep copy of plain JSON-like data (nodes hold nothing else). */
function structuredCopy<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}

/** Every node and rule id of a list, in document order (repeats included). */
export function collectIds(list: NodeList | RecipeNode): string[] {
  const out: string[] = [];
  const visit = (node: RecipeNode) => {
    out.push(node.id);
    if ('children' in node) {
      for (const rule of node.rules) out.push(rule.id);
      node.children.forEach(visit);
    }
  };
  if ('kind' in list) visit(list);
  else list.children.forEach(visit);
  return out;
}

/**
 * The same tree with a fresh id for every node or rule whose id already appeared earlier in
 * document order (the fix for the `duplicate-id` finding). The first holder keeps its id.
 */
export function reassignDuplicateIds(tree: RecipeTree, newId: NewId = defaultNewId): RecipeTree {
  const seen = new Set<string>();
  const fresh = (id: string) => {
    if (!seen.has(id)) {
      seen.add(id);
      return id;
    }
    const replacement = newId();
    seen.add(replacement);
    return replacement;
  };
  const visit = (node: RecipeNode): RecipeNode => {
    const id = fresh(node.id);
    if (!('children' in node)) return id === node.id ? node : { ...node, id };
    const rules = node.rules.map((r) => {
      const ruleId = fresh(r.id);
      return ruleId === r.id ? r : { ...r, id: ruleId };
    });
    const children = node.children.map(visit);
    const same = id === node.id && rules.every((r, i) => r === node.rules[i]) && children.every((c, i) => c === node.children[i]);
    return same ? node : { ...node, id, rules, children };
  };
  return { ...tree, children: tree.children.map(visit) };
}

/**
 * Deterministic ids for fixtures and tests: 00000000-0000-4000-8000-000000000001, …002, …
 * (valid version-4 uuids).
 */
export function sequentialIds(start = 1): NewId {
  let next = start;
  return () => `00000000-0000-4000-8000-${String(next++).padStart(12, '0')}`;
}
