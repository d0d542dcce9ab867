import { StyleSheet, View } from 'react-native';

import { AltitudeSection } from '@/components/dry-run/altitude-section';
import { Cautions } from '@/components/dry-run/cautions';
import { DarksSection } from '@/components/dry-run/darks-section';
import { FindingsList } from '@/components/dry-run/findings-list';
import type { Naming, TargetFacts } from '@/components/dry-run/naming';
import { RunBand } from '@/components/dry-run/run-band';
import { SummaryCards } from '@/components/dry-run/summary-cards';
import { TimelineCard } from '@/components/dry-run/timeline-card';
import { TotalsTable } from '@/components/dry-run/totals-table';
import { FormSection } from '@/components/ui/form-section';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { DryRunRecord } from '@/hooks/use-dry-run';
import { spacing } from '@/constants/theme';

type NightViewProps = { record: DryRunRecord; naming: Naming; targets: TargetFacts[]; nowMs: number; onShowStep: (nodeId: string) => void };

/**
 * One night's dry run: the figures, the sky, the timeline, then findings, the darks they need and
 * the cautions beside them (on wide screens the altitude charts take the other column) and the totals.
 */
export function NightView({ record, naming, targets, nowMs, onShowStep }: NightViewProps) {
  const { isWide } = useBreakpoints();
  const { result } = record;
  const tz = result.sky.timeZone;
  return (
    <View style={styles.stack}>
      <SummaryCards result={result} />
      <FormSection title="The night" description="Twilight, darkness and the Moon; the bracket marks the recipe from its first step to its end." testID="dry-run-night-band">
        <RunBand result={result} nowMs={nowMs} />
      </FormSection>
      <TimelineCard key={record.id} result={result} naming={naming} nowMs={nowMs} onShowStep={onShowStep} />
      <View style={[styles.stack, isWide && styles.columns]}>
        <View style={[styles.stack, isWide && styles.findingsColumn]}>
          <FindingsList findings={result.findings} timeZone={tz} naming={naming} onShowStep={onShowStep} />
          {/* Runs stored before darks were planned carry no list. */}
          <DarksSection needed={result.darksNeeded ?? []} rigId={record.rigId} />
          <Cautions />
        </View>
        <View style={[styles.stack, isWide && styles.altitudeColumn]}>
          <AltitudeSection result={result} naming={naming} targets={targets} siteId={record.siteId} nowMs={nowMs} />
        </View>
      </View>
      <TotalsTable result={result} naming={naming} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.xl },
  columns: { flexDirection: 'row', alignItems: 'flex-start' },
  findingsColumn: { flex: 5, minWidth: 0 },
  altitudeColumn: { flex: 6, minWidth: 0 },
});
