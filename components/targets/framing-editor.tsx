import { StyleSheet, View } from 'react-native';

import { FramingPreview } from '@/components/charts/framing-preview';
import { FitsFramingPicker } from '@/components/targets/fits-framing-picker';
import { FramingFields } from '@/components/targets/framing-fields';
import { fieldOfView, previewShape } from '@/components/targets/framing-form';
import { useFramingEditor } from '@/components/targets/use-framing-editor';
import { FramingDelete } from '@/components/targets/framing-delete';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { useSaveFramingMutation } from '@/hooks/use-targets';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { Rig } from '@/shared/rig/schema';
import type { Framing, Target } from '@/shared/schemas/target';

type FramingEditorProps = { target: Target; framing: Framing | null; rigs: Rig[]; onSaved: (framing: Framing) => void; onClose: () => void };

type SaveNoticeProps = { save: ReturnType<typeof useSaveFramingMutation>; onLoadTheirs: (theirs: Framing) => void; onKeepMine: (theirs: Framing) => void };

/** A version conflict (load theirs or keep mine), or a save failure that is not about one field. */
function SaveNotice({ save, onLoadTheirs, onKeepMine }: SaveNoticeProps) {
  const conflict = save.conflict;
  if (conflict) {
    return (
      <Banner tone="danger" title="This framing was changed elsewhere" message="Someone saved a newer version while you were editing. Load it, or keep your changes and save over it." testID="framing-conflict">
        <Button label="Load their version" variant="secondary" size="small" onPress={() => onLoadTheirs(conflict)} testID="framing-conflict-load" />
        <Button label="Keep mine and save" size="small" onPress={() => onKeepMine(conflict)} pending={save.isPending} testID="framing-conflict-overwrite" />
      </Banner>
    );
  }
  if (!save.isError || (isApiError(save.error, 400) && save.error.fields)) return null;
  return <Banner tone="danger" title="Could not save the framing" message={cleanError(save.error)} />;
}

/** Create or edit one framing, with a live preview; a stale save offers to load theirs or keep mine. */
export function FramingEditor({ target, framing, rigs, onSaved, onClose }: FramingEditorProps) {
  const { isWide } = useBreakpoints();
  const { base, form, save, send, fromFits, loadTheirs } = useFramingEditor({ target, framing, rigs, onSaved });
  const field = fieldOfView(rigs.find((r) => r.id === form.values.rigId));

  return (
    <Card testID="framing-editor">
      <AppText variant="lead" weight="semibold" role="heading" aria-level={3}>
        {base ? `Edit “${base.name}”` : 'New framing'}
      </AppText>
      <SaveNotice save={save} onLoadTheirs={loadTheirs} onKeepMine={(theirs) => send(theirs.version)} />
      <FitsFramingPicker onRead={fromFits} />
      <View style={[styles.body, isWide && styles.bodyWide]}>
        <View style={isWide ? styles.column : undefined}>
          <FramingFields form={form} rigs={rigs} />
        </View>
        <View style={[styles.preview, isWide && styles.column]}>
          <FramingPreview object={target} framing={previewShape(form.values, target)} field={field} />
          <AppText variant="small" tone="faint" style={styles.caption} testID="framing-field-label">
            {field.label}
          </AppText>
        </View>
      </View>
      <View style={styles.actions}>
        {base ? <FramingDelete targetId={target.id} framing={base} onDeleted={onClose} /> : null}
        <View style={styles.submit}>
          <Button label="Close" variant="ghost" onPress={onClose} testID="framing-form-close" />
          <Button label={base ? 'Save framing' : 'Add framing'} onPress={() => send(base?.version)} pending={save.isPending && !save.conflict} testID="framing-form-submit" />
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.lg },
  bodyWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0 },
  preview: { gap: spacing.sm },
  caption: { textAlign: 'center' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  submit: { flexDirection: 'row', gap: spacing.sm, marginLeft: 'auto' },
});
