import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';

import type { FramingFormState, FramingValues } from '@/components/targets/framing-form';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { TextField } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import type { Rig } from '@/shared/rig/schema';

type TextKey = Exclude<keyof FramingValues, 'rigId'>;

type FramingFieldsProps = { form: FramingFormState; rigs: Rig[] };

/** Name, centre, position angle, mosaic and rig of a framing; errors under each field once touched. */
export function FramingFields({ form, rigs }: FramingFieldsProps) {
  function field(key: TextKey, label: string, extra: Partial<ComponentProps<typeof TextField>> = {}) {
    return (
      <TextField
        label={label}
        value={form.values[key]}
        onChangeText={(v) => form.setField(key, v)}
        onBlur={() => form.blur(key)}
        error={form.errorFor(key)}
        testID={`framing-${key}-input`}
        autoCorrect={false}
        {...extra}
      />
    );
  }
  const numeric = { inputMode: 'decimal' as const, tabular: true };
  const rigChoices = [{ value: '', label: 'No rig' }, ...rigs.map((r) => ({ value: r.id, label: r.name }))];
  return (
    <View style={styles.fields}>
      {field('name', 'Name')}
      <View style={styles.row}>
        <View style={styles.cell}>{field('ra', 'Centre RA (J2000)', { tabular: true, placeholder: '05:35:17.3', hint: 'In hours, e.g. 05:35:17.3' })}</View>
        <View style={styles.cell}>{field('dec', 'Centre Dec (J2000)', { tabular: true, placeholder: '-05:23:28', hint: 'In degrees, e.g. -05:23:28' })}</View>
      </View>
      {field('positionAngleDeg', 'Position angle (°)', { ...numeric, hint: 'Of the image’s top edge, east of north, 0–360.' })}
      <View style={styles.row}>
        <View style={styles.small}>{field('mosaicCols', 'Panels across', { ...numeric, inputMode: 'numeric' })}</View>
        <View style={styles.small}>{field('mosaicRows', 'Panels down', { ...numeric, inputMode: 'numeric' })}</View>
        <View style={styles.small}>{field('overlapPct', 'Overlap (%)', numeric)}</View>
      </View>
      <ChoiceGroup label="Rig" choices={rigChoices} value={form.values.rigId} onChange={(v) => form.setField('rigId', v)} error={form.errorFor('rigId')} hint="The rig whose camera field is drawn." testID="framing-rig" />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  small: { flexGrow: 1, flexBasis: 90 },
});
