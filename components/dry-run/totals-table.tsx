import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import type { Naming } from '@/components/dry-run/naming';
import { formatHm, formatSlack } from '@/components/dry-run/run-format';
import { integrationRows, overheadRows, overheadTotalS } from '@/components/dry-run/totals-rows';
import { AppText } from '@/components/ui/app-text';
import { FormSection } from '@/components/ui/form-section';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatClock, formatPercent } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';
import type { DryRunResult } from '@/shared/dry-run/types';

type Cell = { text: string; strong?: boolean; muted?: boolean };

function Row({ cells, total }: { cells: Cell[]; total?: boolean }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={[styles.row, total && styles.total]} role="row">
      {cells.map((c, i) => (
        <AppText key={i} role="cell" variant="small" tabular weight={c.strong || total ? 'semibold' : 'regular'} tone={c.muted ? 'muted' : 'default'} style={i === 0 ? styles.first : styles.num} numberOfLines={2}>
          {c.text}
        </AppText>
      ))}
    </View>
  );
}

function Block({ title, head, children }: { title: string; head: string[]; children: ReactNode }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.block} role="table" accessibilityLabel={title}>
      <AppText eyebrow tone="faint" weight="semibold">
        {title}
      </AppText>
      <View style={[styles.row, styles.head]} role="row">
        {head.map((h, i) => (
          <AppText key={h} role="columnheader" variant="caption" tone="faint" style={i === 0 ? styles.first : styles.num}>
            {h}
          </AppText>
        ))}
      </View>
      {children}
    </View>
  );
}

/** Integration per target and filter, overheads by kind, and when each stage finishes. */
export function TotalsTable({ result, naming }: { result: DryRunResult; naming: Naming }) {
  const styles = useThemedStyles(makeStyles);
  const { totals } = result;
  const tz = result.sky.timeZone;
  const events = result.timeline.filter((e) => e.kind === 'expose');
  const order = { targets: [...new Set(events.map((e) => e.targetId ?? ''))], filters: [...new Set(events.map((e) => e.filter ?? ''))] };
  const targets = integrationRows(totals, naming.targetLabel, order);
  const clock = (iso: string | null) => (iso ? formatClock(iso, tz) : '—');
  return (
    <FormSection title="Totals" description="Shutter time as h:mm. Slack is the time to spare before a step with a set time; a minus means it starts late." testID="dry-run-totals">
      <View style={styles.grid}>
        <Block title="Integration" head={['Target · filter', 'h:mm', 'Frames']}>
          {targets.length === 0 ? <Row cells={[{ text: 'No light frames', muted: true }, { text: '' }, { text: '' }]} /> : null}
          {targets.map((t) => (
            <View key={t.targetId} testID={`dry-run-totals-target-${t.targetId || 'none'}`}>
              <Row total cells={[{ text: t.label }, { text: formatHm(t.seconds) }, { text: String(t.frames) }]} />
              {t.filters.map((f) => (
                <Row key={f.filter} cells={[{ text: `   ${f.filter}`, muted: true }, { text: formatHm(f.seconds) }, { text: String(f.frames) }]} />
              ))}
            </View>
          ))}
          <Row total cells={[{ text: 'All targets' }, { text: formatHm(totals.shutterOpenS) }, { text: String(targets.reduce((s, t) => s + t.frames, 0)) }]} />
        </Block>
        <Block title="Where the rest went" head={['Kind', 'h:mm', '']}>
          {overheadRows(totals).map((o) => (
            <Row key={o.kind} cells={[{ text: o.label }, { text: formatHm(o.seconds) }, { text: '' }]} />
          ))}
          <Row cells={[{ text: 'Idle (waiting)' }, { text: formatHm(totals.idleS) }, { text: '' }]} />
          <Row total cells={[{ text: 'Overheads and idle' }, { text: formatHm(overheadTotalS(totals) + totals.idleS) }, { text: '' }]} />
          <Row total cells={[{ text: 'Efficiency' }, { text: formatPercent(totals.efficiency) }, { text: '' }]} />
        </Block>
        <Block title="Stages" head={['Stage', 'Start', 'Finish']}>
          {totals.stageFinish.map((s, i) => (
            <Row key={`${s.nodeId}-${i}`} cells={[{ text: naming.nameOf(s.nodeId, null).label }, { text: clock(s.start) }, { text: s.end ? clock(s.end) : 'Skipped' }]} />
          ))}
        </Block>
        {totals.slackBeforeFixed.length ? (
          <Block title="Slack before set times" head={['Step with a set time', 'Set for', 'Slack']}>
            {totals.slackBeforeFixed.map((s, i) => (
              <Row key={`${s.nodeId}-${i}`} cells={[{ text: naming.stepLabel(s.nodeId, null) }, { text: clock(s.fixedAt) }, { text: formatSlack(s.slackS), muted: s.slackS >= 0 }]} />
            ))}
          </Block>
        ) : null}
      </View>
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xl },
    block: { flexGrow: 1, flexBasis: 280, gap: 0 },
    row: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, paddingVertical: spacing.xs + 1, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: c.border },
    head: { borderBottomColor: c.borderStrong, paddingTop: spacing.sm },
    total: { borderBottomColor: c.borderStrong },
    first: { flex: 1, minWidth: 0 },
    num: { width: 64, textAlign: 'right' },
  });
