import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { endVsDawn, formatSpanS } from '@/components/dry-run/run-format';
import { SeverityTag } from '@/components/dry-run/severity-icon';
import { findingCounts, overheadTotalS, SEVERITIES } from '@/components/dry-run/totals-rows';
import { AppText, type TextTone } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { formatClock, formatPercent } from '@/lib/format';
import { spacing } from '@/constants/theme';
import type { DryRunResult } from '@/shared/dry-run/types';

type TileProps = { label: string; value: string; lines: { text: string; tone?: TextTone }[]; testID?: string; children?: ReactNode };

function Tile({ label, value, lines, testID, children }: TileProps) {
  return (
    <Card style={styles.tile} testID={testID}>
      <AppText eyebrow tone="faint" weight="semibold">
        {label}
      </AppText>
      <AppText variant="heading" weight="semibold" tabular>
        {value}
      </AppText>
      {lines.map((l) => (
        <AppText key={l.text} variant="small" tone={l.tone ?? 'muted'} tabular>
          {l.text}
        </AppText>
      ))}
      {children}
    </Card>
  );
}

/** The night in five figures: when it ends against dawn, efficiency, integration, idle time, findings. */
export function SummaryCards({ result }: { result: DryRunResult }) {
  const { totals, sky } = result;
  const tz = sky.timeZone;
  const end = endVsDawn(totals.nightEnd, totals.dawn);
  const counts = findingCounts(result.findings);
  const dawnLines = [totals.dawn ? `Dark ends ${formatClock(totals.dawn, tz)}` : null, sky.sunrise ? `Sunrise ${formatClock(sky.sunrise, tz)}` : null].filter((l): l is string => l !== null);
  const usableLine = totals.usableShutterS + 1 >= totals.shutterOpenS ? 'All in clean sky' : `${formatSpanS(totals.usableShutterS)} in clean sky`;
  return (
    <View style={styles.grid} testID="dry-run-summary">
      <Tile
        label="Night ends"
        value={totals.nightEnd ? formatClock(totals.nightEnd, tz) : '—'}
        lines={[{ text: end.text, tone: end.tone === 'late' ? 'accent' : end.tone === 'ok' ? 'ok' : 'muted' }, ...dawnLines.map((text) => ({ text }))]}
        testID="dry-run-summary-end"
      />
      <Tile label="Efficiency" value={formatPercent(totals.efficiency)} lines={[{ text: `Shutter open of ${formatSpanS(totals.elapsedS)}` }]} testID="dry-run-efficiency" />
      <Tile label="Integration" value={formatSpanS(totals.shutterOpenS)} lines={[{ text: usableLine, tone: usableLine === 'All in clean sky' ? 'muted' : 'accent' }]} testID="dry-run-summary-integration" />
      <Tile label="Idle" value={formatSpanS(totals.idleS)} lines={[{ text: `Overheads ${formatSpanS(overheadTotalS(totals))}` }]} testID="dry-run-summary-idle" />
      <Card style={[styles.tile, styles.findings]} testID="dry-run-summary-findings">
        <AppText eyebrow tone="faint" weight="semibold">
          Findings
        </AppText>
        <View style={styles.tags}>
          {SEVERITIES.map((s) => (
            <SeverityTag key={s} severity={s} count={counts[s]} />
          ))}
        </View>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  tile: { flexGrow: 1, flexBasis: 150, gap: spacing.xxs, padding: spacing.md },
  findings: { flexBasis: 220, gap: spacing.sm },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
