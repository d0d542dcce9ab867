import { useState } from 'react';
import { View } from 'react-native';

import { biasSetText, countText } from '@/components/calibration/calibration-format';
import { makeStyles, StaleBadge } from '@/components/calibration/dark-set-row';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useDeleteBiasSetMutation } from '@/hooks/use-calibration';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import type { BiasLibrarySet } from '@/shared/schemas/calibration-api';

/** One bias set grouped from recorded bias frames: its settings, frames and night; it can be forgotten. */
export function BiasSetRow({ set }: { set: BiasLibrarySet }) {
  const styles = useThemedStyles(makeStyles);
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteBiasSetMutation();
  const text = biasSetText(set);
  return (
    <View style={[styles.row, set.stale && styles.rowStale]} role="listitem" testID={`bias-set-${set.id}`}>
      <View style={styles.top}>
        <AppText weight="semibold" tabular style={styles.grow} testID="bias-set-text">
          {text}
        </AppText>
        {set.stale ? <StaleBadge testID="bias-set-stale" /> : null}
      </View>
      {confirming ? (
        <View style={styles.confirm}>
          <AppText variant="small" style={styles.grow}>
            {`Forget these ${countText(set.frames, 'recorded bias frame', 'recorded bias frames')}? The files on your disk are not touched.`}
          </AppText>
          <Button label="Keep" size="small" variant="ghost" onPress={() => setConfirming(false)} testID="bias-set-keep" />
          <Button label="Forget" size="small" variant="danger" pending={remove.isPending} onPress={() => remove.mutate(set)} testID="bias-set-delete-confirm" />
        </View>
      ) : (
        <View style={styles.actions}>
          <Button label="Forget" size="small" variant="ghost" onPress={() => setConfirming(true)} testID="bias-set-delete" accessibilityLabel={`Forget the set: ${text}`} />
        </View>
      )}
      {remove.isError ? <Banner tone="danger" title="Could not remove the set" message={cleanError(remove.error)} /> : null}
    </View>
  );
}
