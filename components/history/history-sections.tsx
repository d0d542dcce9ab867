import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { filterName, integrationText, sortByIntegration } from '@/components/history/history-format';
import { IntegrationChart } from '@/components/history/integration-chart';
import { NightTable } from '@/components/history/night-table';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { FormSection } from '@/components/ui/form-section';
import { TextLink } from '@/components/ui/text-link';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { TargetHistory } from '@/shared/schemas/calibration-api';

/*
 * The parts of a capture history page that do not depend on having a target: the totals, how the
 * integration grew, the nights, and the page's two-column layout. Shared by a target's history
 * and the history of lights no target matched.
 */

/** Back to the calibration screen's history list. */
export function BackToCalibration() {
  return <TextLink href="/calibration?part=history" label="‹ Calibration" variant="small" testID="history-back" />;
}

/** Total integration and frames per filter, most first. */
export function HistoryTotals({ history }: { history: TargetHistory }) {
  const styles = useThemedStyles(makeStyles);
  const t = history.target;
  return (
    <Card testID="history-totals">
      <View style={styles.totalsTop}>
        <View style={styles.grow}>
          <AppText eyebrow tone="faint" weight="semibold">
            Total integration
          </AppText>
          <AppText variant="heading" tabular testID="history-total">
            {integrationText(t.seconds)}
          </AppText>
        </View>
        <AppText variant="small" tone="muted" tabular>
          {`${countText(t.frames, 'frame', 'frames')} · ${countText(t.nights, 'night', 'nights')} · last ${formatNightDate(t.lastNight)}`}
        </AppText>
      </View>
      <View style={styles.filters} role="list" accessibilityLabel="By filter">
        {sortByIntegration(t.byFilter).map((f) => (
          <View key={filterName(f.filter)} style={styles.filter} role="listitem" testID={`history-filter-${filterName(f.filter)}`}>
            <AppText variant="small" tone="muted">
              {filterName(f.filter)}
            </AppText>
            <AppText weight="semibold" tabular>
              {integrationText(f.seconds)}
            </AppText>
            <AppText variant="caption" tone="faint" tabular>
              {countText(f.frames, 'frame', 'frames')}
            </AppText>
          </View>
        ))}
      </View>
    </Card>
  );
}

/** " 2 lights have no plate solution: counted in the totals, not here." (with its leading space), or ''. */
export function unsolvedText(history: TargetHistory): string {
  return history.unsolvedFrames > 0 ? ` ${countText(history.unsolvedFrames, 'light has', 'lights have')} no plate solution: counted in the totals, not here.` : '';
}

/**
 * The chart and the nights beside `aside` (then `after`) on wide screens; on phones one column:
 * chart, `aside`, nights, `after`.
 */
export function HistoryBody({ history, aside, after }: { history: TargetHistory; aside: ReactNode; after?: ReactNode }) {
  const styles = useThemedStyles(makeStyles);
  const { isWide } = useBreakpoints();
  const growth = (
    <FormSection title="Integration over time" description="Running total per filter; each step is a night." testID="history-growth">
      <IntegrationChart nights={history.nights} />
    </FormSection>
  );
  const nights = (
    <FormSection title="Nights" description="Integration per night, newest first." testID="history-nights-section">
      <NightTable nights={history.nights} />
    </FormSection>
  );
  if (!isWide) {
    return (
      <>
        {growth}
        {aside}
        {nights}
        {after}
      </>
    );
  }
  return (
    <View style={styles.columns}>
      <View style={styles.column}>
        {growth}
        {nights}
      </View>
      <View style={styles.column}>
        {aside}
        {after}
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    totalsTop: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.md, flexWrap: 'wrap' },
    grow: { flexGrow: 1 },
    filters: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
    filter: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, paddingHorizontal: spacing.md, paddingVertical: spacing.sm, minWidth: 96, gap: 1, backgroundColor: c.surfaceRaised },
    columns: { flexDirection: 'row', gap: spacing.xl, alignItems: 'flex-start' },
    column: { flex: 1, minWidth: 0, gap: spacing.xl },
  });
