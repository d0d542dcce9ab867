import { useEffect, useMemo, useRef, type RefObject } from 'react';

import { revealRow } from '@/components/recipes/reveal-row';
import type { TreeKeyActions } from '@/components/recipes/tree-keys';
import type { ComposerActions } from '@/components/recipes/use-composer-actions';
import { useTreeKeys } from '@/components/recipes/use-tree-keys';
import type { Composer } from '@/hooks/use-composer';
import type { FlatRow } from '@/shared/recipe/flat';

type Options = {
  composer: Composer;
  actions: ComposerActions;
  rows: FlatRow[];
  treeRef: RefObject<unknown>;
  listRef: RefObject<unknown>;
  openEditor: () => void;
};

/**
 * The composer's keyboard: the tree's key map bound to the composer's edits, and the selected
 * row kept in view when the selection or its place changes.
 */
export function useComposerKeys({ composer, actions, rows, treeRef, listRef, openEditor }: Options): void {
  const { selectedId } = composer;
  const latest = useRef({ rows, selectedId, openEditor });
  latest.current = { rows, selectedId, openEditor };
  const { select, setCollapsed, undo, redo } = composer.actions;

  const keyActions: TreeKeyActions = useMemo(
    () => ({
      selectBy: (delta) => {
        const { rows: list, selectedId: id } = latest.current;
        const at = list.findIndex((r) => r.id === id);
        const next = at < 0 ? list[delta > 0 ? 0 : list.length - 1] : list[Math.max(0, Math.min(list.length - 1, at + delta))];
        if (next) select(next.id);
      },
      move: actions.move,
      indent: actions.indent,
      outdent: actions.outdent,
      duplicate: actions.duplicate,
      remove: actions.remove,
      undo,
      redo,
      fold: (fold) => {
        const { rows: list, selectedId: id } = latest.current;
        const row = list.find((r) => r.id === id);
        if (!row) return;
        if (row.isContainer && row.collapsed !== fold) setCollapsed(row.id, fold);
        else if (fold && row.parentId) select(row.parentId);
      },
      openEditor: () => latest.current.openEditor(),
      clearSelection: () => select(null),
    }),
    [actions, select, setCollapsed, undo, redo],
  );
  useTreeKeys(treeRef, keyActions, selectedId !== null);

  const index = selectedId ? rows.findIndex((r) => r.id === selectedId) : -1;
  useEffect(() => {
    if (!selectedId || index < 0) return;
    // After the list has laid the row out in its new place.
    const frame = requestAnimationFrame(() => revealRow(selectedId, index, listRef.current as Parameters<typeof revealRow>[2]));
    return () => cancelAnimationFrame(frame);
  }, [selectedId, index, listRef]);
}
