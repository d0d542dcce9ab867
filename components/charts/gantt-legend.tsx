import { StyleSheet, View } from 'react-native';

import { groupFill } from '@/components/dry-run/colours';
import { EVENT_GROUPS } from '@/components/dry-run/timeline-rows';
import { useTheme } from '@/components/theme-provider';
import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

/** Key to the timeline's block colours and marks. */
export function GanttLegend() {
  const styles = useThemedStyles(makeStyles);
  const { palette: c } = useTheme();
  return (
    <View style={styles.row} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {EVENT_GROUPS.map((g) => (
        <View key={g.group} style={styles.entry}>
          <View style={[styles.swatch, { backgroundColor: groupFill(g.group, c) }, g.group === 'idle' && styles.idle]} />
          <AppText variant="caption" tone="muted">
            {g.label}
          </AppText>
        </View>
      ))}
      <View style={styles.entry}>
        <View style={styles.diamond} />
        <AppText variant="caption" tone="muted">
          Flip begins
        </AppText>
      </View>
      <View style={styles.entry}>
        <View style={styles.dawn} />
        <AppText variant="caption" tone="muted">
          Astronomical dawn
        </AppText>
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
    entry: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs + 2 },
    swatch: { width: 14, height: 10, borderRadius: 2 },
    idle: { borderWidth: 1, borderColor: c.textFaint, borderStyle: 'dashed' },
    diamond: { width: 8, height: 8, backgroundColor: c.moon, transform: [{ rotate: '45deg' }], marginHorizontal: 3 },
    dawn: { width: 0, height: 12, borderLeftWidth: 1.5, borderColor: c.text, borderStyle: 'dashed', marginHorizontal: 6 },
  });
