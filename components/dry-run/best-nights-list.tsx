import { Pressable, StyleSheet, View } from 'react-native';

import { formatSpanS } from '@/components/dry-run/run-format';
import type { NightScan } from '@/components/dry-run/scan-state';
import { SeverityTag } from '@/components/dry-run/severity-icon';
import { SEVERITIES } from '@/components/dry-run/totals-rows';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';

type BestNightsListProps = { nights: NightScan[]; onPick: (date: string) => void };

/** The best nights of the scan, ranked; a tap dry-runs that night. */
export function BestNightsList({ nights, onPick }: BestNightsListProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.list} role="list" accessibilityLabel="Best nights">
      {nights.map((n, i) => {
        const flagged = SEVERITIES.filter((s) => n.findings[s] > 0);
        return (
          <Pressable
            key={n.date}
            role="button"
            accessibilityLabel={`Number ${i + 1}: ${formatNightDate(n.date)}, ${formatSpanS(n.usableIntegrationS)} usable. Dry-run this night.`}
            onPress={() => onPick(n.date)}
            testID={`scan-best-${n.date}`}
            style={({ hovered, pressed }: WebPressState) => [styles.item, (hovered || pressed) && styles.itemActive]}
          >
            <AppText variant="lead" weight="semibold" tone="faint" tabular style={styles.rank}>
              {String(i + 1)}
            </AppText>
            <View style={styles.main}>
              <AppText weight="semibold" tabular>
                {formatNightDate(n.date)}
              </AppText>
              <View style={styles.tags}>
                {flagged.length === 0 ? (
                  <AppText variant="small" tone="ok">
                    No findings
                  </AppText>
                ) : (
                  flagged.map((s) => <SeverityTag key={s} severity={s} count={n.findings[s]} />)
                )}
              </View>
            </View>
            <View style={styles.figure}>
              <AppText weight="semibold" tabular>
                {formatSpanS(n.usableIntegrationS)}
              </AppText>
              <AppText variant="caption" tone="muted">
                usable
              </AppText>
            </View>
            <AppText tone="accent" weight="semibold" accessibilityElementsHidden>
              ›
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    list: { gap: spacing.sm },
    item: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border, backgroundColor: c.background },
    itemActive: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
    rank: { width: 20, textAlign: 'center' },
    main: { flex: 1, gap: spacing.xs, minWidth: 0 },
    tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
    figure: { alignItems: 'flex-end' },
  });
