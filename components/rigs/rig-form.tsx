import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { RigCameraSection } from '@/components/rigs/rig-camera-section';
import { RigDerivedPanel } from '@/components/rigs/rig-derived-panel';
import { RigFiltersSection } from '@/components/rigs/rig-filters-section';
import { RigGuiderSection } from '@/components/rigs/rig-guider-section';
import { RigMountSection } from '@/components/rigs/rig-mount-section';
import { RigFocuserSection, RigRotatorSection } from '@/components/rigs/rig-motion-sections';
import { RigNameSection, RigOpticsSection } from '@/components/rigs/rig-optics-section';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { StickyColumn } from '@/components/ui/sticky-column';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { RigFormState } from '@/hooks/use-rig-form';
import { spacing } from '@/constants/theme';
import type { RigInput } from '@/shared/rig/schema';

/** Window width from which the derived panel sits beside the form instead of inside it. */
const SIDE_PANEL_MIN_WIDTH = 1100;
const MAX_LISTED_ERRORS = 6;

type RigFormProps = {
  form: RigFormState;
  submitLabel: string;
  pending: boolean;
  onSubmit: (input: RigInput) => void;
  /** Notices above the fields (save errors, edit conflicts). */
  banner?: ReactNode;
};

function ErrorSummary({ entries }: { entries: [string, string][] }) {
  if (entries.length === 0) return null;
  const shown = entries.slice(0, MAX_LISTED_ERRORS).map(([, message]) => `• ${message}`);
  if (entries.length > MAX_LISTED_ERRORS) shown.push(`…and ${entries.length - MAX_LISTED_ERRORS} more`);
  const title = entries.length === 1 ? 'One field needs attention' : `${entries.length} fields need attention`;
  return <Banner tone="danger" title={title} message={shown.join('\n')} testID="rig-form-errors" />;
}

/**
 * The rig editor: sections for each part of the rig, checked by the shared schema as the user
 * types, beside a live panel of derived values (a card between the sections on narrow screens).
 */
export function RigForm({ form, submitLabel, pending, onSubmit, banner }: RigFormProps) {
  const { width } = useBreakpoints();
  const side = width >= SIDE_PANEL_MIN_WIDTH;

  function submit() {
    const input = form.validate();
    if (input) onSubmit(input);
  }

  return (
    <View style={[styles.layout, side && styles.layoutSide]}>
      <View style={styles.main}>
        {banner}
        <RigNameSection form={form} />
        <RigOpticsSection form={form} />
        <RigCameraSection form={form} />
        {side ? null : <RigDerivedPanel form={form} />}
        <RigFiltersSection form={form} />
        <RigFocuserSection form={form} />
        <RigRotatorSection form={form} />
        <RigMountSection form={form} />
        <RigGuiderSection form={form} />
        <ErrorSummary entries={form.summary} />
        <View style={styles.actions}>
          <Button label={submitLabel} onPress={submit} pending={pending} testID="rig-form-submit" />
        </View>
      </View>
      {side ? (
        <StickyColumn style={styles.side}>
          <RigDerivedPanel form={form} />
        </StickyColumn>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  layout: { gap: spacing.lg },
  layoutSide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  main: { flex: 1, minWidth: 0, gap: spacing.lg },
  side: { width: 320 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
});
