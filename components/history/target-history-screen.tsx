import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { ContinuePanel } from '@/components/history/continue-panel';
import { filterName, integrationText, sortByIntegration } from '@/components/history/history-format';
import { IntegrationChart } from '@/components/history/integration-chart';
import { NightTable } from '@/components/history/night-table';
import { RecordedFramings } from '@/components/history/recorded-framings';
import { ShareSection } from '@/components/history/share-section';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useTargetHistoryQuery } from '@/hooks/use-history';
import { useTargetQuery } from '@/hooks/use-targets';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { isApiError } from '@/lib/api';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { TargetHistory } from '@/shared/schemas/calibration-api';

type From = 'calibration' | 'target';

function Back({ targetId, from, label = 'Target' }: { targetId: string; from: From; label?: string }) {
  return from === 'calibration' ? (
    <TextLink href="/calibration?part=history" label="‹ Calibration" variant="small" testID="history-back" />
  ) : (
    <TextLink href={`/targets/${targetId}`} label={`‹ ${label}`} variant="small" testID="history-back" />
  );
}

/** Total integration and frames per filter, most first. */
function Totals({ history }: { history: TargetHistory }) {
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

function FramingsAndContinue({ history, targetId }: { history: TargetHistory; targetId: string }) {
  const target = useTargetQuery(targetId);
  const [selected, setSelected] = useState<string | null>(history.framings[0]?.key ?? null);
  const framing = history.framings.find((f) => f.key === selected) ?? history.framings[0];
  const unsolved = history.unsolvedFrames > 0 ? ` ${countText(history.unsolvedFrames, 'light has', 'lights have')} no plate solution: counted in the totals, not here.` : '';
  return (
    <FormSection title="Recorded framings" description={`Where the lights were taken, and which of this target's framings each is. Choose one to continue this target.${unsolved}`} testID="history-framings-section">
      {history.framings.length === 0 ? (
        <AppText tone="muted">No plate-solved lights yet, so no framing is known. Solve a frame and add it again.</AppText>
      ) : (
        <>
          <RecordedFramings framings={history.framings} targetFramings={target.data?.framings ?? []} selectedKey={framing?.key ?? null} onSelect={setSelected} />
          {framing ? <ContinuePanel key={framing.key} targetId={targetId} framing={framing} /> : null}
        </>
      )}
    </FormSection>
  );
}

/** One target's capture history: totals by filter, how they grew, each night, the framings used, and what to do next. */
export function TargetHistoryScreen({ targetId, from }: { targetId: string; from: From }) {
  const styles = useThemedStyles(makeStyles);
  const { isWide } = useBreakpoints();
  const history = useTargetHistoryQuery(targetId);
  let back = <Back targetId={targetId} from={from} />;
  if (history.isPending) {
    return (
      <Screen above={back}>
        <LoadingView label="Loading the history…" />
      </Screen>
    );
  }
  if (history.isError) {
    return (
      <Screen above={back}>
        <ErrorView error={history.error} onRetry={isApiError(history.error, 404) ? undefined : () => history.refetch()} retrying={history.isFetching} title="Could not load the history" />
      </Screen>
    );
  }
  const h = history.data;
  const title = h.target.label;
  back = <Back targetId={targetId} from={from} label={title} />;
  const subtitle = h.target.name && h.target.name !== h.target.label ? `${h.target.name} · capture history` : 'Capture history';
  if (h.nights.length === 0) {
    return (
      <Screen title={title} subtitle={subtitle} above={back} testID="target-history">
        <EmptyState title="Nothing captured yet" message="No recorded lights belong to this target. Add a night's frames under Calibration; they are linked by plate solution or OBJECT name." action={<TextLink href="/calibration" label="Add frames ›" />} testID="history-none" />
      </Screen>
    );
  }
  const growth = (
    <FormSection title="Integration over time" description="Running total per filter; each step is a night." testID="history-growth">
      <IntegrationChart nights={h.nights} />
    </FormSection>
  );
  const nights = (
    <FormSection title="Nights" description="Integration per night, newest first." testID="history-nights-section">
      <NightTable nights={h.nights} />
    </FormSection>
  );
  return (
    <Screen title={title} subtitle={subtitle} above={back} testID="target-history">
      <Totals history={h} />
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.column}>
            {growth}
            {nights}
          </View>
          <View style={styles.column}>
            <FramingsAndContinue history={h} targetId={targetId} />
            <ShareSection targetId={targetId} sharedWith={h.target.sharedWith} />
          </View>
        </View>
      ) : (
        <>
          {growth}
          <FramingsAndContinue history={h} targetId={targetId} />
          {nights}
          <ShareSection targetId={targetId} sharedWith={h.target.sharedWith} />
        </>
      )}
    </Screen>
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
