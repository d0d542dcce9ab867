import { router } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { countText } from '@/components/calibration/calibration-format';
import { AddObjectTarget } from '@/components/history/add-object-target';
import { byFilterText, integrationText } from '@/components/history/history-format';
import { isUnnamedObject } from '@/components/history/object-target';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import type { WebPressState } from '@/components/ui/pressable-state';
import { TextLink } from '@/components/ui/text-link';
import { useHistoryQuery } from '@/hooks/use-history';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { HistoryTarget } from '@/shared/schemas/calibration-api';

function nightsText(t: HistoryTarget): string {
  const span = t.firstNight === t.lastNight ? formatNightDate(t.firstNight) : `${formatNightDate(t.firstNight)} – ${formatNightDate(t.lastNight)}`;
  return `${countText(t.nights, 'night', 'nights')} · ${span}`;
}

function RowSummary({ t }: { t: HistoryTarget }) {
  const styles = useThemedStyles(makeStyles);
  return (
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
    </>
  );
}

/** Lights no target matched, by OBJECT: their history, and the way to make them a target. */
function UnmatchedRow({ t }: { t: HistoryTarget }) {
  const styles = useThemedStyles(makeStyles);
  const [adding, setAdding] = useState(false);
  const unnamed = isUnnamedObject(t.label);
  return (
    <View style={styles.row} role="listitem" testID="history-row-unmatched">
      <RowSummary t={t} />
      <AppText variant="small" tone="faint">
        {unnamed ? 'No OBJECT name, and no target on your list is where these frames point.' : 'No target on your list matches these frames.'}
      </AppText>
      <View style={styles.actions}>
        <TextLink
          href={{ pathname: '/calibration/objects/[label]', params: { label: t.label } }}
          label="Open its history ›"
          variant="small"
          testID="history-row-unmatched-open"
        />
        {!unnamed && !adding ? <Button label="Add as a target…" variant="secondary" size="small" onPress={() => setAdding(true)} testID="history-row-unmatched-add" /> : null}
      </View>
      {adding ? (
        <View style={styles.adding}>
          <AddObjectTarget label={t.label} onCancel={() => setAdding(false)} />
        </View>
      ) : null}
    </View>
  );
}

function HistoryRow({ t }: { t: HistoryTarget }) {
  const styles = useThemedStyles(makeStyles);
  const targetId = t.targetId;
  if (!targetId) return <UnmatchedRow t={t} />;
  return (
    <Pressable
      role="link"
      accessibilityLabel={`${t.label}: ${integrationText(t.seconds)} captured. Opens its history.`}
      onPress={() => router.push({ pathname: '/targets/[id]/history', params: { id: targetId, from: 'calibration' } })}
      testID={`history-row-${targetId}`}
      style={({ hovered }: WebPressState) => [styles.row, hovered && styles.hover]}
    >
      <RowSummary t={t} />
    </Pressable>
  );
}

/** What was captured of each target across nights and years, by filter; a target opens its history. */
export function HistoryList() {
  const history = useHistoryQuery();
  return (
    <FormSection title="Capture history" description="Integration of every target in your recorded lights, by filter. Open one for its nights, framings and what to shoot next; frames that match no target can be added as one." testID="history-list">
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
    actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm, marginTop: spacing.xs },
    adding: { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: c.border, paddingTop: spacing.sm, marginTop: spacing.xs },
  });
