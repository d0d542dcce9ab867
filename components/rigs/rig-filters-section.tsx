import { StyleSheet, View } from 'react-native';

import { newRowKey, type SlotDraft } from '@/components/rigs/rig-draft';
import { RigField } from '@/components/rigs/rig-field';
import { RigFilterHeader, RigFilterRow } from '@/components/rigs/rig-filter-row';
import { RowErrors } from '@/components/rigs/row-errors';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { RigFormState } from '@/hooks/use-rig-form';
import { spacing } from '@/constants/theme';

const LIST = 'filterWheel.slots' as const;

/** Moves one item of a list to another index (pure). */
export function moveItem<T>(items: T[], from: number, to: number): T[] {
  if (to < 0 || to >= items.length || from === to) return items;
  const next = [...items];
  const [moved] = next.splice(from, 1);
  next.splice(to, 0, moved as T);
  return next;
}

function freshSlotName(slots: SlotDraft[]): string {
  const taken = new Set(slots.map((s) => s.name.trim().toLowerCase()));
  for (let n = slots.length + 1; ; n++) if (!taken.has(`filter ${n}`)) return `Filter ${n}`;
}

/** The filter wheel in slot order, with each filter's focus offset and the change time. */
export function RigFiltersSection({ form }: { form: RigFormState }) {
  const { isTablet } = useBreakpoints();
  const slots = form.draft.filterWheel.slots;
  const add = () => form.setList<SlotDraft>(LIST, (rows) => [...rows, { key: newRowKey(), name: freshSlotName(rows), band: 'custom', focusOffsetSteps: '0' }]);
  const addButton = <Button label="Add filter" size="small" variant="secondary" onPress={add} disabled={slots.length >= 20} testID="rig-filter-add" />;
  return (
    <FormSection
      title="Filters"
      description="In wheel order. Focus offsets are focuser steps added while that filter is in the beam. Without a wheel, list the one fitted filter."
      actions={addButton}
      testID="rig-filters"
    >
      <View style={styles.list}>
        <RigFilterHeader actionsInline={isTablet} />
        {slots.map((slot, i) => (
          <RigFilterRow
            key={slot.key}
            form={form}
            slot={slot}
            index={i}
            count={slots.length}
            onMove={(from, to) => form.setList<SlotDraft>(LIST, (rows) => moveItem(rows, from, to))}
            onRemove={(index) => form.setList<SlotDraft>(LIST, (rows) => rows.filter((_, j) => j !== index))}
          />
        ))}
        <RowErrors messages={[form.errorFor(LIST)]} />
      </View>
      <RigField form={form} path="filterWheel.changeTimeS" label="Filter change time (s)" placeholder="3" hint="From one slot to the next." />
    </FormSection>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.md } });
