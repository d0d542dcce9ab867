import { StyleSheet, View } from 'react-native';

import { newRowKey, type ModeDraft, type PresetDraft, type RigListPath } from '@/components/rigs/rig-draft';
import { RowErrors } from '@/components/rigs/row-errors';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { CellInput } from '@/components/ui/cell-input';
import type { RigFormState } from '@/hooks/use-rig-form';
import { spacing } from '@/constants/theme';

function ListHeader({ title, onAdd, addLabel, testID }: { title: string; onAdd: () => void; addLabel: string; testID: string }) {
  return (
    <View style={styles.header}>
      <AppText variant="small" weight="semibold" tone="muted" style={styles.grow}>
        {title}
      </AppText>
      <Button label="Add" accessibilityLabel={addLabel} size="small" variant="ghost" onPress={onAdd} testID={testID} />
    </View>
  );
}

/** A name that is not in the list yet: "Preset 3", "Preset 4", … */
function freshName(stem: string, taken: string[]): string {
  const names = new Set(taken.map((n) => n.toLowerCase()));
  for (let n = taken.length + 1; ; n++) if (!names.has(`${stem} ${n}`.toLowerCase())) return `${stem} ${n}`;
}

type PresetListProps = { form: RigFormState; list: Extract<RigListPath, 'camera.gainPresets' | 'camera.offsetPresets'>; title: string; noun: string };

/** Named camera settings (the camera's own unitless numbers), e.g. "Low gain" = 0. */
export function RigPresetList({ form, list, title, noun }: PresetListProps) {
  const rows = list === 'camera.gainPresets' ? form.draft.camera.gainPresets : form.draft.camera.offsetPresets;
  const id = `rig-${noun}-preset`;
  const add = () => form.setList<PresetDraft>(list, (r) => [...r, { key: newRowKey(), name: freshName('Preset', r.map((p) => p.name)), value: '' }]);
  return (
    <View style={styles.list}>
      <ListHeader title={title} onAdd={add} addLabel={`Add ${noun} preset`} testID={`${id}-add`} />
      {rows.length === 0 ? (
        <AppText variant="small" tone="faint">
          None yet.
        </AppText>
      ) : (
        <View style={styles.row} aria-hidden>
          <AppText variant="caption" tone="faint" style={styles.nameHead}>
            Preset name
          </AppText>
          <AppText variant="caption" tone="faint" style={styles.grow}>
            Value
          </AppText>
          <View style={styles.removeSpace} />
        </View>
      )}
      {rows.map((row, i) => {
        const namePath = `${list}.${i}.name`;
        const valuePath = `${list}.${i}.value`;
        return (
          <View key={row.key} style={styles.rowBox}>
            <View style={styles.row}>
              <CellInput label="Preset name" value={row.name} grow={2} onChangeText={(v) => form.set(namePath, v)} onBlur={() => form.blur(namePath)} invalid={!!form.errorFor(namePath)} testID={`${id}-${i}-name`} />
              <CellInput label="Value" value={row.value} numeric onChangeText={(v) => form.set(valuePath, v)} onBlur={() => form.blur(valuePath)} invalid={!!form.errorFor(valuePath)} testID={`${id}-${i}-value`} />
              <Button label="Remove" accessibilityLabel={`Remove ${noun} preset ${row.name}`} size="small" variant="ghost" onPress={() => form.setList<PresetDraft>(list, (r) => r.filter((_, j) => j !== i))} />
            </View>
            <RowErrors messages={[form.errorFor(namePath), form.errorFor(valuePath)]} />
          </View>
        );
      })}
      <RowErrors messages={[form.errorFor(list)]} />
    </View>
  );
}

/** The camera's readout modes by name, as its driver lists them. */
export function RigModeList({ form }: { form: RigFormState }) {
  const rows = form.draft.camera.readoutModes;
  const list = 'camera.readoutModes' as const;
  const add = () => form.setList<ModeDraft>(list, (r) => [...r, { key: newRowKey(), name: freshName('Mode', r.map((m) => m.name)) }]);
  return (
    <View style={styles.list}>
      <ListHeader title="Readout modes" onAdd={add} addLabel="Add readout mode" testID="rig-readout-mode-add" />
      {rows.map((row, i) => {
        const path = `${list}.${i}`;
        return (
          <View key={row.key} style={styles.rowBox}>
            <View style={styles.row}>
              <CellInput label="Readout mode" value={row.name} onChangeText={(v) => form.set(`${path}.name`, v)} onBlur={() => form.blur(path)} invalid={!!form.errorFor(path)} testID={`rig-readout-mode-${i}`} />
              <Button label="Remove" accessibilityLabel={`Remove readout mode ${row.name}`} size="small" variant="ghost" onPress={() => form.setList<ModeDraft>(list, (r) => r.filter((_, j) => j !== i))} />
            </View>
            <RowErrors messages={[form.errorFor(path)]} />
          </View>
        );
      })}
      <RowErrors messages={[form.errorFor(list)]} />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  header: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
  nameHead: { flex: 2 },
  removeSpace: { width: 84 },
  rowBox: { gap: spacing.xxs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
});
