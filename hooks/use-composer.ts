import { useCallback, useMemo, useReducer } from 'react';

import type { EditResult } from '@/components/recipes/composer-ops';
import { canRedo, canUndo, createHistory, push, redo, undo, type History } from '@/lib/undo';
import { flattenTree, type FlatRow } from '@/shared/recipe/flat';
import { findNode, indexesOf, nodeAt } from '@/shared/recipe/tree';
import type { RecipeTree } from '@/shared/recipe/types';

/** What the composer edits and saves: the recipe minus its server bookkeeping. */
export interface ComposerDoc {
  name: string;
  notes: string;
  rigId: string | null;
  siteId: string | null;
  tree: RecipeTree;
}

/** What an edit can see besides the tree: the folded containers, the visible rows, the selection. */
export interface EditContext {
  collapsed: ReadonlySet<string>;
  rows: FlatRow[];
  selectedId: string | null;
}
export type TreeEdit = (tree: RecipeTree, ctx: EditContext) => EditResult;

interface State {
  history: History<ComposerDoc>;
  selectedId: string | null;
  collapsed: ReadonlySet<string>;
  /** Why the last edit did nothing (e.g. "There is no step above to move into"); counted so a repeat shows again. */
  notice: { message: string; n: number } | null;
}

type Action =
  | { type: 'tree'; edit: TreeEdit }
  | { type: 'doc'; patch: Partial<Omit<ComposerDoc, 'tree'>> }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'load'; doc: ComposerDoc; keepHistory: boolean }
  | { type: 'select'; id: string | null; reveal?: boolean }
  | { type: 'collapse'; id: string; collapsed?: boolean };

/** The containers above a node, outermost first. */
function ancestorsOf(tree: RecipeTree, id: string): string[] {
  const indexes = indexesOf(tree, id) ?? [];
  return indexes.slice(0, -1).map((_, i) => nodeAt(tree, indexes.slice(0, i + 1))!.id);
}

const keepSelection = (tree: RecipeTree, id: string | null) => (id && findNode(tree, id) ? id : null);

function reduce(state: State, action: Action): State {
  const doc = state.history.present;
  switch (action.type) {
    case 'tree': {
      const rows = flattenTree(doc.tree, state.collapsed);
      const result = action.edit(doc.tree, { collapsed: state.collapsed, rows, selectedId: state.selectedId });
      if (!result.ok) return { ...state, notice: { message: result.message, n: (state.notice?.n ?? 0) + 1 } };
      if (result.tree === doc.tree) return { ...state, selectedId: result.select ?? state.selectedId };
      return { ...state, history: push(state.history, { ...doc, tree: result.tree }), selectedId: result.select, notice: null };
    }
    case 'doc':
      return { ...state, history: push(state.history, { ...doc, ...action.patch }), notice: null };
    case 'undo':
    case 'redo': {
      const history = action.type === 'undo' ? undo(state.history) : redo(state.history);
      return { ...state, history, selectedId: keepSelection(history.present.tree, state.selectedId), notice: null };
    }
    case 'load': {
      const history = action.keepHistory ? push(state.history, action.doc) : createHistory(action.doc);
      return { ...state, history, selectedId: keepSelection(action.doc.tree, state.selectedId), notice: null };
    }
    case 'select': {
      if (!action.reveal || !action.id) return { ...state, selectedId: action.id };
      const hidden = ancestorsOf(doc.tree, action.id).filter((a) => state.collapsed.has(a));
      if (hidden.length === 0) return { ...state, selectedId: action.id };
      return { ...state, selectedId: action.id, collapsed: new Set([...state.collapsed].filter((c) => !hidden.includes(c))) };
    }
    case 'collapse': {
      const next = new Set(state.collapsed);
      const fold = action.collapsed ?? !next.has(action.id);
      if (fold) next.add(action.id);
      else next.delete(action.id);
      // Folding away the selected step moves the selection to the container.
      const selectedHidden = fold && state.selectedId !== null && ancestorsOf(doc.tree, state.selectedId).includes(action.id);
      return { ...state, collapsed: next, selectedId: selectedHidden ? action.id : state.selectedId };
    }
  }
}

/**
 * The composer's state: the recipe with its undo history (every edit, up to 200), the
 * selection and the folded containers (view state, not undoable). Edits are pure functions
 * of the tree (composer-ops.ts), run inside the reducer so every callback here is stable.
 */
export function useComposer(initial: ComposerDoc) {
  const [state, dispatch] = useReducer(reduce, initial, (doc): State => ({ history: createHistory(doc), selectedId: null, collapsed: new Set(), notice: null }));
  const editTree = useCallback((edit: TreeEdit) => dispatch({ type: 'tree', edit }), []);
  const actions = useMemo(
    () => ({
      editTree,
      setDoc: (patch: Partial<Omit<ComposerDoc, 'tree'>>) => dispatch({ type: 'doc', patch }),
      undo: () => dispatch({ type: 'undo' }),
      redo: () => dispatch({ type: 'redo' }),
      /** Replaces the recipe (their version after a conflict): the undo history starts again. */
      replace: (doc: ComposerDoc) => dispatch({ type: 'load', doc, keepHistory: false }),
      /** Takes a server-made version (a restored revision) as one more undoable edit. */
      pushDoc: (doc: ComposerDoc) => dispatch({ type: 'load', doc, keepHistory: true }),
      select: (id: string | null, reveal?: boolean) => dispatch({ type: 'select', id, reveal }),
      toggleCollapsed: (id: string) => dispatch({ type: 'collapse', id }),
      setCollapsed: (id: string, collapsed: boolean) => dispatch({ type: 'collapse', id, collapsed }),
    }),
    [editTree],
  );
  return {
    doc: state.history.present,
    selectedId: state.selectedId,
    collapsed: state.collapsed,
    notice: state.notice,
    canUndo: canUndo(state.history),
    canRedo: canRedo(state.history),
    actions,
  };
}

export type Composer = ReturnType<typeof useComposer>;
