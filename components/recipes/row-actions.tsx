import { StyleSheet, View } from 'react-native';

import { IconButton } from '@/components/recipes/icon-button';
import { spacing } from '@/constants/theme';

export type RowAbilities = { up: boolean; down: boolean; indent: boolean; outdent: boolean; any: boolean };

export type RowActionHandlers = {
  move: (delta: -1 | 1) => void;
  indent: () => void;
  outdent: () => void;
  duplicate: () => void;
  remove: () => void;
};

type RowActionsProps = { can: RowAbilities; on: RowActionHandlers; size?: 'small' | 'regular' };

/** Move up/down, outdent/indent, duplicate and delete for the selected step (the keys do the same). */
export function RowActions({ can, on, size = 'small' }: RowActionsProps) {
  return (
    <View style={styles.row} role="toolbar" accessibilityLabel="Step actions">
      <IconButton icon="up" label="Move up (Alt+↑)" size={size} onPress={() => on.move(-1)} disabled={!can.up} testID="step-action-up" />
      <IconButton icon="down" label="Move down (Alt+↓)" size={size} onPress={() => on.move(1)} disabled={!can.down} testID="step-action-down" />
      <IconButton icon="outdent" label="Outdent (Shift+Tab)" size={size} onPress={on.outdent} disabled={!can.outdent} testID="step-action-outdent" />
      <IconButton icon="indent" label="Indent into the container above (Tab)" size={size} onPress={on.indent} disabled={!can.indent} testID="step-action-indent" />
      <IconButton icon="duplicate" label="Duplicate (Ctrl+D)" size={size} onPress={on.duplicate} disabled={!can.any} testID="step-action-duplicate" />
      <IconButton icon="delete" label="Delete (Del)" size={size} tone="danger" onPress={on.remove} disabled={!can.any} testID="step-action-delete" />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.xxs },
});
