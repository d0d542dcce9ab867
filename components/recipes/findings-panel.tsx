import { StyleSheet, View } from 'react-native';

import { Sheet } from '@/components/recipes/sheet';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import { SEVERITY_ORDER, type FindingSeverity, type RecipeFinding } from '@/shared/recipe/checks';

const SEVERITY_TEXT: Record<FindingSeverity, string> = { stop: 'Stop', warn: 'Warning', info: 'Note' };

type FindingsPanelProps = {
  open: boolean;
  onClose: () => void;
  findings: RecipeFinding[];
  /** A step's name for the list, e.g. "Expose · Ha". */
  stepName: (nodeId: string) => string;
  onShow: (nodeId: string) => void;
};

/** The static checks' findings, worst first, each with its fix and a way to the step. */
export function FindingsPanel({ open, onClose, findings, stepName, onShow }: FindingsPanelProps) {
  const styles = useThemedStyles(makeStyles);
  const sorted = findings.map((f, i) => ({ f, i })).sort((a, b) => SEVERITY_ORDER[a.f.severity] - SEVERITY_ORDER[b.f.severity] || a.i - b.i);
  return (
    <Sheet open={open} onClose={onClose} title="Findings" wideAs="side" testID="composer-findings-panel">
      {sorted.length === 0 ? (
        <AppText tone="muted">Nothing to flag before the dry run. The dry run checks the night itself.</AppText>
      ) : (
        <AppText variant="small" tone="faint">
          Checked against the recipe’s rig and site, before any ephemeris.
        </AppText>
      )}
      {sorted.map(({ f }, n) => (
        <View key={`${f.code}-${f.nodeId}-${n}`} style={styles.item} testID={`finding-${n}`}>
          <View style={styles.head}>
            <View style={[styles.chip, styles[f.severity]]}>
              <AppText variant="caption" weight="semibold" style={styles[`${f.severity}Text`]}>
                {SEVERITY_TEXT[f.severity]}
              </AppText>
            </View>
            <AppText variant="small" tone="muted" numberOfLines={1} style={styles.step}>
              {stepName(f.nodeId)}
            </AppText>
          </View>
          <AppText>{f.message}</AppText>
          <AppText variant="small" tone="muted">{`Fix: ${f.fix}`}</AppText>
          <View style={styles.actions}>
            <Button label="Show step" variant="secondary" size="small" onPress={() => onShow(f.nodeId)} testID={`finding-show-${n}`} />
          </View>
        </View>
      ))}
    </Sheet>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { gap: spacing.xs, paddingBottom: spacing.md, borderBottomWidth: 1, borderBottomColor: c.border },
    head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    chip: { paddingHorizontal: spacing.sm, paddingVertical: 1, borderRadius: radii.pill, borderWidth: 1 },
    stop: { backgroundColor: c.dangerSoft, borderColor: c.danger },
    warn: { backgroundColor: c.accentSoft, borderColor: c.accent },
    info: { backgroundColor: c.surfaceRaised, borderColor: c.borderStrong },
    stopText: { color: c.danger },
    warnText: { color: c.accent },
    infoText: { color: c.textMuted },
    step: { flex: 1 },
    actions: { flexDirection: 'row', marginTop: spacing.xs },
  });
