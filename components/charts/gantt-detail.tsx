import { StyleSheet, View } from 'react-native';

import { groupFill } from '@/components/dry-run/colours';
import { formatClockRange, formatSpanS, pointingFacts } from '@/components/dry-run/run-format';
import { EVENT_GROUP, KIND_LABEL, type TimedEvent } from '@/components/dry-run/timeline-rows';
import { useTheme } from '@/components/theme-provider';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type GanttDetailProps = {
  event: TimedEvent;
  rowLabel: string;
  timeZone: string;
  onStep: (delta: -1 | 1) => void;
  onShowStep: ((nodeId: string) => void) | null;
  hasPrev: boolean;
  hasNext: boolean;
};

/** The tapped block: what, when, and where the telescope points; step through blocks in order. */
export function GanttDetail({ event: e, rowLabel, timeZone, onStep, onShowStep, hasPrev, hasNext }: GanttDetailProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette: c } = useTheme();
  const group = EVENT_GROUP[e.kind];
  const nodeId = e.nodeId;
  return (
    <View style={styles.panel} testID="dry-run-gantt-detail" role="region" accessibilityLabel="Selected block">
      <View style={styles.head}>
        <View style={[styles.swatch, { backgroundColor: groupFill(group, c) }, group === 'idle' && styles.swatchIdle]} />
        <AppText variant="caption" tone="muted" weight="semibold" numberOfLines={1} style={styles.grow}>
          {`${KIND_LABEL[e.kind]} · ${rowLabel}`}
        </AppText>
      </View>
      <AppText weight="semibold">{e.what}</AppText>
      <AppText variant="small" tabular tone="muted" testID="dry-run-gantt-detail-time">
        {`${formatClockRange(e.startMs, e.endMs, timeZone)} · ${formatSpanS((e.endMs - e.startMs) / 1000)}`}
      </AppText>
      <View style={styles.facts}>
        {pointingFacts(e).map((f) => (
          <View key={f.label} style={styles.fact}>
            <AppText variant="caption" tone="faint">
              {f.label}
            </AppText>
            <AppText variant="small" weight="semibold" tabular>
              {f.value}
            </AppText>
          </View>
        ))}
      </View>
      <View style={styles.actions}>
        <Button label="‹ Earlier" size="small" variant="secondary" disabled={!hasPrev} onPress={() => onStep(-1)} testID="dry-run-gantt-prev" />
        <Button label="Later ›" size="small" variant="secondary" disabled={!hasNext} onPress={() => onStep(1)} testID="dry-run-gantt-next" />
        {onShowStep && nodeId ? <Button label="Show step in recipe" size="small" variant="ghost" onPress={() => onShowStep(nodeId)} testID="dry-run-gantt-show-step" /> : null}
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    panel: { gap: spacing.xs, padding: spacing.md, borderRadius: radii.md, backgroundColor: c.surfaceRaised, borderWidth: 1, borderColor: c.border },
    head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    swatch: { width: 12, height: 12, borderRadius: 3 },
    swatchIdle: { borderWidth: 1, borderColor: c.textFaint, borderStyle: 'dashed' },
    grow: { flex: 1 },
    facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.xs, marginTop: spacing.xs },
    fact: { minWidth: 72, gap: 0 },
    actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.sm },
  });
