import type { ComponentProps, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { useZodForm } from '@/hooks/use-zod-form';
import { parseNumberText } from '@/lib/number-text';
import { spacing } from '@/constants/theme';
import { darkSetInputSchema, type DarkLibrarySet, type DarkSetInput } from '@/shared/schemas/calibration-api';

/** The raw text of each field: numbers stay text until parsed, so "-10" or "0,5" can be typed. */
export type DarkSetValues = {
  exposureS: string;
  gain: string;
  offset: string;
  binning: string;
  readoutMode: string;
  temperatureC: string;
  frames: string;
  takenOn: string;
  notes: string;
};

/** Blank gain, offset or readout mean "as the camera is set" (null). */
const orNull = (text: string) => (text.trim() === '' ? null : parseNumberText(text));

export function darkSetToInput(v: DarkSetValues): DarkSetInput {
  return {
    exposureS: parseNumberText(v.exposureS),
    gain: orNull(v.gain),
    offset: orNull(v.offset),
    binning: parseNumberText(v.binning),
    readoutMode: v.readoutMode.trim() === '' ? null : v.readoutMode.trim(),
    temperatureC: parseNumberText(v.temperatureC),
    frames: parseNumberText(v.frames),
    takenOn: v.takenOn.trim(),
    notes: v.notes,
  };
}

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

export function darkSetValues(set: DarkLibrarySet | null, today: string): DarkSetValues {
  return {
    exposureS: text(set?.exposureS),
    gain: text(set?.gain),
    offset: text(set?.offset),
    binning: set ? String(set.binning) : '1',
    readoutMode: set?.readoutMode ?? '',
    temperatureC: text(set?.temperatureC),
    frames: set ? String(set.frames) : '30',
    takenOn: set?.takenOn ?? today,
    notes: set?.notes ?? '',
  };
}

type DarkSetFormProps = {
  initial: DarkSetValues;
  submitLabel: string;
  pending: boolean;
  onSubmit: (input: DarkSetInput, form: { setServerErrors: (e: Record<string, string[]>) => void }) => void;
  onCancel: () => void;
  /** Notices above the fields (a failed save, a conflict). */
  banner?: ReactNode;
  testID: string;
};

/** A dark set typed in by hand (darks shot before Nightloom, or kept elsewhere); checked by the shared schema. */
export function DarkSetForm({ initial, submitLabel, pending, onSubmit, onCancel, banner, testID }: DarkSetFormProps) {
  const form = useZodForm({ schema: darkSetInputSchema, initial, toInput: darkSetToInput });
  const numeric = { inputMode: 'decimal' as const, tabular: true, autoCorrect: false };
  const field = (key: keyof DarkSetValues, label: string, extra: Partial<ComponentProps<typeof TextField>> = {}) => (
    <View style={styles.cell}>
      <TextField label={label} {...form.textField(key)} testID={`${testID}-${key}`} {...extra} />
    </View>
  );
  function submit() {
    const input = form.validate();
    if (input) onSubmit(input, form);
  }
  return (
    <View style={styles.form} testID={testID}>
      {banner}
      <View style={styles.grid}>
        {field('exposureS', 'Exposure (s)', { ...numeric, placeholder: '300' })}
        {field('temperatureC', 'Temperature (°C)', { ...numeric, placeholder: '-10' })}
        {field('gain', 'Gain', { ...numeric, placeholder: 'As set', hint: 'Blank: as the camera is set.' })}
        {field('offset', 'Offset', { ...numeric, placeholder: 'As set' })}
        {field('binning', 'Binning', { inputMode: 'numeric', tabular: true })}
        {field('readoutMode', 'Readout mode', { placeholder: 'Optional', autoCapitalize: 'none' })}
        {field('frames', 'Frames', { inputMode: 'numeric', tabular: true })}
        {field('takenOn', 'Taken on', { placeholder: 'YYYY-MM-DD', tabular: true, hint: 'The night the set was shot.' })}
      </View>
      <TextField label="Notes" {...form.textField('notes')} multiline placeholder="e.g. after the firmware update" testID={`${testID}-notes`} />
      <View style={styles.actions}>
        <Button label="Cancel" variant="ghost" onPress={onCancel} testID={`${testID}-cancel`} />
        <Button label={submitLabel} onPress={submit} pending={pending} testID={`${testID}-submit`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.md },
  cell: { flexBasis: 140, flexGrow: 1, minWidth: 0 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
});
