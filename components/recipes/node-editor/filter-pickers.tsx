import { StyleSheet, View } from 'react-native';

import { filterChoices, listNames, presetChips, toggleName } from '@/components/recipes/node-editor/choices';
import { DraftChoice, DraftText, FieldError, inputID } from '@/components/recipes/node-editor/editor-field';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/app-text';
import { spacing } from '@/constants/theme';
import type { RigInput } from '@/shared/rig/schema';

type FilterPickerProps = { ed: NodeEditorState; rig?: RigInput; path?: string; label?: string; /** Offer "no filter" (the one in the beam). */ optional?: boolean };

/** One filter: chips of the rig's wheel slots, or a name to type without a rig. */
export function FilterPicker({ ed, rig, path = 'filter', label = 'Filter', optional }: FilterPickerProps) {
  const value = typeof ed.values[path] === 'string' ? (ed.values[path] as string) : '';
  if (!rig) {
    return <DraftText ed={ed} path={path} label={label} placeholder={optional ? 'The filter in the beam' : 'e.g. L or Ha'} hint={optional ? 'Blank: whatever filter is in the beam.' : undefined} />;
  }
  return <DraftChoice ed={ed} path={path} label={label} choices={filterChoices(rig, [value], optional ? 'In the beam' : undefined)} />;
}

/** Several filters (flats): toggle chips from the wheel, or a comma list without a rig. */
export function FilterMultiPicker({ ed, rig, path = 'filters' }: { ed: NodeEditorState; rig?: RigInput; path?: string }) {
  const text = typeof ed.values[path] === 'string' ? (ed.values[path] as string) : '';
  if (!rig) return <DraftText ed={ed} path={path} label="Filters" placeholder="L, R, G, B" hint="Separate names with commas." />;
  const chosen = listNames(text);
  return (
    <View style={styles.field}>
      <AppText variant="small" weight="semibold" tone="muted">
        Filters
      </AppText>
      <View style={styles.row} role="group" accessibilityLabel="Filters" testID={inputID(path)}>
        {filterChoices(rig, chosen).map((c) => (
          <Chip
            key={c.value}
            role="checkbox"
            label={c.label}
            selected={chosen.includes(c.value)}
            onPress={() => {
              ed.set(path, toggleName(text, c.value));
              ed.blur(path);
            }}
            testID={`${inputID(path)}-${c.value}`}
          />
        ))}
      </View>
      <FieldError path={path} message={ed.errorFor(path)} />
    </View>
  );
}

/** A gain or offset box with the rig camera's presets as quick picks under it. */
export function PresetField({ ed, rig, path, which }: { ed: NodeEditorState; rig?: RigInput; path: string; which: 'gain' | 'offset' }) {
  const chips = presetChips(rig, which);
  const value = ed.values[path];
  const label = which === 'gain' ? 'Gain' : 'Offset';
  return (
    <View style={styles.field}>
      <DraftText ed={ed} path={path} label={label} numeric placeholder="Camera's setting" />
      {chips.length > 0 ? (
        <View style={styles.row}>
          {chips.map((c) => (
            <Chip
              key={c.value}
              label={c.label}
              selected={value === c.value}
              onPress={() => ed.set(path, value === c.value ? '' : c.value)}
              testID={`${inputID(path)}-preset-${c.value}`}
            />
          ))}
        </View>
      ) : null}
    </View>
  );
}

export const BINNING_CHOICES = ['1', '2', '3', '4'].map((b) => ({ value: b, label: `${b}×${b}` }));

const styles = StyleSheet.create({
  field: { gap: spacing.xs + 2 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs + 2 },
});
