import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useHover } from '@/hooks/use-hover';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import { rigImaging } from '@/shared/rig/optics';
import type { Rig } from '@/shared/rig/schema';

/** "530 mm · f/5.0 · 1.46″/px" and "2.54° × 1.70° field" of a stored rig. */
export function rigSummary(rig: Rig): { optics: string; field: string } {
  const i = rigImaging(rig);
  return {
    optics: `${i.effectiveFocalLengthMm.toFixed(0)} mm · f/${i.focalRatio.toFixed(1)} · ${i.pixelScaleArcsecPerPx.toFixed(2)}″/px`,
    field: `${i.fieldWidthDeg.toFixed(2)}° × ${i.fieldHeightDeg.toFixed(2)}° field · ${rig.filterWheel.slots.length} filter${rig.filterWheel.slots.length === 1 ? '' : 's'}`,
  };
}

/** One rig in the list: name and what it delivers on the sky; opens the editor. */
export function RigListItem({ rig }: { rig: Rig }) {
  const styles = useThemedStyles(makeStyles);
  const { hovered, handlers } = useHover();
  const summary = rigSummary(rig);
  return (
    <Link href={`/rigs/${rig.id}`} asChild>
      {/* Link's Slot merges styles as objects: pass a flat one, never an array. */}
      <Pressable accessibilityLabel={rig.name} testID={`rig-item-${rig.id}`} {...handlers} style={StyleSheet.flatten([styles.item, hovered && styles.itemHover])}>
        <AppText variant="lead" weight="semibold" numberOfLines={1}>
          {rig.name}
        </AppText>
        <AppText tone="muted" tabular>
          {summary.optics}
        </AppText>
        <AppText variant="small" tone="faint" tabular>
          {summary.field}
        </AppText>
      </Pressable>
    </Link>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { backgroundColor: c.surface, borderColor: c.border, borderWidth: 1, borderRadius: radii.lg, padding: spacing.lg, gap: spacing.xs },
    itemHover: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
  });
