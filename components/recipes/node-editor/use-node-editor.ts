import { useMemo, useState } from 'react';

import { applyDraft, type ApplyResult } from '@/components/recipes/node-editor/apply';
import { recognizeFraming, targetLabel } from '@/components/recipes/node-editor/choices';
import { nodeToDraft } from '@/components/recipes/node-editor/draft';
import type { DraftValue, DraftValues, NodeDraft, RuleDraft } from '@/components/recipes/node-editor/draft-types';
import type { EditorTarget } from '@/components/recipes/node-editor/editor-types';
import { summarizeNode } from '@/shared/recipe/summary';
import type { RecipeNode } from '@/shared/recipe/types';

type State = { nodeId: string; draft: NodeDraft; touched: Record<string, true>; submitted: boolean };

function initialState(node: RecipeNode, targets: readonly EditorTarget[]): State {
  const draft = nodeToDraft(node);
  if (node.kind === 'stage') {
    const framings = targets.find((t) => t.id === node.targetId)?.framings ?? [];
    draft.values = recognizeFraming(draft.values, framings);
  }
  return { nodeId: node.id, draft, touched: {}, submitted: false };
}

/**
 * The node editor's state: the draft as typed, checked by the shared `nodeSchema` on every
 * change. An error shows under its field once the field is touched or Apply was pressed.
 * A different node (another `id`) starts a fresh draft.
 */
export function useNodeEditor(node: RecipeNode, targets: readonly EditorTarget[]) {
  const [state, setState] = useState<State>(() => initialState(node, targets));
  const current = state.nodeId === node.id ? state : initialState(node, targets);
  if (current !== state) setState(current);
  const { draft, touched, submitted } = current;

  const result: ApplyResult = useMemo(() => applyDraft(draft, node), [draft, node]);
  const summary = useMemo(() => {
    if (!result.ok) return null;
    const targetName = (id: string) => {
      const t = targets.find((x) => x.id === id);
      return t ? targetLabel(t) : undefined;
    };
    return summarizeNode(result.node, { targetName });
  }, [result, targets]);

  const update = (change: (d: NodeDraft) => NodeDraft) => setState((s) => ({ ...s, draft: change(s.draft) }));

  return {
    kind: node.kind,
    values: draft.values,
    rules: draft.rules,
    summary,
    /** Messages of the last check, shown or not. */
    errors: result.ok ? {} : result.errors,
    errorFor(path: string): string | undefined {
      if (result.ok || (!touched[path] && !submitted)) return undefined;
      return result.errors[path];
    },
    set(path: string, value: DraftValue) {
      update((d) => ({ ...d, values: { ...d.values, [path]: value } }));
    },
    /** Replaces several values at once (a mode switch that also fills fields). */
    setValues(change: (values: DraftValues) => DraftValues) {
      update((d) => ({ ...d, values: change(d.values) }));
    },
    setRules(change: (rules: RuleDraft[]) => RuleDraft[]) {
      update((d) => ({ ...d, rules: change(d.rules) }));
    },
    blur(path: string) {
      setState((s) => (s.touched[path] ? s : { ...s, touched: { ...s.touched, [path]: true } }));
    },
    /** Shows every error; gives the checked node, or null while something is invalid. */
    apply(): RecipeNode | null {
      setState((s) => ({ ...s, submitted: true }));
      return result.ok ? result.node : null;
    },
    submitted,
  };
}

export type NodeEditorState = ReturnType<typeof useNodeEditor>;
