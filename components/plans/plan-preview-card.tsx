import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { SwitchRow } from '@/components/ui/switch-row';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';
import type { PlanPreview } from '@/shared/plan/preview';

type PlanPreviewCardProps = {
  preview: PlanPreview;
  createSite: boolean;
  createRig: boolean;
  onCreateSite: (next: boolean) => void;
  onCreateRig: (next: boolean) => void;
  onConfirm: () => void;
  pending: boolean;
};

const OUTLINE_SHOWN = 60;

/** What the plan holds and what importing it will add to the account; Confirm stores it. */
export function PlanPreviewCard({ preview: p, createSite, createRig, onCreateSite, onCreateRig, onConfirm, pending }: PlanPreviewCardProps) {
  const styles = useThemedStyles(makeStyles);
  const newTargets = p.targets.filter((t) => !t.onYourList);
  return (
    <FormSection title={p.title} description={`${p.recipeName} · ${p.nodeCount} steps · night of ${p.nightDate}${p.author ? ` · by ${p.author}` : ''}`} testID="plan-import-summary">
      <View style={styles.outline} accessibilityLabel="Recipe outline">
        {p.outline.slice(0, OUTLINE_SHOWN).map((line, i) => (
          <AppText key={i} variant="small" tone={line.enabled ? 'default' : 'faint'} style={{ paddingLeft: line.depth * spacing.lg }} numberOfLines={1}>
            {`${line.kind} · ${line.label ? `${line.label}: ` : ''}${line.summary}`}
          </AppText>
        ))}
        {p.nodeCount > OUTLINE_SHOWN ? <AppText variant="small" tone="muted">{`… and ${p.nodeCount - OUTLINE_SHOWN} more`}</AppText> : null}
      </View>
      <View style={styles.created}>
        <AppText weight="semibold">Importing adds</AppText>
        <AppText variant="small" testID="plan-import-adds-recipe">{`A new recipe, “${p.recipeName}”`}</AppText>
        <AppText variant="small" testID="plan-import-adds-targets">
          {newTargets.length === 0 ? 'No new targets: every target is on your list' : `Targets for your list: ${newTargets.map((t) => t.designation).join(', ')}`}
        </AppText>
        {p.site.matchId ? (
          <AppText variant="small" tone="muted">{`Site: your “${p.site.matchName}” (same name and place)`}</AppText>
        ) : (
          <SwitchRow label={`Add the site “${p.site.name}”`} description={`${p.site.latitudeDeg}°, ${p.site.longitudeDeg}° · ${p.site.timeZone}. Off: the recipe uses your default site.`} value={createSite} onValueChange={onCreateSite} testID="plan-import-create-site" />
        )}
        {p.rig.matchId ? (
          <AppText variant="small" tone="muted">{`Rig: your “${p.rig.matchName}” (same name and filters)`}</AppText>
        ) : (
          <SwitchRow label={`Add the rig “${p.rig.name}”`} description={`Filters ${p.rig.filters.join(', ')}. Off: the recipe is not tied to a rig.`} value={createRig} onValueChange={onCreateRig} testID="plan-import-create-rig" />
        )}
      </View>
      <Button label="Import as a new recipe" onPress={onConfirm} pending={pending} testID="plan-import-confirm" />
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    outline: { gap: spacing.xxs, borderLeftWidth: 2, borderLeftColor: c.border, paddingLeft: spacing.sm },
    created: { gap: spacing.xs },
  });
