import { StyleSheet, View } from 'react-native';

import { Sheet } from '@/components/recipes/sheet';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { useRecipeRevisionsQuery, useRestoreRevisionMutation } from '@/hooks/use-recipes';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

type HistoryPanelProps = {
  open: boolean;
  onClose: () => void;
  recipeId: string;
  /** The version the composer holds (the restore is checked against it). */
  version: number;
  /** Restoring needs everything saved first, so nothing of the present is lost. */
  canRestore: boolean;
  onRestored: (recipe: RecipeDetail) => void;
};

/** Saved versions, newest first; restoring one saves it again as the newest version. */
export function HistoryPanel({ open, onClose, recipeId, version, canRestore, onRestored }: HistoryPanelProps) {
  const styles = useThemedStyles(makeStyles);
  const revisions = useRecipeRevisionsQuery(recipeId, open);
  const restore = useRestoreRevisionMutation(recipeId);
  const run = (revision: number) => restore.mutate({ revision, version }, { onSuccess: (recipe) => onRestored(recipe) });
  return (
    <Sheet open={open} onClose={onClose} title="History" wideAs="side" testID="composer-history-panel">
      <AppText variant="small" tone="faint">
        Every save is kept (the last 100). Restoring one makes it the newest version; Undo takes it back.
      </AppText>
      {canRestore ? null : <Banner title="Saving first" message="Restore is possible once your latest edits are saved." />}
      {restore.isError ? <Banner tone="danger" title="Could not restore" message={cleanError(restore.error)} /> : null}
      {revisions.isPending ? <LoadingView label="Loading versions…" /> : null}
      {revisions.isError ? <ErrorView error={revisions.error} onRetry={() => revisions.refetch()} title="Could not load the versions" /> : null}
      {revisions.data?.map((rev) => {
        const current = rev.version === version;
        return (
          <View key={rev.version} style={styles.item} testID={`history-rev-${rev.version}`}>
            <View style={styles.text}>
              <AppText weight="semibold" tabular>
                {`Version ${rev.version}${current ? ' · current' : ''}`}
              </AppText>
              <AppText variant="small" tone="muted" tabular numberOfLines={1}>
                {`${formatLogTime(rev.createdAt)} · ${rev.nodeCount === 1 ? '1 step' : `${rev.nodeCount} steps`} · ${rev.name}`}
              </AppText>
            </View>
            {current ? null : (
              <Button label="Restore" variant="secondary" size="small" onPress={() => run(rev.version)} disabled={!canRestore || restore.isPending} pending={restore.isPending && restore.variables?.revision === rev.version} testID={`history-restore-${rev.version}`} />
            )}
          </View>
        );
      })}
    </Sheet>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: c.border },
    text: { flex: 1, gap: spacing.xxs },
  });
