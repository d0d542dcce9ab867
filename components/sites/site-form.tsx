import type { ComponentProps, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SwitchRow } from '@/components/ui/switch-row';
import { TextField } from '@/components/ui/text-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { SiteFormState, SiteFormValues } from '@/hooks/use-site-form';
import { spacing } from '@/constants/theme';
import type { SiteInput } from '@/shared/schemas/site';

type SiteFormProps = {
  form: SiteFormState;
  submitLabel: string;
  pending: boolean;
  onSubmit: (input: SiteInput) => void;
  /** Notices above the fields (save errors, edit conflicts). */
  banner?: ReactNode;
};

type TextKey = Exclude<keyof SiteFormValues, 'isDefault'>;

/** Name, coordinates, elevation and zone of an observing site; checked by the shared schema. */
export function SiteForm({ form, submitLabel, pending, onSubmit, banner }: SiteFormProps) {
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

  const numeric = { inputMode: 'decimal' as const, tabular: true, autoCorrect: false };
  return (
    <View style={styles.form}>
      {banner}
      <Card style={styles.card}>
        {field('name', 'Name', { placeholder: 'e.g. Hilltop field', autoComplete: 'off' })}
        <View style={[styles.pair, isTablet && styles.pairRow]}>
          <View style={styles.half}>{field('latitudeDeg', 'Latitude (°)', { ...numeric, placeholder: '47.3769', hint: 'North positive, −90 to 90.' })}</View>
          <View style={styles.half}>{field('longitudeDeg', 'Longitude (°)', { ...numeric, placeholder: '8.5417', hint: 'East positive, −180 to 180.' })}</View>
        </View>
        <View style={[styles.pair, isTablet && styles.pairRow]}>
          <View style={styles.half}>{field('elevationM', 'Elevation (m)', { ...numeric, placeholder: '600', hint: 'Above sea level.' })}</View>
          <View style={styles.half}>
            {field('timeZone', 'Time zone', { autoCapitalize: 'none', autoCorrect: false, placeholder: 'Europe/Zurich', hint: 'An IANA zone; times are shown in it.' })}
          </View>
        </View>
        <SwitchRow
          label="Use this as my default site"
          description="Tonight opens with the default site."
          value={form.values.isDefault}
          onValueChange={(v) => form.setField('isDefault', v)}
          testID="site-default-switch"
        />
      </Card>
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
