import { router } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { byFilterText, integrationText } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useHistoryQuery } from '@/hooks/use-history';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { HistoryTarget } from '@/shared/schemas/calibration-api';

function nightsText(t: HistoryTarget): string {
  const span = t.firstNight === t.lastNight ? formatNightDate(t.firstNight) : `${formatNightDate(t.firstNight)} – ${formatNightDate(t.lastNight)}`;
  return `${countText(t.nights, 'night', 'nights')} · ${span}`;
}

function HistoryRow({ t }: { t: HistoryTarget }) {
  const styles = useThemedStyles(makeStyles);
  const targetId = t.targetId;
  const body = (
    <>
      <View style={styles.top}>
        <AppText weight="semibold" style={styles.grow} numberOfLines={1}>
          {t.name && t.name !== t.label ? `${t.label} · ${t.name}` : t.label}
        </AppText>
        <AppText weight="semibold" tabular testID="history-row-total">
          {integrationText(t.seconds)}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {byFilterText(t.byFilter)}
      </AppText>
      <AppText variant="small" tone="faint" tabular>
        {`${countText(t.frames, 'frame', 'frames')} · ${nightsText(t)}`}
      </AppText>
      {targetId ? null : (
        <AppText variant="small" tone="faint">
          No target on your list matches these frames; add it under Targets to plan it.
        </AppText>
      )}
    </>
  );
  if (!targetId) {
    return (
      <View style={styles.row} role="listitem" testID="history-row-unmatched">
        {body}
      </View>
    );
  }
  return (
    <Pressable
      role="link"
      accessibilityLabel={`${t.label}: ${integrationText(t.seconds)} captured. Opens its history.`}
      onPress={() => router.push({ pathname: '/targets/[id]/history', params: { id: targetId, from: 'calibration' } })}
      testID={`history-row-${targetId}`}
      style={({ hovered }: WebPressState) => [styles.row, hovered && styles.hover]}
    >
      {body}
    </Pressable>
  );
}

/** What was captured of each target across nights and years, by filter; a target opens its history. */
export function HistoryList() {
  const history = useHistoryQuery();
  return (
    <FormSection title="Capture history" description="Integration of every target in your recorded lights, by filter. Open one for its nights, framings and what to shoot next." testID="history-list">
      {history.isPending ? <LoadingView label="Loading the history…" /> : null}
      {history.isError ? <ErrorView error={history.error} onRetry={() => history.refetch()} retrying={history.isFetching} title="Could not load the history" /> : null}
      {history.data && history.data.length === 0 ? (
        <AppText tone="muted" testID="history-empty">
          No lights on record yet. Frames added above are linked to your targets by their plate solution or OBJECT name.
        </AppText>
      ) : null}
      {history.data && history.data.length > 0 ? (
        <View style={listStyle.list} role="list">
          {history.data.map((t) => (
            <HistoryRow key={t.targetId ?? `object-${t.label}`} t={t} />
          ))}
        </View>
      ) : null}
    </FormSection>
  );
}

const listStyle = StyleSheet.create({ list: { gap: spacing.sm } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    hover: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
    grow: { flexGrow: 1, flexShrink: 1 },
  });
