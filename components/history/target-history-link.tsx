import { StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { byFilterText, integrationText } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { TextLink } from '@/components/ui/text-link';
import { useHistoryQuery } from '@/hooks/use-history';
import { spacing } from '@/constants/theme';

/** On a target's page: what was captured of it so far, and the way to its history. */
export function TargetHistoryLink({ targetId }: { targetId: string }) {
  const history = useHistoryQuery();
  const row = history.data?.find((t) => t.targetId === targetId);
  return (
    <Card testID="target-history-card">
      <View style={styles.top}>
        <AppText variant="lead" weight="semibold" role="heading" aria-level={2} style={styles.grow}>
          Capture history
        </AppText>
        <TextLink href={`/targets/${targetId}/history`} label="Open ›" testID="target-history-open" />
      </View>
      {row ? (
        <AppText variant="small" tone="muted" tabular>
          {`${integrationText(row.seconds)} over ${countText(row.nights, 'night', 'nights')} · ${byFilterText(row.byFilter)}`}
        </AppText>
      ) : (
        <AppText variant="small" tone="muted">
          {history.isPending ? 'Loading…' : 'No recorded lights of this target yet. Add frames under Calibration.'}
        </AppText>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
  grow: { flexGrow: 1, flexShrink: 1 },
});
