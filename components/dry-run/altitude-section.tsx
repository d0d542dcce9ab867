import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { AltitudeLegend } from '@/components/charts/altitude-legend';
import type { Naming, TargetFacts } from '@/components/dry-run/naming';
import { RunAltitudeChart } from '@/components/dry-run/run-altitude-chart';
import { targetsInOrder, timedEvents } from '@/components/dry-run/timeline-rows';
import { AppText } from '@/components/ui/app-text';
import { FormSection } from '@/components/ui/form-section';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';
import type { DryRunResult } from '@/shared/dry-run/types';

type AltitudeSectionProps = { result: DryRunResult; naming: Naming; targets: TargetFacts[]; siteId: string; nowMs: number };

function OverlayKey() {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.key} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <View style={styles.entry}>
        <View style={styles.strip} />
        <AppText variant="caption" tone="muted">
          Light frames of this dry run
        </AppText>
      </View>
      <View style={styles.entry}>
        <View style={styles.flip} />
        <AppText variant="caption" tone="muted">
          Meridian flip
        </AppText>
      </View>
    </View>
  );
}

/** One altitude chart per target of the night, with the run's frames and flips over the curve. */
export function AltitudeSection({ result, naming, targets, siteId, nowMs }: AltitudeSectionProps) {
  const styles = useThemedStyles(makeStyles);
  const events = useMemo(() => timedEvents(result), [result]);
  const ids = useMemo(() => {
    const fromStages = result.totals.stageFinish.map((s) => naming.stageTarget(s.nodeId)).filter((id): id is string => !!id);
    return [...new Set([...targetsInOrder(events), ...fromStages])];
  }, [events, result.totals.stageFinish, naming]);
  const shown = ids.map((id) => targets.find((t) => t.id === id)).filter((t): t is TargetFacts => !!t);
  const shutterOf = (id: string) => Object.values(result.totals.integrationByTargetAndFilter[id] ?? {}).reduce((s, f) => s + f.seconds, 0);

  return (
    <FormSection title="Altitude" description="Each target’s height above the horizon through the night, its limit line, the Moon, and when this recipe exposes on it." testID="dry-run-altitude">
      {shown.length === 0 ? (
        <AppText tone="muted">{ids.length ? 'Loading the targets…' : 'No stage of this recipe points at a target from your list.'}</AppText>
      ) : (
        <View style={styles.grid}>
          {shown.map((t) => (
            <RunAltitudeChart key={t.id} target={t} events={events} night={result.sky} siteId={siteId} nowMs={nowMs} shutterS={shutterOf(t.id)} />
          ))}
        </View>
      )}
      <View style={styles.keys}>
        <AltitudeLegend />
        <OverlayKey />
      </View>
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    grid: { gap: spacing.xl },
    keys: { gap: spacing.xs },
    key: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
    entry: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs + 2 },
    strip: { width: 18, height: 6, borderRadius: 1, backgroundColor: c.accent },
    flip: { width: 0, height: 12, borderLeftWidth: 1.5, borderStyle: 'dotted', borderColor: c.moon, marginHorizontal: 8 },
  });
