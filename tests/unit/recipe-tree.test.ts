import { describe, expect, it } from 'vitest';
import { createNode } from '@/shared/recipe/factory';
import { collectIds, reassignDuplicateIds, sequentialIds } from '@/shared/recipe/ids';
import { countNodes, depthOf, duplicateNode, findNode, indentNode, insertNode, moveNode, outdentNode, pathOf, removeNode, updateNode, walk, type TreeResult } from '@/shared/recipe/tree';
import { isContainer, type RecipeNode, type RecipeTree } from '@/shared/recipe/types';

/*
 * Trees are written as outlines of labels: "a S[b c] d" is a, then container S holding b and c,
 * then d. Upper-case labels are containers (groups), lower-case ones are notes.
 */
let newId = sequentialIds();

function build(outline: string): RecipeTree {
  newId = sequentialIds();
  const tokens = outline.match(/\[|\]|[^\s[\]]+/g) ?? [];
  let i = 0;
  const list = (): RecipeNode[] => {
    const out: RecipeNode[] = [];
    while (i < tokens.length && tokens[i] !== ']') {
      const label = tokens[i++]!;
      if (tokens[i] === '[') {
        i++;
        out.push({ ...createNode('group', { label }, { newId }), children: list() });
        i++;
      } else if (/^[A-Z]/.test(label)) out.push(createNode('group', { label }, { newId }));
      else out.push(createNode('note', { label, text: label }, { newId }));
    }
    return out;
  };
  return { children: list() };
}

function outline(tree: { children: RecipeNode[] }): string {
  return tree.children.map((n) => (isContainer(n) && n.children.length > 0 ? `${n.label}[${outline(n)}]` : (n.label ?? '?'))).join(' ');
}

function idOf(tree: RecipeTree, label: string): string {
  let found = '';
  walk(tree, (n) => {
    if (n.label !== label) return;
    found = n.id;
    return 'stop';
  });
  if (!found) throw new Error(`no ${label}`);
  return found;
}

function ok(result: TreeResult): RecipeTree {
  if (!result.ok) throw new Error(result.error.message);
  return result.tree;
}

const errorCode = (result: TreeResult) => (result.ok ? 'ok' : result.error.code);

describe('reading a tree', () => {
  const tree = build('a S[b T[c] d] e');

  it('findNode finds nested nodes and nothing for an unknown id', () => {
    expect(findNode(tree, idOf(tree, 'c'))?.label).toBe('c');
    expect(findNode(tree, 'nope')).toBeUndefined();
  });

  it('pathOf gives indexes and a printable path', () => {
    expect(pathOf(tree, idOf(tree, 'c'))).toEqual({ indexes: [1, 1, 0], path: 'children[1].children[1].children[0]' });
    expect(pathOf(tree, idOf(tree, 'a'))).toEqual({ indexes: [0], path: 'children[0]' });
    expect(pathOf(tree, 'nope')).toBeUndefined();
  });

  it('countNodes counts containers and steps', () => {
    expect(countNodes(tree)).toBe(7);
    expect(countNodes({ children: [] })).toBe(0);
  });

  it('depthOf: 0 at the top level', () => {
    expect(depthOf(tree, idOf(tree, 'a'))).toBe(0);
    expect(depthOf(tree, idOf(tree, 'c'))).toBe(2);
    expect(depthOf(tree, 'nope')).toBeUndefined();
  });

  it('walk visits in document order with parent, depth and index; skip and stop work', () => {
    const seen: string[] = [];
    walk(tree, (n, info) => {
      seen.push(`${n.label}@${info.depth}.${info.index}<${info.parent?.label ?? 'root'}`);
    });
    expect(seen).toEqual(['a@0.0<root', 'S@0.1<root', 'b@1.0<S', 'T@1.1<S', 'c@2.0<T', 'd@1.2<S', 'e@0.2<root']);
    const skipped: string[] = [];
    walk(tree, (n) => {
      skipped.push(n.label!);
      return n.label === 'T' ? 'skip' : undefined;
    });
    expect(skipped).toEqual(['a', 'S', 'b', 'T', 'd', 'e']);
    const stopped: string[] = [];
    expect(walk(tree, (n) => (stopped.push(n.label!), n.label === 'b' ? 'stop' : undefined))).toBe(false);
    expect(stopped).toEqual(['a', 'S', 'b']);
  });
});

describe('insertNode', () => {
  it('inserts at the top level and inside a container, clamping the index', () => {
    const tree = build('a S[b] c');
    const x = createNode('note', { label: 'x', text: 'x' }, { newId });
    expect(outline(ok(insertNode(tree, x, { parentId: null, index: 1 })))).toBe('a x S[b] c');
    expect(outline(ok(insertNode(tree, x, { parentId: idOf(tree, 'S'), index: 0 })))).toBe('a S[x b] c');
    expect(outline(ok(insertNode(tree, x, { parentId: idOf(tree, 'S'), index: 99 })))).toBe('a S[b x] c');
    expect(outline(ok(insertNode(tree, x, { parentId: null, index: -3 })))).toBe('x a S[b] c');
  });

  it('leaves the original alone and shares untouched subtrees', () => {
    const tree = build('a S[b] T[c]');
    const next = ok(insertNode(tree, createNode('park', {}, { newId }), { parentId: idOf(tree, 'S'), index: 0 }));
    expect(outline(tree)).toBe('a S[b] T[c]');
    expect(next.children[2]).toBe(tree.children[2]);
    expect(next.children[1]).not.toBe(tree.children[1]);
  });

  it('refuses an unknown parent, a step as parent and an id already in the tree', () => {
    const tree = build('a S[b]');
    const x = createNode('park', {}, { newId });
    expect(errorCode(insertNode(tree, x, { parentId: 'nope', index: 0 }))).toBe('parent-not-found');
    expect(errorCode(insertNode(tree, x, { parentId: idOf(tree, 'a'), index: 0 }))).toBe('not-a-container');
    expect(errorCode(insertNode(tree, tree.children[0]!, { parentId: null, index: 0 }))).toBe('duplicate-id');
  });
});

describe('removeNode', () => {
  it('removes a node with its subtree and returns it', () => {
    const tree = build('a S[b T[c]] d');
    const result = removeNode(tree, idOf(tree, 'T'));
    expect(outline(ok(result))).toBe('a S[b] d');
    expect(result.ok && result.removed.label).toBe('T');
    expect(errorCode(removeNode(tree, 'nope'))).toBe('not-found');
  });
});

describe('moveNode', () => {
  const tree = build('a b c S[d e] f');

  it('index is the final index in the new parent', () => {
    expect(outline(ok(moveNode(tree, idOf(tree, 'a'), { parentId: null, index: 2 })))).toBe('b c a S[d e] f');
    expect(outline(ok(moveNode(tree, idOf(tree, 'f'), { parentId: null, index: 0 })))).toBe('f a b c S[d e]');
  });

  it('moves into and out of containers, carrying children', () => {
    expect(outline(ok(moveNode(tree, idOf(tree, 'b'), { parentId: idOf(tree, 'S'), index: 1 })))).toBe('a c S[d b e] f');
    expect(outline(ok(moveNode(tree, idOf(tree, 'e'), { parentId: null, index: 0 })))).toBe('e a b c S[d] f');
    expect(outline(ok(moveNode(tree, idOf(tree, 'S'), { parentId: null, index: 0 })))).toBe('S[d e] a b c f');
  });

  it('never into itself or a descendant', () => {
    const nested = build('S[T[a]] b');
    expect(errorCode(moveNode(nested, idOf(nested, 'S'), { parentId: idOf(nested, 'S'), index: 0 }))).toBe('into-itself');
    expect(errorCode(moveNode(nested, idOf(nested, 'S'), { parentId: idOf(nested, 'T'), index: 0 }))).toBe('into-itself');
  });

  it('refuses an unknown node, an unknown parent and a step as parent', () => {
    expect(errorCode(moveNode(tree, 'nope', { parentId: null, index: 0 }))).toBe('not-found');
    expect(errorCode(moveNode(tree, idOf(tree, 'a'), { parentId: 'nope', index: 0 }))).toBe('parent-not-found');
    expect(errorCode(moveNode(tree, idOf(tree, 'a'), { parentId: idOf(tree, 'b'), index: 0 }))).toBe('not-a-container');
  });
});

describe('indentNode and outdentNode', () => {
  it('indent moves a node into the container above as its last child', () => {
    const tree = build('S[a] b T c');
    expect(outline(ok(indentNode(tree, idOf(tree, 'b'))))).toBe('S[a b] T c');
    expect(outline(ok(indentNode(tree, idOf(tree, 'c'))))).toBe('S[a] b T[c]');
  });

  it('indent refuses the first node and a step above', () => {
    const tree = build('a b S[c]');
    expect(errorCode(indentNode(tree, idOf(tree, 'a')))).toBe('nothing-above');
    expect(errorCode(indentNode(tree, idOf(tree, 'b')))).toBe('above-not-container');
    expect(errorCode(indentNode(tree, idOf(tree, 'c')))).toBe('nothing-above');
    expect(errorCode(indentNode(tree, 'nope'))).toBe('not-found');
  });

  it("outdent moves a node to its parent's parent, right after the parent", () => {
    const tree = build('a S[b T[c d] e] f');
    expect(outline(ok(outdentNode(tree, idOf(tree, 'b'))))).toBe('a S[T[c d] e] b f');
    expect(outline(ok(outdentNode(tree, idOf(tree, 'c'))))).toBe('a S[b T[d] c e] f');
    expect(errorCode(outdentNode(tree, idOf(tree, 'a')))).toBe('at-top-level');
    expect(errorCode(outdentNode(tree, 'nope'))).toBe('not-found');
  });
});

describe('duplicateNode', () => {
  it('places a deep copy with fresh ids right after the original', () => {
    const tree = build('a S[b T[c]] d');
    const result = duplicateNode(tree, idOf(tree, 'S'), sequentialIds(500));
    const next = ok(result);
    expect(outline(next)).toBe('a S[b T[c]] S[b T[c]] d');
    const before = new Set(collectIds(tree));
    const copyIds = collectIds(next.children[2]!);
    expect(copyIds).toHaveLength(4);
    expect(copyIds.some((i) => before.has(i))).toBe(false);
    expect(result.ok && result.id).toBe(next.children[2]!.id);
    expect(errorCode(duplicateNode(tree, 'nope'))).toBe('not-found');
  });

  it('renames rules and points a flats step at the copied stage only when the stage is copied too', () => {
    newId = sequentialIds(900);
    const outer = createNode('stage', {}, { newId });
    const inner = createNode('stage', { rules: [{ id: newId(), kind: 'refocus-on-temperature' }] }, { newId });
    const flatsIn = createNode('flats', { filters: ['L'], matchFramingOf: { kind: 'stage', stageId: inner.id } }, { newId });
    const flatsOut = createNode('flats', { filters: ['L'], matchFramingOf: { kind: 'stage', stageId: outer.id } }, { newId });
    const group = { ...createNode('group', {}, { newId }), children: [{ ...inner, children: [flatsIn] }, flatsOut] };
    const tree: RecipeTree = { children: [outer, group] };
    const next = ok(duplicateNode(tree, group.id, sequentialIds(950)));
    const copy = next.children[2] as typeof group;
    const copiedInner = copy.children[0] as typeof inner;
    expect(copiedInner.rules[0]!.id).not.toBe(inner.rules[0]!.id);
    expect(copiedInner.children[0]).toMatchObject({ matchFramingOf: { stageId: copiedInner.id } });
    expect(copy.children[1]).toMatchObject({ matchFramingOf: { stageId: outer.id } });
  });
});

describe('updateNode', () => {
  it('changes fields and clears optional ones with undefined', () => {
    newId = sequentialIds();
    const expose = createNode('expose', { filter: 'L', gain: 100 }, { newId });
    const tree: RecipeTree = { children: [expose] };
    const next = ok(updateNode(tree, expose.id, { exposureS: 240, gain: undefined, label: 'Lum' }));
    expect(next.children[0]).toMatchObject({ exposureS: 240, label: 'Lum', filter: 'L' });
    expect((next.children[0] as typeof expose).gain).toBeUndefined();
    expect(tree.children[0]).toBe(expose);
  });

  it('refuses id, kind and children, and unknown ids', () => {
    const tree = build('a S[b]');
    expect(errorCode(updateNode(tree, idOf(tree, 'a'), { id: 'x' } as never))).toBe('bad-patch');
    expect(errorCode(updateNode(tree, idOf(tree, 'a'), { kind: 'park' } as never))).toBe('bad-patch');
    expect(errorCode(updateNode(tree, idOf(tree, 'S'), { children: [] } as never))).toBe('bad-patch');
    expect(errorCode(updateNode(tree, 'nope', { label: 'x' }))).toBe('not-found');
  });
});

describe('ids', () => {
  it('reassignDuplicateIds keeps the first holder and renames later ones (nodes and rules)', () => {
    const tree = build('a S[b]');
    const a = tree.children[0]!;
    const clash: RecipeTree = { children: [...tree.children, a, { ...createNode('group', { rules: [{ id: a.id, kind: 'recentre-on-drift' }] }, { newId }) }] };
    const fixed = reassignDuplicateIds(clash, sequentialIds(700));
    const all = collectIds(fixed);
    expect(new Set(all).size).toBe(all.length);
    expect(fixed.children[0]!.id).toBe(a.id);
    expect(fixed.children[1]).toBe(clash.children[1]);
  });
});
