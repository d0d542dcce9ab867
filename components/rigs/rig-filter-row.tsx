import { StyleSheet, View } from 'react-native';

import type { SlotDraft } from '@/components/rigs/rig-draft';
import { RowErrors } from '@/components/rigs/row-errors';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { CellInput } from '@/components/ui/cell-input';
import { SelectField } from '@/components/ui/select-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { RigFormState } from '@/hooks/use-rig-form';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';
import { FILTER_BANDS, type FilterBand } from '@/shared/rig/schema';

const BAND_CHOICES = FILTER_BANDS.map((band) => ({ value: band, label: band === 'custom' ? 'Other' : band }));

type FilterRowProps = {
  form: RigFormState;
  slot: SlotDraft;
  index: number;
  count: number;
  onMove: (from: number, to: number) => void;
  onRemove: (index: number) => void;
};

/** One wheel position: its number, filter name, band and focus offset, with reorder controls. */
export function RigFilterRow({ form, slot, index, count, onMove, onRemove }: FilterRowProps) {
  const themed = useThemedStyles(makeStyles);
  const { isTablet } = useBreakpoints();
  const base = `filterWheel.slots.${index}`;
  const id = `rig-filter-${index}`;
  const label = slot.name.trim() || `slot ${index + 1}`;
  return (
    <View style={[styles.box, !isTablet && themed.divided]} role="group" accessibilityLabel={`Slot ${index + 1}`} testID={`${id}-row`}>
      <View style={styles.row}>
        <AppText tone="faint" tabular style={styles.number}>
          {index + 1}
        </AppText>
        <View style={styles.cells}>
          <CellInput label="Filter name" value={slot.name} grow={2} onChangeText={(v) => form.set(`${base}.name`, v)} onBlur={() => form.blur(`${base}.name`)} invalid={!!form.errorFor(`${base}.name`)} testID={`${id}-name`} />
          <View style={styles.band}>
            <SelectField<FilterBand> compact label="Band" choices={BAND_CHOICES} value={slot.band} onChange={(v) => form.set(`${base}.band`, v)} testID={`${id}-band`} />
          </View>
          <CellInput
            label="Offset (steps)"
            value={slot.focusOffsetSteps}
            numeric
            onChangeText={(v) => form.set(`${base}.focusOffsetSteps`, v)}
            onBlur={() => form.blur(`${base}.focusOffsetSteps`)}
            invalid={!!form.errorFor(`${base}.focusOffsetSteps`)}
            testID={`${id}-offset`}
          />
        </View>
        <View style={styles.actions}>
          <Button label="↑" accessibilityLabel={`Move ${label} up`} size="small" variant="ghost" disabled={index === 0} onPress={() => onMove(index, index - 1)} testID={`${id}-up`} />
          <Button label="↓" accessibilityLabel={`Move ${label} down`} size="small" variant="ghost" disabled={index === count - 1} onPress={() => onMove(index, index + 1)} testID={`${id}-down`} />
          <Button label="Remove" accessibilityLabel={`Remove ${label}`} size="small" variant="ghost" disabled={count === 1} onPress={() => onRemove(index)} testID={`${id}-remove`} />
        </View>
      </View>
      <RowErrors messages={[form.errorFor(`${base}.name`), form.errorFor(`${base}.band`), form.errorFor(`${base}.focusOffsetSteps`)]} testID={`${id}-errors`} />
    </View>
  );
}

/** Column captions above the slot rows (the cells' accessible names repeat them). */
export function RigFilterHeader({ actionsInline }: { actionsInline: boolean }) {
  return (
    <View style={styles.row} aria-hidden>
      <AppText variant="caption" tone="faint" style={styles.number}>
        #
      </AppText>
      <View style={styles.cells}>
        <AppText variant="caption" tone="faint" style={styles.nameHead}>
          Filter name
        </AppText>
        <AppText variant="caption" tone="faint" style={styles.band}>
          Band
        </AppText>
        <AppText variant="caption" tone="faint" style={styles.offsetHead}>
          Offset (steps)
        </AppText>
      </View>
      {actionsInline ? <View style={styles.actionsSpacer} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xxs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  number: { width: 18, textAlign: 'right' },
  cells: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexGrow: 1, flexShrink: 1, flexBasis: 260 },
  band: { width: 92 },
  nameHead: { flex: 2 },
  offsetHead: { flex: 1 },
  actions: { flexDirection: 'row', gap: spacing.xxs, marginLeft: 'auto' },
  actionsSpacer: { width: 170 },
});

// On phones a slot takes two lines (cells, then controls): a faint rule keeps each slot together.
const makeStyles = (c: Palette) => StyleSheet.create({ divided: { paddingBottom: spacing.sm, borderBottomWidth: 1, borderBottomColor: c.border } });
