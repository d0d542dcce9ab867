import { useCallback, useLayoutEffect, useMemo, useRef, useState } from 'react';
import type { View } from 'react-native';

import { rowAbilities } from '@/components/recipes/composer-ops';
import { NODE_KIND_LABELS } from '@/components/recipes/node-icon';
import { createSelectionStore } from '@/components/recipes/selection-store';
import { useComposerActions } from '@/components/recipes/use-composer-actions';
import { useComposerKeys } from '@/components/recipes/use-composer-keys';
import { useComposerView } from '@/components/recipes/use-composer-view';
import { useLeaveGuard } from '@/components/recipes/use-leave-guard';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useComposer, type ComposerDoc } from '@/hooks/use-composer';
import { docOf, useRecipeAutosave } from '@/hooks/use-recipe-autosave';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useSitesQuery } from '@/hooks/use-sites';
import { useTargetsQuery } from '@/hooks/use-targets';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

export type ComposerPanel = 'none' | 'findings' | 'history' | 'palette' | 'editor';

/**
 * Everything the composer screen wires together: the recipe with its history, autosave, the
 * rig, site and targets it is checked against, what derives from the tree, the edits, the
 * keyboard, the open panel and the selection store the rows read.
 */
export function useComposerScreen(recipe: RecipeDetail) {
  const { isWide } = useBreakpoints();
  const [initial] = useState(() => docOf(recipe));
  const composer = useComposer(initial);
  const { doc, selectedId } = composer;
  const autosave = useRecipeAutosave(recipe.id, doc, recipe.version);
  const rigs = useRigsQuery();
  const sites = useSitesQuery();
  const targets = useTargetsQuery();
  const rig = rigs.data?.find((r) => r.id === doc.rigId);
  const site = sites.data?.find((s) => s.id === doc.siteId);
  const view = useComposerView(doc, composer.collapsed, rig, site, targets.data, autosave.failure);
  const actions = useComposerActions(composer, rig);
  const [panel, setPanel] = useState<ComposerPanel>('none');
  const listRef = useRef(null);
  const treeRef = useRef<View>(null);
  const [selection] = useState(createSelectionStore);
  useLayoutEffect(() => selection.set(selectedId), [selection, selectedId]);
  useLeaveGuard(autosave.state !== 'saved');
  useComposerKeys({ composer, actions, rows: view.rows, treeRef, listRef, openEditor: () => setPanel('editor') });

  const { replace, pushDoc, select } = composer.actions;
  const { adopt: adoptSaved } = autosave;
  /** The server's copy becomes ours: their version after a conflict (history restarts) or a restored revision (undoable). */
  const adopt = useCallback(
    (server: RecipeDetail, mode: 'replace' | 'push') => {
      const next: ComposerDoc = docOf(server);
      if (mode === 'replace') replace(next);
      else pushDoc(next);
      adoptSaved(server, next);
    },
    [replace, pushDoc, adoptSaved],
  );
  // Phones edit in a sheet that a tap opens; wide screens show the editor beside the list.
  const onSelectRow = useCallback(
    (id: string) => {
      select(id);
      if (!isWide) setPanel('editor');
    },
    [select, isWide],
  );
  const stepName = useCallback((id: string) => {
    const node = view.nodeById.get(id);
    return node ? `${NODE_KIND_LABELS[node.kind]}${node.label ? ` · ${node.label}` : ''}` : 'A step';
  }, [view.nodeById]);
  const can = useMemo(() => rowAbilities(view.rows, doc.tree, selectedId), [view.rows, doc.tree, selectedId]);
  const rigChoices = useMemo(() => (rigs.data ?? []).map((r) => ({ value: r.id, label: r.name })), [rigs.data]);
  const siteChoices = useMemo(() => (sites.data ?? []).map((s) => ({ value: s.id, label: s.name })), [sites.data]);

  return { isWide, composer, autosave, rig, targets: targets.data ?? [], view, actions, panel, setPanel, listRef, treeRef, selection, adopt, onSelectRow, stepName, can, rigChoices, siteChoices };
}
