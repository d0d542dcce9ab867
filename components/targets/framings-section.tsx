import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { FramingEditor } from '@/components/targets/framing-editor';
import { FramingListItem } from '@/components/targets/framing-list-item';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { useRigsQuery } from '@/hooks/use-rigs';
import { spacing } from '@/constants/theme';
import type { Framing, Target } from '@/shared/schemas/target';

type Selection = string | 'new' | null;

/** The target's saved framings and the editor for the selected (or a new) one. */
export function FramingsSection({ target }: { target: Target }) {
  const rigs = useRigsQuery();
  const [selected, setSelected] = useState<Selection>(target.framings[0]?.id ?? null);
  // Right after a save the list may not have refetched yet: keep showing what was saved.
  const [lastSaved, setLastSaved] = useState<Framing | null>(null);
  const framing = selected && selected !== 'new' ? (target.framings.find((f) => f.id === selected) ?? (lastSaved?.id === selected ? lastSaved : null)) : null;
  const editing = selected === 'new' || framing !== null;
  const rigList = rigs.data ?? [];

  function onSaved(f: Framing) {
    setLastSaved(f);
    setSelected(f.id);
  }

  return (
    <FormSection
      title="Framings"
      description="Centre and rotation, to repeat exactly across nights."
      actions={<Button label="New framing" size="small" variant="secondary" onPress={() => setSelected('new')} testID="framing-new" />}
      testID="framings-section"
    >
      {target.framings.length === 0 && !editing ? (
        <AppText tone="muted" testID="framings-empty">
          No framing yet. Add one by hand or take it from an earlier image’s FITS header.
        </AppText>
      ) : null}
      {target.framings.length > 0 ? (
        <View style={styles.list} testID="framings-list">
          {target.framings.map((f) => (
            <FramingListItem key={f.id} framing={f} rig={rigList.find((r) => r.id === f.rigId)} selected={f.id === selected} onPress={() => setSelected(f.id)} />
          ))}
        </View>
      ) : null}
      {editing && rigs.isPending ? <LoadingView label="Loading your rigs…" /> : null}
      {editing && !rigs.isPending ? (
        <FramingEditor key={selected ?? 'none'} target={target} framing={framing} rigs={rigList} onSaved={onSaved} onClose={() => setSelected(null)} />
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
});
