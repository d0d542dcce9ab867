import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { DraftChoice, DraftText, FieldGrid, inputID } from '@/components/recipes/node-editor/editor-field';
import { FilterMultiPicker, FilterPicker } from '@/components/recipes/node-editor/filter-pickers';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';

export function FocusForm({ ed, rig }: KindFormProps) {
  return (
    <>
      <FilterPicker ed={ed} rig={rig} label="Focus filter" optional />
      <FieldGrid>
        <DraftText ed={ed} path="points" label="Points" inputMode="numeric" />
        <DraftText ed={ed} path="stepSize" label="Step size (steps)" inputMode="numeric" />
        <DraftText ed={ed} path="exposureS" label="Exposure (s)" numeric />
      </FieldGrid>
    </>
  );
}

const SOURCES = [
  { value: 'panel', label: 'Panel' },
  { value: 'sky', label: 'Twilight sky' },
];

export function FlatsForm({ ed, rig }: KindFormProps) {
  const levelHint = ed.values.source === 'sky' ? 'Blank: 30 % for the sky.' : 'Blank: 50 % for a panel.';
  return (
    <>
      <DraftChoice ed={ed} path="source" label="Light source" choices={SOURCES} />
      <FilterMultiPicker ed={ed} rig={rig} />
      <FieldGrid>
        <DraftText ed={ed} path="count" label="Flats per filter" inputMode="numeric" />
        <DraftText ed={ed} path="targetAduPct" label="Target level (% of full scale)" numeric placeholder="Default" hint={levelHint} />
      </FieldGrid>
      {ed.values.matchFramingOf === true ? (
        <>
          <AppText variant="small" tone="muted">
            These flats match the rotation of a chosen framing.
          </AppText>
          <Button label="Stop matching the framing" size="small" variant="ghost" onPress={() => ed.set('matchFramingOf', false)} testID={inputID('matchFramingOf')} />
        </>
      ) : null}
    </>
  );
}
