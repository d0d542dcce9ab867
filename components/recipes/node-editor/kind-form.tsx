import { DraftText } from '@/components/recipes/node-editor/editor-field';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';
import { CoolForm, DarksForm, ExposeForm, WarmForm } from '@/components/recipes/node-editor/forms-camera';
import { CentreForm, GuideForm, MeridianForm, RotateForm, SlewForm } from '@/components/recipes/node-editor/forms-mount';
import { FlatsForm, FocusForm } from '@/components/recipes/node-editor/forms-optics';
import { StageForm } from '@/components/recipes/node-editor/forms-stage';
import { RepeatForm, WaitForm } from '@/components/recipes/node-editor/forms-timing';
import { AppText } from '@/components/ui/app-text';

function NoteForm({ ed }: KindFormProps) {
  return <DraftText ed={ed} path="text" label="Note" multiline placeholder="A reminder for the night" />;
}

function NothingToSet({ text }: { text: string }) {
  return (
    <AppText variant="small" tone="faint">
      {text}
    </AppText>
  );
}

/** The parameters of the node's kind. */
export function KindForm(props: KindFormProps) {
  switch (props.ed.kind) {
    case 'stage':
      return <StageForm {...props} />;
    case 'repeat':
      return <RepeatForm {...props} />;
    case 'group':
      return <NothingToSet text="A group only keeps its steps together; give it a label and, if useful, rules." />;
    case 'cool':
      return <CoolForm {...props} />;
    case 'warm':
      return <WarmForm {...props} />;
    case 'slew':
      return <SlewForm {...props} />;
    case 'centre':
      return <CentreForm {...props} />;
    case 'rotate':
      return <RotateForm {...props} />;
    case 'focus':
      return <FocusForm {...props} />;
    case 'expose':
      return <ExposeForm {...props} />;
    case 'guide':
      return <GuideForm {...props} />;
    case 'meridian':
      return <MeridianForm {...props} />;
    case 'wait':
      return <WaitForm {...props} />;
    case 'flats':
      return <FlatsForm {...props} />;
    case 'darks':
      return <DarksForm {...props} />;
    case 'park':
      return <NothingToSet text="The mount goes to the park position set in the rig." />;
    case 'note':
      return <NoteForm {...props} />;
  }
}
