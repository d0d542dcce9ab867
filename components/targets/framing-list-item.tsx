import { Pressable, StyleSheet, View } from 'react-native';

import { angleText } from '@/components/targets/framing-form';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { Rig } from '@/shared/rig/schema';
import type { Framing } from '@/shared/schemas/target';
import { formatDec, formatRa } from '@/shared/targets/schema';

type FramingListItemProps = { framing: Framing; rig: Rig | undefined; selected: boolean; onPress: () => void };

function detailText(f: Framing, rig: Rig | undefined): string {
  const mosaic = f.mosaicCols * f.mosaicRows > 1 ? `${f.mosaicCols} × ${f.mosaicRows} mosaic, ${f.overlapPct} % overlap` : 'single field';
  return [`PA ${angleText(f.positionAngleDeg)}°`, mosaic, rig ? rig.name : null, f.source === 'fits' ? 'from FITS' : null].filter(Boolean).join(' · ');
}

/** One saved framing: name, centre, angle, mosaic and rig; selecting it opens the editor. */
export function FramingListItem({ framing, rig, selected, onPress }: FramingListItemProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <Pressable
      role="button"
      accessibilityLabel={framing.name}
      aria-pressed={selected}
      onPress={onPress}
      testID="framing-item"
      style={({ hovered }: WebPressState) => [styles.item, hovered && styles.hover, selected && styles.selected]}
    >
      <View style={styles.top}>
        <AppText weight="semibold" style={styles.grow} numberOfLines={1}>
          {framing.name}
        </AppText>
        <AppText variant="small" tone="muted" tabular>
          {`${formatRa(framing.raDeg)}  ${formatDec(framing.decDeg)}`}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {detailText(framing, rig)}
      </AppText>
    </Pressable>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    hover: { borderColor: c.borderStrong },
    selected: { borderColor: c.accent, backgroundColor: c.accentSoft },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
    grow: { flexGrow: 1, flexShrink: 1 },
  });
