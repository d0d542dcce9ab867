import { useLayoutEffect, useMemo, type RefObject } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import type { ComposerPanel } from '@/components/recipes/use-composer-screen';
import { ComposerBottomBar } from '@/components/recipes/composer-bottom-bar';
import { EditorPanel } from '@/components/recipes/editor-panel';
import { NODE_KIND_LABELS } from '@/components/recipes/node-icon';
import { RowActions, type RowAbilities } from '@/components/recipes/row-actions';
import type { SelectionStore } from '@/components/recipes/selection-store';
import { Sheet } from '@/components/recipes/sheet';
import { StepTree } from '@/components/recipes/step-tree';
import { StepPalette } from '@/components/recipes/step-palette';
import { TREE_KEY_HINTS } from '@/components/recipes/tree-keys';
import type { ComposerActions } from '@/components/recipes/use-composer-actions';
import type { useComposerView } from '@/components/recipes/use-composer-view';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { Composer } from '@/hooks/use-composer';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';
import type { NodeKind } from '@/shared/recipe/types';
import type { Rig } from '@/shared/rig/schema';
import type { Target } from '@/shared/schemas/target';

type ComposerBodyProps = {
  composer: Composer;
  actions: ComposerActions;
  view: ReturnType<typeof useComposerView>;
  can: RowAbilities;
  rig: Rig | undefined;
  targets: Target[];
  panel: ComposerPanel;
  setPanel: (panel: ComposerPanel) => void;
  onSelectRow: (id: string) => void;
  selection: SelectionStore;
  listRef: RefObject<unknown>;
  treeRef: RefObject<View | null>;
};

/** Where the palette puts a new step, in words. */
function placeText(p: ComposerBodyProps): string {
  const row = p.view.rows.find((r) => r.id === p.composer.selectedId);
  const node = row ? p.view.nodeById.get(row.id) : undefined;
  if (!row || !node) return 'at the end';
  const name = node.label || NODE_KIND_LABELS[node.kind];
  return row.isContainer && !row.collapsed ? `at the top of ${name}` : `after ${name}`;
}

/** The list, the palette and the step editor, arranged for the screen width. */
export function ComposerBody(p: ComposerBodyProps) {
  const styles = useThemedStyles(makeStyles);
  const { isWide, isExtraWide } = useBreakpoints();
  const { composer, actions, view, setPanel } = p;
  const selectedId = composer.selectedId;
  // From 1280 px the selected row carries its buttons; between 900 and 1280 the row is too narrow, so they sit above the list.
  const inlineActions = useMemo(() => (isExtraWide && selectedId ? <RowActions can={p.can} on={actions} /> : null), [isExtraWide, selectedId, p.can, actions]);
  const { selection } = p;
  useLayoutEffect(() => selection.extras.set(inlineActions), [selection, inlineActions]);
  const add = (kind: NodeKind) => {
    actions.add(kind);
    if (p.panel === 'palette') setPanel('none');
  };
  const where = placeText(p);
  const list = <StepTree composer={composer} actions={actions} view={view} selection={selection} onSelectRow={p.onSelectRow} onAddFirst={() => setPanel('palette')} listRef={p.listRef} treeRef={p.treeRef} />;
  const notice = composer.notice ? (
    <AppText key={composer.notice.n} variant="small" tone="accent" role="status" testID="composer-notice">
      {composer.notice.message}
    </AppText>
  ) : null;
  const paletteSheet = (
    <Sheet open={p.panel === 'palette'} onClose={() => setPanel('none')} title="Add a step" testID="composer-palette-sheet">
      <StepPalette onAdd={add} placeText={where} />
    </Sheet>
  );
  const editor = <EditorPanel node={selectedId ? view.nodeById.get(selectedId) : undefined} rig={p.rig} targets={p.targets} errors={selectedId ? view.errors.byNode.get(selectedId) : undefined} onApply={actions.apply} onClose={() => (isWide ? composer.actions.select(null) : setPanel('none'))} asSheet={!isWide} open={isWide || p.panel === 'editor'} />;

  if (!isWide) {
    return (
      <View style={styles.fill}>
        {list}
        {notice}
        <ComposerBottomBar can={p.can} on={actions} hasSelection={!!selectedId} onAdd={() => setPanel('palette')} onEdit={() => setPanel('editor')} />
        {editor}
        {paletteSheet}
      </View>
    );
  }
  return (
    <View style={styles.columns}>
      {isExtraWide ? (
        <ScrollView style={styles.paletteColumn} contentContainerStyle={styles.paletteContent}>
          <StepPalette onAdd={add} placeText={where} layout="column" />
        </ScrollView>
      ) : null}
      <View style={styles.center}>
        {isExtraWide ? null : (
          <View style={styles.toolbar}>
            <Button label="Add step" size="small" variant="secondary" onPress={() => setPanel('palette')} testID="composer-add" />
            {selectedId ? <RowActions can={p.can} on={actions} /> : null}
            <AppText variant="small" tone="faint" numberOfLines={1} style={styles.fill}>{`New steps go ${where}.`}</AppText>
          </View>
        )}
        {list}
        {notice}
        <AppText variant="caption" tone="faint" numberOfLines={2} testID="composer-key-hint">
          {TREE_KEY_HINTS.join(' · ')}
        </AppText>
      </View>
      <View style={[styles.side, isExtraWide && styles.sideWide]}>{editor}</View>
      {paletteSheet}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    fill: { flex: 1 },
    columns: { flex: 1, flexDirection: 'row', gap: spacing.lg, paddingBottom: spacing.lg },
    paletteColumn: { width: 190, flexGrow: 0 },
    paletteContent: { paddingBottom: spacing.xl },
    center: { flex: 1, minWidth: 0, gap: spacing.sm },
    toolbar: { flexDirection: 'row', alignItems: 'center', gap: spacing.md },
    side: { width: 330, borderLeftWidth: 1, borderLeftColor: c.border, paddingLeft: spacing.lg },
    sideWide: { width: 380 },
  });
