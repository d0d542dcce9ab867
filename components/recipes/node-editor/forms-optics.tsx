import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { textOf } from '@/components/recipes/node-editor/draft-types';
import { DraftChoice, DraftText, FieldError, FieldGrid, inputID } from '@/components/recipes/node-editor/editor-field';
import { FilterMultiPicker, FilterPicker } from '@/components/recipes/node-editor/filter-pickers';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';

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
      <FlatsMatch ed={ed} />
    </>
  );
}

/**
 * What the flats return to: a framing they match (kept as it is, or dropped), or the rotator
 * angle and focuser position the lights were taken at (editable; at least one of the two).
 */
function FlatsMatch({ ed }: { ed: NodeEditorState }) {
  const mode = textOf(ed.values, 'matchFramingOf.mode');
  const toMode = (next: 'positions' | 'none') => ed.setValues((v) => ({ ...v, 'matchFramingOf.mode': next, 'matchFramingOf.kind': 'positions' }));
  if (mode === 'framing' && ed.values.matchFramingOf === true) {
    return (
      <>
        <AppText variant="small" tone="muted">
          These flats match the rotation of a chosen framing.
        </AppText>
        <Button label="Stop matching the framing" size="small" variant="ghost" onPress={() => ed.set('matchFramingOf', false)} testID={inputID('matchFramingOf')} />
      </>
    );
  }
  if (mode === 'positions') {
    return (
      <>
        <AppText variant="small" tone="muted">
          Before the flats, the rotator and the focuser return to where the lights were taken, so the flats match them.
        </AppText>
        <FieldGrid>
          <DraftText ed={ed} path="matchFramingOf.rotatorAngleDeg" label="Return to rotator angle (°)" numeric placeholder="Leave as is" hint="The rotator's own angle (ROTATANG)." />
          <DraftText ed={ed} path="matchFramingOf.focuserPositionSteps" label="Return to focuser position (steps)" inputMode="numeric" placeholder="Leave as is" hint="FOCUSPOS of the lights." />
        </FieldGrid>
        <FieldError path="matchFramingOf" message={ed.errorFor('matchFramingOf')} />
        <Button label="Stop returning to positions" size="small" variant="ghost" onPress={() => toMode('none')} testID={inputID('matchFramingOf.mode')} />
      </>
    );
  }
  return <Button label="Return to a rotator angle / focuser position" size="small" variant="ghost" onPress={() => toMode('positions')} testID={inputID('matchFramingOf.mode')} />;
}
