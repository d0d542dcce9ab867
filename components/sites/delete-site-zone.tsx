import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

type DeleteSiteZoneProps = { siteName: string; pending: boolean; error: unknown; onDelete: () => void };

/** Deleting asks once more, inline (web has no `Alert`). */
export function DeleteSiteZone({ siteName, pending, error, onDelete }: DeleteSiteZoneProps) {
  const [confirming, setConfirming] = useState(false);
  return (
    <Card style={styles.card}>
      <AppText weight="semibold">Delete this site</AppText>
      {confirming ? (
        <View style={styles.confirm} role="alert">
          <AppText tone="muted">{`Delete “${siteName}”? This cannot be undone.`}</AppText>
          <View style={styles.actions}>
            <Button label="Cancel" variant="ghost" onPress={() => setConfirming(false)} testID="site-delete-cancel" />
            <Button label="Delete site" variant="danger" onPress={onDelete} pending={pending} testID="site-delete-confirm" />
          </View>
        </View>
      ) : (
        <View style={styles.row}>
          <AppText tone="muted" style={styles.grow}>
            Removes the site and its settings.
          </AppText>
          <Button label="Delete…" accessibilityLabel="Delete site" variant="secondary" onPress={() => setConfirming(true)} testID="site-delete" />
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
