import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { kindLabel } from '@/components/targets/kinds';
import { designationSlug, formatSizeArcmin } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { useHover } from '@/hooks/use-hover';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { Target } from '@/shared/schemas/target';

const framingsText = (n: number) => (n === 0 ? 'No framing yet' : n === 1 ? '1 framing' : `${n} framings`);

/** One target on the list: designation, name, kind, size and how many framings; opens the detail. */
export function TargetListItem({ target }: { target: Target }) {
  const styles = useThemedStyles(makeStyles);
  const { hovered, handlers } = useHover();
  const label = target.name ? `${target.designation}, ${target.name}` : target.designation;
  return (
    <Link href={`/targets/${target.id}`} asChild>
      {/* Link's Slot merges styles as objects: pass a flat one, never an array. */}
      <Pressable accessibilityLabel={label} testID={`target-item-${designationSlug(target.designation)}`} {...handlers} style={StyleSheet.flatten([styles.item, hovered && styles.itemHover])}>
        <View style={styles.top}>
          <AppText weight="semibold" tabular>
            {target.designation}
          </AppText>
          {target.name ? (
            <AppText tone="muted" numberOfLines={1} style={styles.name}>
              {target.name}
            </AppText>
          ) : null}
        </View>
        <View style={styles.bottom}>
          <AppText variant="small" tone="muted" tabular style={styles.grow}>
            {`${kindLabel(target.type)} · ${formatSizeArcmin(target.majorArcmin, target.minorArcmin)}`}
          </AppText>
          <AppText variant="small" tone={target.framings.length ? 'accent' : 'faint'} testID="target-item-framings">
            {framingsText(target.framings.length)}
          </AppText>
        </View>
      </Pressable>
    </Link>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { backgroundColor: c.surface, borderColor: c.border, borderWidth: 1, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs },
    itemHover: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
    name: { flexShrink: 1 },
    bottom: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    grow: { flex: 1 },
  });
