import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatPercent } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';

/** Key to the band's colours, in the order the sky darkens. */
export function NightBandLegend({ illumination }: { illumination: number }) {
  const styles = useThemedStyles(makeStyles);
  const { palette: c } = useTheme();
  const entries = [
    { label: 'Day', colour: c.skyDay },
    { label: 'Civil', colour: c.skyCivil },
    { label: 'Nautical', colour: c.skyNautical },
    { label: 'Astronomical', colour: c.skyAstronomical },
    { label: 'Dark', colour: c.skyDark },
  ];
  return (
    <View style={styles.row} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {entries.map((e) => (
        <View key={e.label} style={styles.entry}>
          <View style={[styles.swatch, { backgroundColor: e.colour }]} />
          <AppText variant="caption" tone="muted">
            {e.label}
          </AppText>
        </View>
      ))}
      <View style={styles.entry}>
        <View style={[styles.moon, { opacity: 0.35 + 0.65 * illumination }]} />
        <AppText variant="caption" tone="muted" tabular>
          {`Moon up · ${formatPercent(illumination)}`}
        </AppText>
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs, paddingHorizontal: spacing.lg },
    entry: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs + 2 },
    swatch: { width: 12, height: 12, borderRadius: 3, borderWidth: 1, borderColor: c.borderStrong },
    moon: { width: 14, height: 5, borderRadius: radii.pill, backgroundColor: c.moon },
  });
