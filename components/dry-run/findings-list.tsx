import { Pressable, StyleSheet, View } from 'react-native';

import type { Naming } from '@/components/dry-run/naming';
import { SEVERITY_PLURAL, SeverityIcon, SeverityTag } from '@/components/dry-run/severity-icon';
import { findingGroups } from '@/components/dry-run/totals-rows';
import { AppText } from '@/components/ui/app-text';
import { FormSection } from '@/components/ui/form-section';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatClock } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { DryRunFinding } from '@/shared/dry-run/types';

type FindingsListProps = { findings: DryRunFinding[]; timeZone: string; naming: Naming; onShowStep: (nodeId: string) => void };

function FindingItem({ f, timeZone, naming, onShowStep }: { f: DryRunFinding; timeZone: string; naming: Naming; onShowStep: (nodeId: string) => void }) {
  const styles = useThemedStyles(makeStyles);
  const nodeId = f.nodeId;
  const step = naming.stepLabel(nodeId, f.path);
  const when = f.time ? formatClock(f.time, timeZone) : 'Any time';
  return (
    <Pressable
      role={nodeId ? 'link' : undefined}
      accessibilityLabel={`${f.code}: ${f.message}${nodeId ? '. Opens the step in the recipe.' : ''}`}
      disabled={!nodeId}
      onPress={() => nodeId && onShowStep(nodeId)}
      testID={`dry-run-finding-${f.code}`}
      style={({ hovered, pressed }: WebPressState) => [styles.item, nodeId && (hovered || pressed) && styles.itemActive]}
    >
      <View style={styles.head}>
        <SeverityTag severity={f.severity} />
        <AppText variant="caption" weight="semibold" tone="muted" style={styles.code}>
          {f.code}
        </AppText>
        <AppText variant="caption" tone="muted" tabular style={styles.time}>
          {when}
        </AppText>
      </View>
      <AppText variant="small" tone="faint" numberOfLines={2}>
        {step}
      </AppText>
      <AppText>{f.message}</AppText>
      <AppText variant="small" tone="muted">{`Fix: ${f.fix}`}</AppText>
      {nodeId ? (
        <AppText variant="small" tone="accent" weight="semibold">
          Show the step in the recipe ›
        </AppText>
      ) : null}
    </Pressable>
  );
}

/** What the night broke, stop first, each with a fix; tapping one opens its step in the composer. */
export function FindingsList({ findings, timeZone, naming, onShowStep }: FindingsListProps) {
  const styles = useThemedStyles(makeStyles);
  const groups = findingGroups(findings);
  return (
    <FormSection title="Findings" description="Worst first. Tap one to open its step in the recipe." testID="dry-run-findings">
      {groups.length === 0 ? (
        <View style={styles.clear} testID="dry-run-findings-none">
          <AppText tone="ok" weight="semibold">
            Nothing to flag on this night.
          </AppText>
          <AppText variant="small" tone="muted">
            Every step fits its window and its limits. The cautions below still apply.
          </AppText>
        </View>
      ) : null}
      {groups.map((g) => (
        <View key={g.severity} style={styles.group} role="list" accessibilityLabel={SEVERITY_PLURAL[g.severity]}>
          <View style={styles.groupHead}>
            <SeverityIcon severity={g.severity} />
            <AppText variant="small" weight="semibold" tabular>{`${SEVERITY_PLURAL[g.severity]} · ${g.findings.length}`}</AppText>
          </View>
          {g.findings.map((f, i) => (
            <FindingItem key={`${f.code}-${f.nodeId}-${i}`} f={f} timeZone={timeZone} naming={naming} onShowStep={onShowStep} />
          ))}
        </View>
      ))}
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    group: { gap: spacing.sm },
    groupHead: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    item: { gap: spacing.xs, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border, backgroundColor: c.background },
    itemActive: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
    head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
    code: { flexShrink: 1 },
    time: { marginLeft: 'auto' },
    clear: { gap: spacing.xs },
  });
