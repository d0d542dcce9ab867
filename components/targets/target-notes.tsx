import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { TextField } from '@/components/ui/text-field';
import { useUpdateTargetMutation } from '@/hooks/use-targets';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { Target, TargetInput } from '@/shared/schemas/target';

const MAX_NOTES = 2000;

/** The editable fields of a stored target, as a PUT body needs them. */
export function targetInputOf(t: Target): TargetInput {
  const { designation, aliases, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude, notes } = t;
  return { designation, aliases, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude, notes };
}

type NotesNoticeProps = {
  update: ReturnType<typeof useUpdateTargetMutation>;
  showError: boolean;
  onLoadTheirs: (theirs: Target) => void;
  onKeepMine: (theirs: Target) => void;
};

function NotesNotice({ update, showError, onLoadTheirs, onKeepMine }: NotesNoticeProps) {
  const conflict = update.conflict;
  if (conflict) {
    return (
      <Banner tone="danger" title="These notes were changed elsewhere" message="Load the newer notes, or keep yours and save over them." testID="notes-conflict">
        <Button label="Load their version" size="small" variant="secondary" onPress={() => onLoadTheirs(conflict)} testID="notes-conflict-load" />
        <Button label="Keep mine and save" size="small" onPress={() => onKeepMine(conflict)} pending={update.isPending} testID="notes-conflict-overwrite" />
      </Banner>
    );
  }
  return update.isError && showError ? <Banner tone="danger" title="Could not save the notes" message={cleanError(update.error)} /> : null;
}

/** Free notes on the target, saved guarded by the target's version. */
export function TargetNotes({ target }: { target: Target }) {
  const [base, setBase] = useState(target);
  const [text, setText] = useState(target.notes);
  const [saved, setSaved] = useState(false);
  const update = useUpdateTargetMutation(target.id);
  const dirty = text !== base.notes;
  // A newer copy arrived (another tab, a refetch) and nothing is being edited here: take it.
  if (!dirty && target.version > base.version) {
    setBase(target);
    setText(target.notes);
  }
  const tooLong = text.length > MAX_NOTES ? `At most ${MAX_NOTES} characters` : undefined;
  const serverError = isApiError(update.error, 400) ? update.error.fields?.notes?.[0] : undefined;

  function save(version: number) {
    if (tooLong) return;
    setSaved(false);
    update.mutate({ ...targetInputOf(base), notes: text, version }, {
      onSuccess: (t) => {
        setBase(t);
        setText(t.notes);
        setSaved(true);
      },
    });
  }

  function loadTheirs(theirs: Target) {
    setBase(theirs);
    setText(theirs.notes);
    update.reset();
  }

  return (
    <FormSection title="Notes" testID="target-notes">
      <NotesNotice update={update} showError={!serverError} onLoadTheirs={loadTheirs} onKeepMine={(theirs) => save(theirs.version)} />
      <TextField
        label="Notes"
        value={text}
        onChangeText={(v) => {
          setText(v);
          setSaved(false);
        }}
        multiline
        numberOfLines={4}
        placeholder="Filters that worked, the best months, what to try next time…"
        error={tooLong ?? serverError}
        testID="target-notes-input"
      />
      <View style={styles.actions}>
        {saved && !dirty ? (
          <AppText variant="small" tone="ok" testID="notes-saved">
            Saved.
          </AppText>
        ) : null}
        <Button label="Save notes" size="small" onPress={() => save(base.version)} pending={update.isPending && !update.conflict} disabled={!dirty} testID="notes-save" />
      </View>
    </FormSection>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', justifyContent: 'flex-end', alignItems: 'center', gap: spacing.md },
});
