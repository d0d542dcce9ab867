import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { importedAtText, nightsText, objectsText, recordedText } from '@/components/calibration/calibration-format';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useUndoIntakeMutation } from '@/hooks/use-calibration';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { IntakeSummary } from '@/shared/schemas/calibration-api';

/**
 * One past import: when, what it recorded by type, the nights and objects it covers; its frames
 * can be removed after an inline confirmation that names the counts (web has no `Alert`).
 */
export function ImportRow({ intake }: { intake: IntakeSummary }) {
  const styles = useThemedStyles(makeStyles);
  const [confirming, setConfirming] = useState(false);
  const remove = useUndoIntakeMutation();
  const counts = recordedText(intake.frames) ?? 'No frames';
  const objects = objectsText(intake);
  const when = importedAtText(intake.importedAt);
  return (
    <View style={styles.row} role="listitem" testID={`import-${intake.intakeId}`} aria-label={`Import of ${when}`}>
      <View style={styles.top}>
        <AppText weight="semibold" tabular style={styles.grow} testID="import-counts">
          {counts}
        </AppText>
        <AppText variant="small" tone="faint" tabular testID="import-when">
          {when}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular testID="import-nights">
        {nightsText(intake.firstNight, intake.lastNight)}
      </AppText>
      {objects ? (
        <AppText variant="small" tone="muted" testID="import-objects">
          {objects}
        </AppText>
      ) : null}
      {confirming ? (
        <View style={styles.confirm} role="alertdialog" aria-label="Remove these frames?" testID="import-remove-dialog">
          <AppText variant="small" style={styles.grow}>
            {`Remove ${counts} of this import from your records? Dark sets, flats and history built from them go too; the files on your disk are not touched.`}
          </AppText>
          <View style={styles.actions}>
            <Button label="Keep" size="small" variant="ghost" onPress={() => setConfirming(false)} testID="import-keep" />
            <Button label="Remove" size="small" variant="danger" pending={remove.isPending} onPress={() => remove.mutate(intake.intakeId)} testID="import-remove-confirm" />
          </View>
        </View>
      ) : (
        <View style={styles.actions}>
          <Button
            label="Remove these frames"
            size="small"
            variant="ghost"
            onPress={() => {
              remove.reset();
              setConfirming(true);
            }}
            accessibilityLabel={`Remove the frames of the import of ${when}`}
            testID="import-remove"
          />
        </View>
      )}
      {remove.isError ? <Banner tone="danger" title="Could not remove the frames" message={cleanError(remove.error)} testID="import-remove-error" /> : null}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xs, backgroundColor: c.surface },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
    grow: { flexGrow: 1, flexShrink: 1 },
    actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.xs },
    confirm: { gap: spacing.sm, paddingTop: spacing.xs },
  });
