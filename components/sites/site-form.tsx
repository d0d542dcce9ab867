import type { ComponentProps, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { HorizonSection, type HorizonUpload } from '@/components/sites/horizon-section';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormSection } from '@/components/ui/form-section';
import { SwitchRow } from '@/components/ui/switch-row';
import { TextField } from '@/components/ui/text-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { SiteFormState, SiteFormValues } from '@/hooks/use-site-form';
import { parseNumberText } from '@/lib/number-text';
import { spacing } from '@/constants/theme';
import type { SiteInput } from '@/shared/schemas/site';

type SiteFormProps = {
  form: SiteFormState;
  submitLabel: string;
  pending: boolean;
  onSubmit: (input: SiteInput) => void;
  /** Notices above the fields (save errors, edit conflicts). */
  banner?: ReactNode;
  /** A saved site can store a loaded horizon file at once. */
  horizonUpload?: HorizonUpload;
};

type TextKey = Exclude<keyof SiteFormValues, 'isDefault'>;

/**
 * Everything a site carries: place and zone, planning limits, typical temperatures and the
 * horizon profile, all checked by the shared schema (saving never drops a field).
 */
export function SiteForm({ form, submitLabel, pending, onSubmit, banner, horizonUpload }: SiteFormProps) {
  const { isTablet } = useBreakpoints();

  function submit() {
    const input = form.validate();
    if (input) onSubmit(input);
  }

  function field(key: TextKey, label: string, extra: Partial<ComponentProps<typeof TextField>> = {}) {
    return (
      <TextField
        label={label}
        value={form.values[key]}
        onChangeText={(v) => form.setField(key, v)}
        onBlur={() => form.blur(key)}
        error={form.errorFor(key)}
        testID={`site-${key}-input`}
        {...extra}
      />
    );
  }

  const pair = (a: ReactNode, b: ReactNode) => (
    <View style={[styles.pair, isTablet && styles.pairRow]}>
      <View style={isTablet && styles.half}>{a}</View>
      <View style={isTablet && styles.half}>{b}</View>
    </View>
  );
  const numeric = { inputMode: 'decimal' as const, tabular: true, autoCorrect: false };
  return (
    <View style={styles.form}>
      {banner}
      <Card style={styles.card}>
        {field('name', 'Name', { placeholder: 'e.g. Hilltop field', autoComplete: 'off' })}
        {pair(
          field('latitudeDeg', 'Latitude (°)', { ...numeric, placeholder: '47.3769', hint: 'North positive, −90 to 90.' }),
          field('longitudeDeg', 'Longitude (°)', { ...numeric, placeholder: '8.5417', hint: 'East positive, −180 to 180.' }),
        )}
        {pair(
          field('elevationM', 'Elevation (m)', { ...numeric, placeholder: '600', hint: 'Above sea level.' }),
          field('timeZone', 'Time zone', { autoCapitalize: 'none', autoCorrect: false, placeholder: 'Europe/Zurich', hint: 'An IANA zone; times are shown in it.' }),
        )}
        <SwitchRow
          label="Use this as my default site"
          description="Tonight opens with the default site."
          value={form.values.isDefault}
          onValueChange={(v) => form.setField('isDefault', v)}
          testID="site-default-switch"
        />
      </Card>
      <FormSection title="Planning" description="Used by the dry run: where imaging may start, and how the night cools (focus drift, camera cooling).">
        {field('minAltitudeDeg', 'Minimum altitude (°)', { ...numeric, placeholder: '30', hint: 'Lowest altitude worth imaging at; 30° is common practice.' })}
        {pair(
          field('duskTempC', 'Dusk temperature (°C)', { ...numeric, placeholder: '10', hint: 'Typical at the end of twilight.' }),
          field('dawnTempC', 'Dawn temperature (°C)', { ...numeric, placeholder: '5', hint: 'Typical before dawn.' }),
        )}
      </FormSection>
      <HorizonSection table={form.horizon} minAltitudeDeg={parseNumberText(form.values.minAltitudeDeg)} siteName={form.values.name} upload={horizonUpload} />
      <View style={styles.actions}>
        <Button label={submitLabel} onPress={submit} pending={pending} testID="site-form-submit" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  card: { gap: spacing.lg, padding: spacing.lg },
  pair: { gap: spacing.lg },
  pairRow: { flexDirection: 'row' },
  half: { flex: 1 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
});
