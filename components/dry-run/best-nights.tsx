import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ScanChart } from '@/components/charts/scan-chart';
import { BestNightsList } from '@/components/dry-run/best-nights-list';
import { formatSpanS } from '@/components/dry-run/run-format';
import { bestNights, scanFraction, type ScanState } from '@/components/dry-run/scan-state';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { FormSection } from '@/components/ui/form-section';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import type { Scan } from '@/hooks/use-scan';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';

const RANGES = [
  { value: '30', label: '30 nights' },
  { value: '90', label: '90 nights' },
  { value: '365', label: '365 nights' },
] as const;
type Range = (typeof RANGES)[number]['value'];

type BestNightsProps = { scan: Scan; fromDate: string; siteId: string; rigId: string | null; shownDate: string | null; onPick: (date: string) => void };

function Progress({ state, onCancel }: { state: ScanState; onCancel: () => void }) {
  const styles = useThemedStyles(makeStyles);
  const pct = Math.round(scanFraction(state) * 100);
  return (
    <View style={styles.progressRow}>
      <View style={styles.grow}>
        <View style={styles.track} role="progressbar" aria-valuemin={0} aria-valuemax={state.total} aria-valuenow={state.done} accessibilityLabel="Nights scanned" testID="scan-progress">
          <View style={[styles.fill, { width: `${pct}%` }]} />
        </View>
        <AppText variant="small" tone="muted" tabular testID="scan-progress-text">{`${state.done} of ${state.total} nights`}</AppText>
      </View>
      <Button label="Cancel" variant="secondary" size="small" onPress={onCancel} testID="scan-cancel" />
    </View>
  );
}

function statusText(state: ScanState): string | null {
  if (state.status === 'done') return `Scanned ${state.total} nights from ${formatNightDate(state.from ?? '', { year: false })}.`;
  if (state.status === 'cancelled') return `Stopped after ${state.done} of ${state.total} nights; the nights so far are below.`;
  return null;
}

/** Dry-runs the recipe on each night of a range and ranks the nights by usable integration. */
export function BestNights({ scan, fromDate, siteId, rigId, shownDate, onPick }: BestNightsProps) {
  const styles = useThemedStyles(makeStyles);
  const [range, setRange] = useState<Range>('30');
  const { state } = scan;
  const best = useMemo(() => bestNights(state.nights), [state.nights]);
  const bestDates = useMemo(() => new Set(best.map((n) => n.date)), [best]);
  const running = state.status === 'running';
  const start = () => scan.start({ from: fromDate, nights: Number(range), siteId, rigId: rigId ?? undefined });
  const status = statusText(state);
  const summary = `Usable integration on ${state.nights.length} nights; best ${best[0] ? `${formatNightDate(best[0].date)} with ${formatSpanS(best[0].usableIntegrationS)}` : 'not known yet'}.`;

  return (
    <FormSection title="Best nights" description={`This recipe, dry-run on every night from ${formatNightDate(fromDate, { year: false })} at the site above, ${rigId ? 'with the rig above' : 'with the recipe’s own rig'}.`} testID="dry-run-best-nights">
      <View style={styles.controls}>
        <View style={styles.grow}>
          <ChoiceGroup label="Nights ahead" choices={RANGES} value={range} onChange={setRange} testID="scan-range" />
        </View>
        {running ? null : <Button label={`Scan ${range} nights`} onPress={start} testID="scan-start" />}
      </View>
      {running ? <Progress state={state} onCancel={scan.cancel} /> : null}
      {status ? (
        <AppText variant="small" tone="muted" testID="scan-status">
          {status}
        </AppText>
      ) : null}
      {state.status === 'error' ? <Banner tone="danger" title="The scan stopped" message={state.error ?? undefined} testID="scan-error" /> : null}
      {state.nights.length > 0 ? (
        <>
          <ScanChart nights={state.nights} total={state.total} best={bestDates} selectedDate={shownDate} onSelect={onPick} summary={summary} />
          <AppText variant="small" tone="faint">
            Solid: usable integration (no sky finding). Faint: all integration. Marks under the axis: nights with a stop.
          </AppText>
          <AppText weight="semibold">{running ? 'Best so far' : 'Best nights'}</AppText>
          {best.length ? <BestNightsList nights={best} onPick={onPick} /> : <AppText tone="muted">No night in this range has usable integration.</AppText>}
        </>
      ) : null}
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    controls: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
    progressRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.md },
    grow: { flexGrow: 1, flexShrink: 1, flexBasis: 220, gap: spacing.xs },
    track: { height: 8, borderRadius: radii.pill, backgroundColor: c.surfaceRaised, borderWidth: 1, borderColor: c.border, overflow: 'hidden' },
    fill: { height: '100%', backgroundColor: c.accent },
  });
