import { StyleSheet, View } from 'react-native';

import { IconButton } from '@/components/recipes/icon-button';
import { RowActions, type RowAbilities, type RowActionHandlers } from '@/components/recipes/row-actions';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

type BottomBarProps = {
  can: RowAbilities;
  on: RowActionHandlers;
  hasSelection: boolean;
  onAdd: () => void;
  onEdit: () => void;
};

/** Phones: Add, and the selected step's actions, within thumb reach above the tabs. */
export function ComposerBottomBar({ can, on, hasSelection, onAdd, onEdit }: BottomBarProps) {
  const styles = useThemedStyles(makeStyles);
  if (!hasSelection) {
    return (
      <View style={styles.bar}>
        <Button label="Add step" size="small" onPress={onAdd} testID="composer-add" />
        <AppText variant="small" tone="faint" style={styles.hint} numberOfLines={2}>
          Tap a step to edit it; drag it by its handle.
        </AppText>
      </View>
    );
  }
  return (
    <View style={styles.bar}>
      <IconButton icon="add" label="Add step" tone="accent" onPress={onAdd} testID="composer-add" />
      <View style={styles.grow}>
        <RowActions can={can} on={on} size="regular" />
      </View>
      <IconButton icon="edit" label="Edit step" onPress={onEdit} testID="step-action-edit" />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    bar: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingVertical: spacing.sm, borderTopWidth: 1, borderTopColor: c.border, marginHorizontal: -spacing.md, paddingHorizontal: spacing.sm, backgroundColor: c.surface },
    hint: { flex: 1 },
    grow: { flex: 1, alignItems: 'center' },
  });
