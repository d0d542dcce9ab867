import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { KIND_LABELS, KIND_ORDER } from '@/components/targets/kinds';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { parseNumberText } from '@/lib/number-text';
import { useAddTargetMutation } from '@/hooks/use-targets';
import { useZodForm } from '@/hooks/use-zod-form';
import { isApiError, type FieldErrors } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import { decTextSchema, raTextSchema, targetKindSchema, type TargetKind } from '@/shared/targets/schema';

const customTargetSchema = z.object({
  designation: z.string().trim().min(1, 'Give the target a designation').max(60, 'At most 60 characters'),
  name: z.string().trim().max(120, 'At most 120 characters'),
  ra: raTextSchema,
  dec: decTextSchema,
  type: targetKindSchema,
  size: z.number({ error: 'Size must be a number' }).min(0, 'Size must be at least 0′').max(1200, 'Size must be at most 1200′').optional(),
});

const KIND_CHOICES = KIND_ORDER.map((k) => ({ value: k, label: KIND_LABELS[k] }));

type CustomValues = { designation: string; name: string; ra: string; dec: string; type: string; size: string };
const INITIAL: CustomValues = { designation: '', name: '', ra: '', dec: '', type: 'other', size: '' };

const toInput = (v: CustomValues) => ({ ...v, size: v.size.trim() === '' ? undefined : parseNumberText(v.size) });

/** The API names coordinates and size by their stored fields; the form by what is typed. */
function formFields(fields: FieldErrors): FieldErrors {
  const rename: Record<string, string> = { raDeg: 'ra', decDeg: 'dec', majorArcmin: 'size' };
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [rename[k] ?? k, v]));
}

function CustomFields({ form }: { form: ReturnType<typeof useZodForm<CustomValues, typeof customTargetSchema>> }) {
  const field = (key: Exclude<keyof CustomValues, 'type'>, label: string, extra: object = {}) => (
    <TextField label={label} value={form.values[key]} onChangeText={(v) => form.setField(key, v)} onBlur={() => form.blur(key)} error={form.errorFor(key)} testID={`custom-${key}-input`} autoCorrect={false} {...extra} />
  );
  return (
    <>
      {field('designation', 'Designation', { placeholder: 'e.g. Comet field 1' })}
      {field('name', 'Name (optional)')}
      <View style={styles.pair}>
        <View style={styles.half}>{field('ra', 'RA (J2000)', { placeholder: '05:35:17.3', tabular: true, hint: 'In hours, e.g. 05:35:17.3 or 5.588h' })}</View>
        <View style={styles.half}>{field('dec', 'Dec (J2000)', { placeholder: '-05:23:28', tabular: true, hint: 'In degrees, e.g. -05:23:28' })}</View>
      </View>
      {field('size', 'Size (′, optional)', { inputMode: 'decimal', tabular: true, placeholder: '0' })}
      <SelectField label="Kind" choices={KIND_CHOICES} value={form.values.type as TargetKind} onChange={(k) => form.setField('type', k)} error={form.errorFor('type')} testID="custom-kind-select" />
    </>
  );
}

/** A target from typed coordinates, for objects in no catalogue; checked by the shared RA/Dec parsers. */
export function CustomTargetForm() {
  const [open, setOpen] = useState(false);
  const form = useZodForm({ schema: customTargetSchema, initial: INITIAL, toInput });
  const add = useAddTargetMutation();

  function submit() {
    const v = form.validate();
    if (!v) return;
    const input = { designation: v.designation, aliases: [], name: v.name, type: v.type, raDeg: v.ra, decDeg: v.dec, majorArcmin: v.size ?? 0, minorArcmin: null, positionAngleDeg: null, magnitude: null, notes: '' };
    add.mutate(input, {
      onSuccess: (target) => router.push(`/targets/${target.id}`),
      onError: (e) => {
        if (isApiError(e, 400) && e.fields) form.setServerErrors(formFields(e.fields));
      },
    });
  }

  const showBanner = add.isError && !(isApiError(add.error, 400) && add.error.fields);
  return (
    <Card testID="custom-target">
      <AppText weight="semibold">Custom target</AppText>
      {open ? (
        <View style={styles.form}>
          {showBanner ? <Banner tone="danger" title="Could not add the target" message={cleanError(add.error)} /> : null}
          <CustomFields form={form} />
          <View style={styles.actions}>
            <Button label="Cancel" variant="ghost" onPress={() => setOpen(false)} />
            <Button label="Add to my targets" onPress={submit} pending={add.isPending} testID="custom-target-submit" />
          </View>
        </View>
      ) : (
        <View style={styles.row}>
          <AppText tone="muted" style={styles.grow}>
            Not in any catalogue? Give its J2000 coordinates.
          </AppText>
          <Button label="Custom coordinates…" variant="secondary" size="small" onPress={() => setOpen(true)} testID="custom-target-open" />
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  half: { flexGrow: 1, flexBasis: 160 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
});
