import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useDeleteFramingMutation } from '@/hooks/use-targets';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { Framing } from '@/shared/schemas/target';

type FramingDeleteProps = { targetId: string; framing: Framing; onDeleted: () => void };

/** "Delete…" that asks once more inline (web has no `Alert`). */
export function FramingDelete({ targetId, framing, onDeleted }: FramingDeleteProps) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteFramingMutation(targetId);
  if (!confirming) {
    return <Button label="Delete…" accessibilityLabel="Delete framing" variant="ghost" onPress={() => setConfirming(true)} testID="framing-delete" />;
  }
  return (
    <View style={styles.confirm} role="alert">
      <AppText tone="muted">{`Delete “${framing.name}”?`}</AppText>
      <Button label="Cancel" variant="ghost" size="small" onPress={() => setConfirming(false)} testID="framing-delete-cancel" />
      <Button label="Delete framing" variant="danger" size="small" pending={remove.isPending} onPress={() => remove.mutate(framing.id, { onSuccess: onDeleted })} testID="framing-delete-confirm" />
      {remove.isError ? <AppText tone="danger">{cleanError(remove.error)}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  confirm: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
