import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

type DeleteZoneProps = {
  /** What is deleted, lower case: "site", "rig". */
  noun: string;
  itemName: string;
  /** What else goes with it, one sentence. */
  consequence: string;
  pending: boolean;
  error: unknown;
  onDelete: () => void;
  /** Prefix of the testIDs: `${p}-delete`, `${p}-delete-confirm`, `${p}-delete-cancel`. */
  testIDPrefix: string;
};

/** Deleting asks once more, inline (web has no `Alert`). */
export function DeleteZone({ noun, itemName, consequence, pending, error, onDelete, testIDPrefix: p }: DeleteZoneProps) {
  const [confirming, setConfirming] = useState(false);
  return (
    <Card style={styles.card}>
      <AppText weight="semibold">{`Delete this ${noun}`}</AppText>
      {confirming ? (
        <View style={styles.confirm} role="alert">
          <AppText tone="muted">{`Delete “${itemName}”? This cannot be undone.`}</AppText>
          <View style={styles.actions}>
            <Button label="Cancel" variant="ghost" onPress={() => setConfirming(false)} testID={`${p}-delete-cancel`} />
            <Button label={`Delete ${noun}`} variant="danger" onPress={onDelete} pending={pending} testID={`${p}-delete-confirm`} />
          </View>
        </View>
      ) : (
        <View style={styles.row}>
          <AppText tone="muted" style={styles.grow}>
            {consequence}
          </AppText>
          <Button label="Delete…" accessibilityLabel={`Delete ${noun}`} variant="secondary" onPress={() => setConfirming(true)} testID={`${p}-delete`} />
        </View>
      )}
      {error ? <AppText tone="danger">{cleanError(error)}</AppText> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  confirm: { gap: spacing.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm },
});
