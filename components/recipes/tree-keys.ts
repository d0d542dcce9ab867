/** What the keyboard can do in the composer's tree (see `useTreeKeys`). */
export type TreeKeyActions = {
  selectBy: (delta: -1 | 1) => void;
  move: (delta: -1 | 1) => void;
  indent: () => void;
  outdent: () => void;
  duplicate: () => void;
  remove: () => void;
  undo: () => void;
  redo: () => void;
  /** → unfolds a folded container, ← folds an open one. */
  fold: (fold: boolean) => void;
  openEditor: () => void;
  clearSelection: () => void;
};

/** The shortcuts, for the hint line and the help text. */
export const TREE_KEY_HINTS = ['↑↓ select', 'Alt+↑↓ move', 'Tab indent', 'Shift+Tab outdent', 'Ctrl+D duplicate', 'Del remove', 'Ctrl+Z undo', 'Ctrl+Shift+Z redo', 'Enter edit', 'Esc leave'];

type Key = { key: string; alt: boolean; mod: boolean; shift: boolean };

/**
 * The tree's key map as a pure function: which action a key press means, or null to let the
 * browser have it. `hasSelection` gates the keys that act on the selected row (so Tab still
 * moves focus on when nothing is selected).
 */
export function treeKeyAction(k: Key, hasSelection: boolean, a: TreeKeyActions): (() => void) | null {
  const key = k.key.length === 1 ? k.key.toLowerCase() : k.key;
  if (k.mod && key === 'z') return k.shift ? a.redo : a.undo;
  if (k.mod && key === 'y') return a.redo;
  if (k.key === 'ArrowUp' || k.key === 'ArrowDown') {
    const delta = k.key === 'ArrowUp' ? -1 : 1;
    if (k.alt) return hasSelection ? () => a.move(delta) : null;
    return () => a.selectBy(delta);
  }
  if (!hasSelection) return null;
  if (k.key === 'Tab' && !k.alt && !k.mod) return k.shift ? a.outdent : a.indent;
  if (k.key === 'ArrowRight') return k.alt ? a.indent : () => a.fold(false);
  if (k.key === 'ArrowLeft') return k.alt ? a.outdent : () => a.fold(true);
  if (k.mod && key === 'd') return a.duplicate;
  if ((k.key === 'Delete' || k.key === 'Backspace') && !k.mod) return a.remove;
  if (k.key === 'Enter') return a.openEditor;
  if (k.key === 'Escape') return a.clearSelection;
  return null;
}
