import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { cameraSettingsText, countText, darkSetHeadline } from '@/components/calibration/calibration-format';
import { DarkSetForm, darkSetValues } from '@/components/calibration/dark-set-form';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { isVersionConflict, useDeleteDarkSetMutation, useUpdateDarkSetMutation } from '@/hooks/use-calibration';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { DarkLibrarySet } from '@/shared/schemas/calibration-api';

type Mode = 'view' | 'edit' | 'confirm-delete';

/** The "Stale" mark of a set older than the validity. */
export function StaleBadge({ testID = 'dark-set-stale' }: { testID?: string }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.badge} testID={testID}>
      <AppText variant="caption" weight="semibold" tone="danger">
        Stale
      </AppText>
    </View>
  );
}

/** One set of the library: its settings, frames and date; hand sets can be edited, any set removed. */
export function DarkSetRow({ set, today }: { set: DarkLibrarySet; today: string }) {
  const styles = useThemedStyles(makeStyles);
  const [mode, setMode] = useState<Mode>('view');
  const [notice, setNotice] = useState<string | null>(null);
  const update = useUpdateDarkSetMutation();
  const remove = useDeleteDarkSetMutation();
  const byHand = set.source === 'hand';
  const rowID = `dark-set-${set.id}`;

  if (mode === 'edit' && byHand && set.version !== null) {
    const version = set.version;
    return (
      <View style={[styles.row, styles.editing]} testID={rowID}>
        <DarkSetForm
          initial={darkSetValues(set, today)}
          submitLabel="Save set"
          pending={update.isPending}
          testID="dark-set-edit"
          onCancel={() => setMode('view')}
          banner={update.isError && !isVersionConflict(update.error) ? <Banner tone="danger" title="Could not save the set" message={cleanError(update.error)} /> : null}
          onSubmit={(input, form) =>
            update.mutate(
              { id: set.id, input, version },
              {
                onSuccess: () => setMode('view'),
                onError: (e) => {
                  if (isVersionConflict(e)) {
                    // The library reloads (the mutation invalidates it): show the stored copy, say why.
                    setNotice(`${cleanError(e)} The stored set is shown now; edit it again if needed.`);
                    setMode('view');
                  } else if (isApiError(e) && e.fields) form.setServerErrors(e.fields);
                },
              },
            )
          }
        />
      </View>
    );
  }

  return (
    <View style={[styles.row, set.stale && styles.rowStale]} role="listitem" testID={rowID}>
      <View style={styles.top}>
        <AppText weight="semibold" tabular style={styles.grow}>
          {darkSetHeadline(set)}
        </AppText>
        {set.stale ? <StaleBadge /> : null}
        <AppText variant="small" tone="faint">
          {byHand ? 'By hand' : 'From frames'}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {`${cameraSettingsText(set)} · ${countText(set.frames, 'frame', 'frames')} · ${formatNightDate(set.takenOn)}`}
      </AppText>
      {set.notes ? (
        <AppText variant="small" tone="faint">
          {set.notes}
        </AppText>
      ) : null}
      {notice ? <Banner tone="info" title="Not saved" message={notice} testID="dark-set-conflict" /> : null}
      {mode === 'confirm-delete' ? (
        <View style={styles.confirm}>
          <AppText variant="small" style={styles.grow}>
            {byHand ? 'Delete this set from the library?' : `Forget these ${countText(set.frames, 'recorded dark frame', 'recorded dark frames')}? The files on your disk are not touched.`}
          </AppText>
          <Button label="Keep" size="small" variant="ghost" onPress={() => setMode('view')} testID="dark-set-keep" />
          <Button label={byHand ? 'Delete' : 'Forget'} size="small" variant="danger" pending={remove.isPending} onPress={() => remove.mutate(set)} testID="dark-set-delete-confirm" />
        </View>
      ) : (
        <View style={styles.actions}>
          {byHand ? (
            <Button
              label="Edit"
              size="small"
              variant="ghost"
              onPress={() => {
                setNotice(null);
                update.reset();
                setMode('edit');
              }}
              testID="dark-set-edit-open"
            />
          ) : null}
          <Button label={byHand ? 'Delete' : 'Forget'} size="small" variant="ghost" onPress={() => setMode('confirm-delete')} testID="dark-set-delete" accessibilityLabel={`${byHand ? 'Delete' : 'Forget'} the ${darkSetHeadline(set)} set`} />
        </View>
      )}
      {remove.isError ? <Banner tone="danger" title="Could not remove the set" message={cleanError(remove.error)} /> : null}
    </View>
  );
}

/** Row styles shared with the bias rows (`bias-set-row.tsx`). */
export const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xs, backgroundColor: c.surface },
    rowStale: { borderLeftWidth: 3, borderLeftColor: c.danger },
    editing: { borderColor: c.accent },
    top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
    grow: { flexGrow: 1, flexShrink: 1 },
    badge: { paddingHorizontal: spacing.sm, paddingVertical: 1, borderRadius: radii.pill, backgroundColor: c.dangerSoft, borderWidth: 1, borderColor: c.danger },
    actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.xs },
    confirm: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap', paddingTop: spacing.xs },
  });
