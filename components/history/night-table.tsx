import { StyleSheet, View } from 'react-native';

import { byFilterText } from '@/components/history/history-format';
import { formatHm } from '@/components/dry-run/run-format';
import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';
import type { TargetHistory } from '@/shared/schemas/calibration-api';

/** One row per night, newest first: the night, integration by filter (h:mm) and the night's total. */
export function NightTable({ nights }: { nights: TargetHistory['nights'] }) {
  const styles = useThemedStyles(makeStyles);
  const newestFirst = [...nights].sort((a, b) => b.nightDate.localeCompare(a.nightDate));
  return (
    <View role="table" accessibilityLabel="Nights" testID="history-nights">
      <View style={[styles.row, styles.head]} role="row">
        <AppText role="columnheader" variant="caption" tone="faint" style={styles.night}>
          Night
        </AppText>
        <AppText role="columnheader" variant="caption" tone="faint" style={styles.filters}>
          By filter (h:mm)
        </AppText>
        <AppText role="columnheader" variant="caption" tone="faint" style={styles.total}>
          Total
        </AppText>
      </View>
      {newestFirst.map((n) => (
        <View key={n.nightDate} style={styles.row} role="row" testID={`history-night-${n.nightDate}`}>
          <AppText role="cell" variant="small" tabular style={styles.night}>
            {formatNightDate(n.nightDate)}
          </AppText>
          <AppText role="cell" variant="small" tone="muted" tabular style={styles.filters}>
            {byFilterText(n.byFilter)}
          </AppText>
          <AppText role="cell" variant="small" weight="semibold" tabular style={styles.total}>
            {formatHm(n.seconds)}
          </AppText>
        </View>
      ))}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, paddingVertical: spacing.xs + 2, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: c.border, flexWrap: 'wrap' },
    head: { borderBottomColor: c.borderStrong },
    night: { width: 118 },
    filters: { flex: 1, minWidth: 120 },
    total: { width: 52, textAlign: 'right' },
  });
