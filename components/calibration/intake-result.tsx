import { StyleSheet, View } from 'react-native';

import { countText, recordedText } from '@/components/calibration/calibration-format';
import type { IntakeFlow } from '@/components/calibration/use-intake';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { IntakeResult as Result } from '@/shared/schemas/calibration-api';

type Reject = Result['rejected'][number];

function RejectedList({ rejected }: { rejected: Reject[] }) {
  const styles = useThemedStyles(makeStyles);
  if (rejected.length === 0) return null;
  return (
    <View style={styles.rejected} testID="intake-rejected">
      <AppText weight="semibold">{`Not recorded · ${rejected.length}`}</AppText>
      <View role="list" style={styles.list}>
        {rejected.map((r, i) => (
          <View key={`${r.name}-${i}`} role="listitem" style={styles.item} testID="intake-rejected-item">
            <AppText variant="small" weight="semibold" numberOfLines={2} style={styles.name}>
              {r.name}
            </AppText>
            <AppText variant="small" tone="muted">
              {r.reason}
            </AppText>
          </View>
        ))}
      </View>
    </View>
  );
}

/** What one import did: frames recorded by type, frames already on record, and every file left out with why; undo. */
export function IntakeResultPanel({ flow, result }: { flow: IntakeFlow; result: Result }) {
  const styles = useThemedStyles(makeStyles);
  const recorded = recordedText(result.recorded);
  const rejected = [...flow.localRejects, ...result.rejected];
  const notes = [
    result.duplicates > 0 ? `${countText(result.duplicates, 'frame was', 'frames were')} already on record and left as they were.` : null,
    flow.skipped > 0 ? `${countText(flow.skipped, 'other file', 'other files')} in the folder skipped (not .fits, .fit or .fts).` : null,
  ].filter((n): n is string => n !== null);
  // 404: the import was already removed (e.g. from the Imports list): that is undone too.
  const undone = flow.undo.isSuccess || isApiError(flow.undo.error, 404);
  const title = undone ? 'Import undone' : recorded ? `Recorded ${recorded}` : 'Nothing new recorded';
  const message = undone ? 'Nothing from this import is on record any more.' : notes.join(' ') || undefined;
  return (
    <View style={styles.box} testID="intake-result">
      <Banner tone={undone || !recorded ? 'info' : 'ok'} title={title} message={message} testID={undone ? 'intake-undone' : 'intake-recorded'}>
        {recorded && !undone ? (
          <Button label="Undo this import" size="small" variant="ghost" pending={flow.undo.isPending} onPress={flow.undoImport} testID="intake-undo" />
        ) : null}
        <Button label="Add more frames" size="small" variant="ghost" onPress={flow.restart} testID="intake-again" />
      </Banner>
      {flow.undo.isError && !undone ? <Banner tone="danger" title="Could not undo the import" message={cleanError(flow.undo.error)} testID="intake-undo-error" /> : null}
      {undone ? null : <RejectedList rejected={rejected} />}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    box: { gap: spacing.md },
    rejected: { gap: spacing.sm },
    list: { gap: spacing.xs },
    item: { borderWidth: 1, borderColor: c.border, borderLeftColor: c.danger, borderLeftWidth: 3, borderRadius: radii.sm, padding: spacing.sm, gap: spacing.xxs, backgroundColor: c.surfaceRaised },
    name: { fontVariant: ['tabular-nums'] },
  });
