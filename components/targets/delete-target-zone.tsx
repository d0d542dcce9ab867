import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { useDeleteTargetMutation } from '@/hooks/use-targets';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { Target } from '@/shared/schemas/target';

/** Removing a target (and its framings) asks once more, inline. */
export function DeleteTargetZone({ target }: { target: Target }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteTargetMutation();
  const onDelete = () => remove.mutate(target.id, { onSuccess: () => router.replace('/targets') });
  return (
    <Card>
      <AppText weight="semibold">Remove from my targets</AppText>
      {confirming ? (
        <View style={styles.confirm} role="alert">
          <AppText tone="muted">{`Remove ${target.designation} and its ${target.framings.length === 1 ? 'framing' : 'framings'}? This cannot be undone.`}</AppText>
          <View style={styles.actions}>
            <Button label="Cancel" variant="ghost" onPress={() => setConfirming(false)} testID="target-delete-cancel" />
            <Button label="Remove target" variant="danger" onPress={onDelete} pending={remove.isPending} testID="target-delete-confirm" />
          </View>
        </View>
      ) : (
        <View style={styles.row}>
          <AppText tone="muted" style={styles.grow}>
            Takes it off your list with its framings.
          </AppText>
          <Button label="Remove…" accessibilityLabel="Remove target" variant="secondary" onPress={() => setConfirming(true)} testID="target-delete" />
        </View>
      )}
      {remove.isError ? <AppText tone="danger">{cleanError(remove.error)}</AppText> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  confirm: { gap: spacing.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
});
