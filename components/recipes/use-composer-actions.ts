import { useMemo } from 'react';

import { addStep, applyNode, dropRow, duplicateStep, indentStep, moveAmongSiblings, outdentStep, removeStep, toggleEnabled, type EditResult } from '@/components/recipes/composer-ops';
import type { Composer, EditContext } from '@/hooks/use-composer';
import type { FlatRow } from '@/shared/recipe/flat';
import type { NodeKind, RecipeNode, RecipeTree } from '@/shared/recipe/types';
import type { Rig } from '@/shared/rig/schema';

const NOTHING_SELECTED: EditResult = { ok: false, message: 'Select a step first' };

/** Runs `edit` on the selected step, or explains that nothing is selected. */
const onSelected = (edit: (tree: RecipeTree, id: string, ctx: EditContext) => EditResult) => (tree: RecipeTree, ctx: EditContext) => (ctx.selectedId ? edit(tree, ctx.selectedId, ctx) : NOTHING_SELECTED);

/**
 * The composer's edits as stable callbacks for rows, buttons, keys and the palette. They read
 * the tree and selection inside the reducer, so none of them changes when the tree does.
 */
export function useComposerActions(composer: Composer, rig: Rig | undefined) {
  const { editTree } = composer.actions;
  return useMemo(
    () => ({
      move: (delta: -1 | 1) => editTree(onSelected((tree, id) => moveAmongSiblings(tree, id, delta))),
      indent: () => editTree(onSelected((tree, id) => indentStep(tree, id))),
      outdent: () => editTree(onSelected((tree, id) => outdentStep(tree, id))),
      duplicate: () => editTree(onSelected((tree, id) => duplicateStep(tree, id))),
      remove: () => editTree(onSelected((tree, id, ctx) => removeStep(tree, ctx.rows, id))),
      add: (kind: NodeKind) => editTree((tree, ctx) => addStep(tree, ctx.rows, ctx.selectedId, kind, rig)),
      apply: (node: RecipeNode) => editTree((tree) => applyNode(tree, node)),
      drop: (rows: FlatRow[], from: number, to: number) => editTree((tree) => dropRow(tree, rows, from, to)),
      toggleEnabled: (id: string) =>
        editTree((tree, ctx) => {
          const result = toggleEnabled(tree, id);
          return result.ok ? { ...result, select: ctx.selectedId } : result;
        }),
    }),
    [editTree, rig],
  );
}

export type ComposerActions = ReturnType<typeof useComposerActions>;
