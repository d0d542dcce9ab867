import { useEffect, useRef, type RefObject } from 'react';

import { treeKeyAction, type TreeKeyActions } from '@/components/recipes/tree-keys';

const EDITABLE = new Set(['INPUT', 'TEXTAREA', 'SELECT']);
const isEditable = (el: Element | null) => !!el && (EDITABLE.has(el.tagName) || (el as HTMLElement).isContentEditable);

/**
 * Keyboard editing of the tree on the web. Undo and redo work anywhere on the page outside a
 * text field (where the browser's own undo applies); the other keys only while focus is in the
 * tree, so Tab keeps its usual meaning elsewhere (and Esc clears the selection to leave).
 */
export function useTreeKeys(treeRef: RefObject<unknown>, actions: TreeKeyActions, hasSelection: boolean): void {
  const latest = useRef({ actions, hasSelection });
  latest.current = { actions, hasSelection };
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      const target = e.target instanceof Element ? e.target : null;
      if (isEditable(target) || e.defaultPrevented) return;
      const tree = treeRef.current as HTMLElement | null;
      const inTree = !!tree && !!target && tree.contains(target);
      const mod = e.ctrlKey || e.metaKey;
      const isHistoryKey = mod && ['z', 'y'].includes(e.key.toLowerCase());
      if (!inTree && !isHistoryKey) return;
      // Enter on a button inside a row (the switch, the chevron) presses that button instead.
      if (e.key === 'Enter' && target && target !== tree && target.getAttribute('role') !== 'treeitem') return;
      const { actions: a, hasSelection: selected } = latest.current;
      const run = treeKeyAction({ key: e.key, alt: e.altKey, mod, shift: e.shiftKey }, selected, a);
      if (!run) return;
      e.preventDefault();
      run();
      if (inTree) tree?.focus({ preventScroll: true });
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [treeRef]);
}
