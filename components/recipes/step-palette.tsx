import { Pressable, StyleSheet, View } from 'react-native';

import { PALETTE_GROUPS } from '@/components/recipes/kinds';
import { NODE_KIND_HINTS, NODE_KIND_LABELS, NodeIcon } from '@/components/recipes/node-icon';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { NodeKind } from '@/shared/recipe/types';

type StepPaletteProps = {
  onAdd: (kind: NodeKind) => void;
  /** Where a new step goes, e.g. "after Focus" or "at the end". */
  placeText: string;
  /** Two columns of tiles (sheet) or one compact list (side column). */
  layout?: 'tiles' | 'column';
};

/** The steps to add, grouped in the order of a night. */
export function StepPalette({ onAdd, placeText, layout = 'tiles' }: StepPaletteProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <View style={styles.palette} testID="step-palette">
      <AppText variant="small" tone="faint" testID="step-palette-place">{`New steps go ${placeText}.`}</AppText>
      {PALETTE_GROUPS.map((group) => (
        <View key={group.key} style={styles.group} role="group" accessibilityLabel={group.label}>
          <AppText eyebrow tone="faint" weight="semibold">
            {group.label}
          </AppText>
          <View style={layout === 'tiles' ? styles.tiles : styles.column}>
            {group.kinds.map((kind) => (
              <Pressable
                key={kind}
                role="button"
                accessibilityLabel={`Add ${NODE_KIND_LABELS[kind]}`}
                accessibilityHint={NODE_KIND_HINTS[kind]}
                onPress={() => onAdd(kind)}
                testID={`palette-add-${kind}`}
                style={({ hovered, pressed }: WebPressState) => [styles.item, layout === 'tiles' && styles.tile, (hovered || pressed) && styles.itemHover]}
              >
                <NodeIcon kind={kind} size={18} color={palette.accent} />
                <AppText variant="small" weight="semibold" numberOfLines={1} style={styles.itemText}>
                  {NODE_KIND_LABELS[kind]}
                </AppText>
              </Pressable>
            ))}
          </View>
        </View>
      ))}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    palette: { gap: spacing.lg },
    group: { gap: spacing.xs + 2 },
    tiles: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
    column: { gap: spacing.xxs },
    item: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: 36, paddingHorizontal: spacing.sm, borderRadius: radii.sm },
    tile: { flexBasis: '47%', flexGrow: 1, minHeight: 44, borderWidth: 1, borderColor: c.border, backgroundColor: c.background },
    itemHover: { backgroundColor: c.surfaceRaised },
    itemText: { flexShrink: 1 },
  });
