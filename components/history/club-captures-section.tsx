import { StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { byFilterText, integrationText } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { useClubCapturesQuery } from '@/hooks/use-history';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';

/** What members chose to share of their captures: target, totals by filter, nights. */
export function ClubCapturesSection({ clubId }: { clubId: string }) {
  const styles = useThemedStyles(makeStyles);
  const captures = useClubCapturesQuery(clubId);
  return (
    <FormSection title="Shared captures" description="Targets members shared from their capture history: totals by filter and nights, no frames." testID="club-captures">
      {captures.isPending ? <LoadingView label="Loading shared captures…" /> : null}
      {captures.isError ? <ErrorView error={captures.error} onRetry={() => captures.refetch()} retrying={captures.isFetching} title="Could not load the shared captures" /> : null}
      {captures.data && captures.data.length === 0 ? (
        <AppText variant="small" tone="muted" testID="club-captures-empty">
          Nobody has shared a target yet. Share one from its capture history (Calibration › History).
        </AppText>
      ) : null}
      {captures.data && captures.data.length > 0 ? (
        <View style={styles.list} role="list">
          {captures.data.map((c, i) => (
            <View key={`${c.ownerName}-${c.designation}-${i}`} style={styles.item} role="listitem" testID="club-capture">
              <View style={styles.top}>
                <AppText weight="semibold" style={styles.grow} numberOfLines={1}>
                  {c.name && c.name !== c.designation ? `${c.designation} · ${c.name}` : c.designation}
                </AppText>
                <AppText weight="semibold" tabular>
                  {integrationText(c.seconds)}
                </AppText>
              </View>
              <AppText variant="small" tone="muted" tabular>
                {byFilterText(c.byFilter)}
              </AppText>
              <AppText variant="small" tone="faint" tabular>
                {`${c.ownerName} · ${countText(c.nights, 'night', 'nights')} · last ${formatNightDate(c.lastNight)}`}
              </AppText>
            </View>
          ))}
        </View>
      ) : null}
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    list: { gap: spacing.sm },
    item: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
    grow: { flexGrow: 1, flexShrink: 1 },
  });
