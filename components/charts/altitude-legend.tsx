import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

/** Key to the altitude chart's lines. The sky shading has the night band's key on Tonight. */
export function AltitudeLegend() {
  const styles = useThemedStyles(makeStyles);
  const entries = [
    { label: 'Usable (dark, above limit)', swatch: styles.usable },
    { label: 'Twilight or below limit', swatch: styles.faint },
    { label: 'Limit (horizon, min. altitude)', swatch: styles.limit },
    { label: 'Moon', swatch: styles.moon },
  ];
  return (
    <View style={styles.row} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {entries.map((e) => (
        <View key={e.label} style={styles.entry}>
          <View style={[styles.line, e.swatch]} />
          <AppText variant="caption" tone="muted">
            {e.label}
          </AppText>
        </View>
      ))}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
    entry: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs + 2 },
    line: { width: 18, height: 0, borderTopWidth: 2 },
    usable: { borderTopColor: c.accent, borderTopWidth: 3 },
    faint: { borderTopColor: c.accent, opacity: 0.45 },
    limit: { borderTopColor: c.danger },
    moon: { borderTopColor: c.moon, borderStyle: 'dashed' },
  });
