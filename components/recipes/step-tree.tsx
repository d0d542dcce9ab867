import type { RefObject } from 'react';
import { StyleSheet, View } from 'react-native';

import type { SelectionStore } from '@/components/recipes/selection-store';
import { StepList } from '@/components/recipes/step-list';
import type { ComposerActions } from '@/components/recipes/use-composer-actions';
import type { useComposerView } from '@/components/recipes/use-composer-view';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import type { Composer } from '@/hooks/use-composer';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, type Palette } from '@/constants/theme';

type StepTreeProps = {
  composer: Composer;
  actions: ComposerActions;
  view: ReturnType<typeof useComposerView>;
  selection: SelectionStore;
  onSelectRow: (id: string) => void;
  onAddFirst: () => void;
  listRef: RefObject<unknown>;
  treeRef: RefObject<View | null>;
};

/**
 * The steps as an ARIA tree: one stop in the Tab order that holds the keyboard focus (the
 * selected row is its active descendant), around the drag list.
 */
export function StepTree({ composer, actions, view, selection, onSelectRow, onAddFirst, listRef, treeRef }: StepTreeProps) {
  const styles = useThemedStyles(makeStyles);
  const { selectedId } = composer;
  const activeDescendant = selectedId ? ({ 'aria-activedescendant': `step-${selectedId}` } as object) : {};
  const empty =
    view.rows.length > 0 ? null : (
      <EmptyState title="No steps yet" message="Add the night's first step from the palette: most nights start by cooling the camera." action={<Button label="Add a step" onPress={onAddFirst} testID="composer-empty-add" />} />
    );
  return (
    <View ref={treeRef} focusable role="tree" accessibilityLabel="Steps" {...activeDescendant} style={styles.tree} testID="composer-tree">
      <StepList
        ref={listRef}
        rows={view.rows}
        nodeById={view.nodeById}
        selection={selection}
        findingsByNode={view.findingsByNode}
        errorsByNode={view.errors.byNode}
        targetName={view.targetName}
        onSelect={onSelectRow}
        onToggleCollapsed={composer.actions.toggleCollapsed}
        onSetCollapsed={composer.actions.setCollapsed}
        onToggleEnabled={actions.toggleEnabled}
        onDrop={actions.drop}
        empty={empty}
      />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    tree: { flex: 1, borderWidth: 1, borderColor: c.border, borderRadius: radii.md, overflow: 'hidden', backgroundColor: c.background },
  });
