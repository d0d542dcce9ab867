import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { GanttChart } from '@/components/charts/gantt-chart';
import { GanttDetail } from '@/components/charts/gantt-detail';
import { GanttLegend } from '@/components/charts/gantt-legend';
import type { GanttMarker } from '@/components/charts/gantt-markers';
import type { Naming } from '@/components/dry-run/naming';
import { formatClockRange } from '@/components/dry-run/run-format';
import { focusInstant, ganttRows, ganttSpan, runExtent, timedEvents, type GanttRow } from '@/components/dry-run/timeline-rows';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { formatClock } from '@/lib/format';
import { spacing } from '@/constants/theme';
import type { DryRunResult } from '@/shared/dry-run/types';

type TimelineCardProps = { result: DryRunResult; naming: Naming; nowMs: number; onShowStep: (nodeId: string) => void };

function markersOf(result: DryRunResult, span: { startMs: number; endMs: number }, nowMs: number): GanttMarker[] {
  const tz = result.sky.timeZone;
  const inSpan = (ms: number) => ms > span.startMs && ms < span.endMs;
  const all: (GanttMarker | null)[] = [
    result.totals.dawn ? { key: 'dawn', ms: Date.parse(result.totals.dawn), label: `Dawn ${formatClock(result.totals.dawn, tz)}`, tone: 'dawn' } : null,
    result.totals.nightEnd ? { key: 'end', ms: Date.parse(result.totals.nightEnd), label: `End ${formatClock(result.totals.nightEnd, tz)}`, tone: 'end' } : null,
    { key: 'now', ms: nowMs, label: 'Now', tone: 'now' },
  ];
  return all.filter((m): m is GanttMarker => m !== null && inSpan(m.ms)).sort((a, b) => a.ms - b.ms);
}

function summaryOf(rows: GanttRow[], result: DryRunResult): string {
  const run = runExtent(rows.flatMap((r) => r.events), result.totals.nightEnd);
  const when = run ? ` from ${formatClockRange(run.startMs, run.endMs, result.sky.timeZone)}` : '';
  const stages = rows.filter((r) => r.stageId !== null).map((r) => r.label);
  return `Timeline${when}: ${stages.length ? stages.join(', ') : 'no stages'}. Tap a block for its details.`;
}

/** The Gantt chart with its key and the tapped block's details. */
export function TimelineCard({ result, naming, nowMs, onShowStep }: TimelineCardProps) {
  const rows = useMemo(() => ganttRows(result, naming), [result, naming]);
  const span = useMemo(() => ganttSpan(rows.flatMap((r) => r.events), result.totals.dawn ? Date.parse(result.totals.dawn) : null), [rows, result.totals.dawn]);
  const [selected, setSelected] = useState<number | null>(null);
  const event = selected === null ? null : rows.flatMap((r) => r.events).find((e) => e.index === selected);
  const rowOf = event ? rows.find((r) => r.events.includes(event)) : undefined;
  const count = result.timeline.length;

  return (
    <FormSection title="Timeline" description="Each stage on its own line, in the site’s time. Tap a block for what it does and where the telescope points." testID="dry-run-gantt">
      {span ? (
        <GanttChart rows={rows} span={span} night={result.sky} markers={markersOf(result, span, nowMs)} selected={selected} onSelect={setSelected} summary={summaryOf(rows, result)} focusMs={focusInstant(timedEvents(result), span, nowMs)} />
      ) : (
        <AppText tone="muted">Nothing in this recipe takes time on this night. Add a stage with exposures in the recipe.</AppText>
      )}
      <GanttLegend />
      {event ? (
        <GanttDetail
          event={event}
          rowLabel={rowOf?.label ?? ''}
          timeZone={result.sky.timeZone}
          hasPrev={event.index > 0}
          hasNext={event.index < count - 1}
          onStep={(d) => setSelected(Math.min(count - 1, Math.max(0, event.index + d)))}
          onShowStep={onShowStep}
        />
      ) : span ? (
        <View style={styles.hintRow}>
          <AppText variant="small" tone="faint" style={styles.hint}>
            Tap a block to see its times, altitude, airmass, Moon distance and pier side.
          </AppText>
          <Button label="Go through the blocks" size="small" variant="secondary" onPress={() => setSelected(0)} testID="dry-run-gantt-first" />
        </View>
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  hintRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  hint: { flexShrink: 1, flexBasis: 240, flexGrow: 1 },
});
