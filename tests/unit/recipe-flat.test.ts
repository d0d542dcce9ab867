import { describe, expect, it } from 'vitest';
import { createNode } from '@/shared/recipe/factory';
import { flattenTree, moveByFlatIndex } from '@/shared/recipe/flat';
import { sequentialIds } from '@/shared/recipe/ids';
import { walk } from '@/shared/recipe/tree';
import { isContainer, type RecipeNode, type RecipeTree } from '@/shared/recipe/types';

/* Outlines as in recipe-tree.test.ts: "a S[b c] d"; upper-case labels are stages, others notes. */
function build(outline: string): RecipeTree {
  const newId = sequentialIds();
  const tokens = outline.match(/\[|\]|[^\s[\]]+/g) ?? [];
  let i = 0;
  const list = (): RecipeNode[] => {
    const out: RecipeNode[] = [];
    while (i < tokens.length && tokens[i] !== ']') {
      const label = tokens[i++]!;
      const children = tokens[i] === '[' ? (i++, list()) : [];
      if (children.length > 0 || /^[A-Z]/.test(label)) {
        out.push({ ...createNode('stage', { label }, { newId }), children });
        if (tokens[i] === ']') i++;
      } else out.push(createNode('note', { label, text: label }, { newId }));
    }
    return out;
  };
  return { children: list() };
}

function outline(list: { children: RecipeNode[] }): string {
  return list.children.map((n) => (isContainer(n) && n.children.length > 0 ? `${n.label}[${outline(n)}]` : (n.label ?? '?'))).join(' ');
}

function ids(tree: RecipeTree, labels: string[]): string[] {
  const out: string[] = [];
  walk(tree, (n) => void (labels.includes(n.label ?? '') && out.push(n.id)));
  return out;
}

/** Drags the row labelled `label` to list position `to`; returns the new outline or the error code. */
function drag(source: string, label: string, to: number, opts: { collapsed?: string[]; depth?: number } = {}): string {
  const tree = build(source);
  const rows = flattenTree(tree, ids(tree, opts.collapsed ?? []));
  const from = rows.findIndex((r) => ids(tree, [label])[0] === r.id);
  const result = moveByFlatIndex(tree, rows, from, to, { depth: opts.depth });
  return result.ok ? outline(result.tree) : `error: ${result.error.code}`;
}

describe('flattenTree', () => {
  it('lists rows in document order with depth, parent and place', () => {
    const tree = build('a S[b T[c]] d');
    const rows = flattenTree(tree);
    const byId = new Map<string, string>();
    walk(tree, (n) => void byId.set(n.id, n.label!));
    expect(rows.map((r) => [byId.get(r.id), r.depth, r.parentId && byId.get(r.parentId), r.indexInParent, r.isContainer, r.hasChildren, r.collapsed])).toEqual([
      ['a', 0, null, 0, false, false, false],
      ['S', 0, null, 1, true, true, false],
      ['b', 1, 'S', 0, false, false, false],
      ['T', 1, 'S', 1, true, true, false],
      ['c', 2, 'T', 0, false, false, false],
      ['d', 0, null, 2, false, false, false],
    ]);
    expect(rows[1]!.kind).toBe('stage');
  });

  it('hides the children of collapsed containers (a Set or an array of ids)', () => {
    const tree = build('a S[b T[c]] d');
    const [sId, tId] = ids(tree, ['S', 'T']);
    expect(flattenTree(tree, [sId!]).map((r) => r.depth)).toEqual([0, 0, 0]);
    expect(flattenTree(tree, new Set([tId!])).length).toBe(5);
    expect(flattenTree(tree, [sId!])[1]).toMatchObject({ collapsed: true, hasChildren: true });
  });
});

describe('moveByFlatIndex', () => {
  // rows of 'a b S[c d] e': 0 a, 1 b, 2 S, 3 c, 4 d, 5 e
  const T = 'a b S[c d] e';

  it('reorders at the top level', () => {
    expect(drag(T, 'a', 1)).toBe('b a S[c d] e');
    expect(drag(T, 'e', 0)).toBe('e a b S[c d]');
    expect(drag(T, 'b', 0)).toBe('b a S[c d] e');
  });

  it('a drop right under an expanded stage header makes the first child', () => {
    expect(drag(T, 'a', 2)).toBe('b S[a c d] e');
    expect(drag(T, 'e', 3)).toBe('a b S[e c d]');
  });

  it('otherwise a drop makes a sibling of the row above', () => {
    expect(drag(T, 'a', 3)).toBe('b S[c a d] e');
    expect(drag(T, 'e', 4)).toBe('a b S[c e d]');
    expect(drag(T, 'e', 5, { depth: 1 })).toBe('a b S[c d e]');
    expect(drag(T, 'd', 3)).toBe('a b S[d c] e');
  });

  it('out of a stage to the top level', () => {
    expect(drag(T, 'c', 1)).toBe('a c b S[d] e');
    expect(drag(T, 'd', 0)).toBe('d a b S[c] e');
  });

  it('after the last child: inside by default, at the top level with a sideways depth', () => {
    expect(drag(T, 'c', 4)).toBe('a b S[d c] e');
    expect(drag(T, 'c', 4, { depth: 0 })).toBe('a b S[d] c e');
    expect(drag(T, 'c', 4, { depth: -5 })).toBe('a b S[d] c e');
  });

  it('to the very end', () => {
    expect(drag(T, 'a', 5)).toBe('b S[c d] e a');
    expect(drag('a b S[c d]', 'b', 4)).toBe('a S[c d b]');
    expect(drag('a b S[c d]', 'b', 4, { depth: 0 })).toBe('a S[c d] b');
    expect(drag(T, 'a', 99)).toBe('b S[c d] e a');
  });

  it('a container carries its children', () => {
    expect(drag(T, 'S', 0)).toBe('S[c d] a b e');
    expect(drag(T, 'S', 5)).toBe('a b e S[c d]');
    expect(drag('X[a] S[b]', 'S', 1)).toBe('X[S[b] a]');
  });

  it('refuses a drop onto its own descendant', () => {
    expect(drag(T, 'S', 3)).toBe('error: into-itself');
    expect(drag(T, 'S', 4)).toBe('error: into-itself');
    expect(drag('S[T[a] b] c', 'S', 2)).toBe('error: into-itself');
  });

  it('collapsed containers: dropped under, the row becomes a sibling; dragged, they carry hidden children', () => {
    // rows of 'a b S[c d] e' with S collapsed: 0 a, 1 b, 2 S, 3 e
    expect(drag(T, 'a', 2, { collapsed: ['S'] })).toBe('b S[c d] a e');
    expect(drag(T, 'S', 0, { collapsed: ['S'] })).toBe('S[c d] a b e');
    expect(drag(T, 'S', 3, { collapsed: ['S'] })).toBe('a b e S[c d]');
    expect(drag('S[a] T[b]', 'b', 1, { collapsed: ['S'] })).toBe('S[a] b T');
  });

  it('an empty expanded container takes a drop under it; a sideways depth keeps the row beside it', () => {
    expect(drag('a E b', 'a', 1)).toBe('E[a] b');
    expect(drag('a E b', 'a', 1, { depth: 0 })).toBe('E a b');
  });

  it('in a deeper tree the depth is clamped between the row below and the row above', () => {
    // rows of 'S[T[a b] c] d': 0 S, 1 T, 2 a, 3 b, 4 c, 5 d
    const deep = 'S[T[a b] c] d';
    expect(drag(deep, 'd', 4)).toBe('S[T[a b d] c]');
    expect(drag(deep, 'd', 4, { depth: 1 })).toBe('S[T[a b] d c]');
    expect(drag(deep, 'd', 4, { depth: 0 })).toBe('S[T[a b] d c]');
    expect(drag(deep, 'd', 4, { depth: 7 })).toBe('S[T[a b d] c]');
  });

  it('dropped where it was: nothing changes, unless a sideways depth asks for it', () => {
    const tree = build(T);
    const rows = flattenTree(tree);
    const same = moveByFlatIndex(tree, rows, 3, 3);
    expect(same.ok && same.tree).toBe(tree);
    expect(drag('a S[b] c', 'c', 3, { depth: 1 })).toBe('a S[b c]');
    expect(drag('T[a] S[b]', 'S', 2, { depth: 1 })).toBe('T[a S[b]]');
  });

  it('reports the placement it used and refuses a missing row', () => {
    const tree = build(T);
    const rows = flattenTree(tree);
    const result = moveByFlatIndex(tree, rows, 0, 2);
    expect(result.ok && result.placement).toEqual({ parentId: rows[2]!.id, index: 0 });
    const missing = moveByFlatIndex(tree, rows, 42, 0);
    expect(missing.ok ? 'ok' : missing.error.code).toBe('not-found');
  });
});
