import { forwardRef, memo, useCallback, useEffect, useRef, type ReactElement } from 'react';
import { InteractionManager, StyleSheet, View } from 'react-native';
import DraggableFlatList, { type DragEndParams, type RenderItemParams } from 'react-native-draggable-flatlist';

import type { SelectionStore } from '@/components/recipes/selection-store';
import { ROW_HEIGHT, StepRow } from '@/components/recipes/step-row';
import type { FindingSeverity } from '@/shared/recipe/checks';
import type { FlatRow } from '@/shared/recipe/flat';
import type { RecipeNode } from '@/shared/recipe/types';

export type NodeFindings = { severity: FindingSeverity; count: number };

type StepListProps = {
  rows: FlatRow[];
  nodeById: ReadonlyMap<string, RecipeNode>;
  selection: SelectionStore;
  findingsByNode: ReadonlyMap<string, NodeFindings>;
  errorsByNode: ReadonlyMap<string, string[]>;
  targetName: (id: string) => string | undefined;
  onSelect: (id: string) => void;
  onToggleCollapsed: (id: string) => void;
  onSetCollapsed: (id: string, collapsed: boolean) => void;
  onToggleEnabled: (id: string) => void;
  /** A drop: `rows` as the list showed them while dragging. */
  onDrop: (rows: FlatRow[], from: number, to: number) => void;
  /** Shown when there are no rows; keep it stable (null otherwise) so the list can skip renders. */
  empty: ReactElement | null;
};

const keyExtractor = (row: FlatRow) => row.id;
/** A critically damped settle (damping = 2√(k·m)): the dropped row lands in about a tenth of a second. */
const SETTLE = { stiffness: 900, mass: 0.3, damping: 33, overshootClamping: true, energyThreshold: 1e-3 };
const getItemLayout = (_: unknown, index: number) => ({ length: ROW_HEIGHT, offset: ROW_HEIGHT * index, index });

type PendingDrag = { id: string; drag: () => void; started: boolean };

/**
 * A dragged container is folded first so it moves as one row with its children (the drop rule
 * of `moveByFlatIndex`). The list drops a drag whose data changes, so the drag starts only
 * after the fold has rendered and the list has finished its own reset.
 */
function useFoldingDrag(rows: FlatRow[], onSetCollapsed: StepListProps['onSetCollapsed']) {
  const pending = useRef<PendingDrag | null>(null);
  const rowsRef = useRef(rows);
  rowsRef.current = rows;

  useEffect(() => {
    const p = pending.current;
    if (!p || p.started || !rows.find((r) => r.id === p.id)?.collapsed) return;
    const task = InteractionManager.runAfterInteractions(() => {
      if (pending.current !== p) return;
      p.started = true;
      p.drag();
    });
    return () => task.cancel();
  }, [rows]);

  const onHandlePressIn = useCallback(
    (id: string, drag: () => void) => {
      const row = rowsRef.current.find((r) => r.id === id);
      if (!row?.isContainer || row.collapsed || !row.hasChildren) return drag();
      pending.current = { id, drag, started: false };
      onSetCollapsed(id, true);
    },
    [onSetCollapsed],
  );
  const onHandlePressOut = useCallback(
    (id: string) => {
      const p = pending.current;
      if (!p || p.id !== id || p.started) return;
      pending.current = null;
      onSetCollapsed(id, false);
    },
    [onSetCollapsed],
  );
  const finish = useCallback(() => {
    const p = pending.current;
    pending.current = null;
    if (p) onSetCollapsed(p.id, false);
  }, [onSetCollapsed]);
  return { rowsRef, onHandlePressIn, onHandlePressOut, finish };
}

/** The recipe as one drag list of flattened rows, indented by depth (stack-notes.md). */
export const StepList = memo(
  forwardRef<unknown, StepListProps>(function StepList(p, ref) {
    const { rowsRef, onHandlePressIn, onHandlePressOut, finish } = useFoldingDrag(p.rows, p.onSetCollapsed);
    const { nodeById, selection, findingsByNode, errorsByNode, targetName, onSelect, onToggleCollapsed, onToggleEnabled, onDrop } = p;

    const renderItem = useCallback(
      ({ item, drag, isActive }: RenderItemParams<FlatRow>) => {
        const node = nodeById.get(item.id);
        if (!node) return null;
        const findings = findingsByNode.get(item.id);
        return (
          <StepRow
            node={node}
            depth={item.depth}
            isContainer={item.isContainer}
            collapsed={item.collapsed}
            hasChildren={item.hasChildren}
            selection={selection}
            severity={findings?.severity ?? null}
            findingCount={findings?.count ?? 0}
            errorText={errorsByNode.get(item.id)?.[0]}
            targetName={targetName}
            isActive={isActive}
            drag={drag}
            onPress={onSelect}
            onToggleCollapsed={onToggleCollapsed}
            onToggleEnabled={onToggleEnabled}
            onHandlePressIn={onHandlePressIn}
            onHandlePressOut={onHandlePressOut}
          />
        );
      },
      [nodeById, selection, findingsByNode, errorsByNode, targetName, onSelect, onToggleCollapsed, onToggleEnabled, onHandlePressIn, onHandlePressOut],
    );

    const onDragEnd = useCallback(
      ({ from, to }: DragEndParams<FlatRow>) => {
        onDrop(rowsRef.current, from, to);
        finish();
      },
      [onDrop, finish, rowsRef],
    );

    return (
      <View style={styles.fill}>
        <DraggableFlatList
          ref={ref as never}
          data={p.rows}
          keyExtractor={keyExtractor}
          renderItem={renderItem}
          onDragEnd={onDragEnd}
          containerStyle={styles.fill}
          getItemLayout={getItemLayout}
          initialNumToRender={24}
          maxToRenderPerBatch={24}
          windowSize={9}
          updateCellsBatchingPeriod={30}
          autoscrollThreshold={60}
        animationConfig={SETTLE}
          ListEmptyComponent={p.empty}
          contentContainerStyle={styles.content}
          testID="composer-steps"
        />
      </View>
    );
  }),
);

const styles = StyleSheet.create({
  fill: { flex: 1 },
  content: { paddingBottom: ROW_HEIGHT * 2 },
});
