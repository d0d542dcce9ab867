import { StyleSheet, View } from 'react-native';

import { TargetListItem } from '@/components/targets/target-list-item';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { useTargetsQuery } from '@/hooks/use-targets';
import { spacing } from '@/constants/theme';

type MyTargetsPanelProps = {
  /** Shown in the empty state on phones, where Find is the other tab. */
  onFind?: () => void;
};

/** The user's own target list, alphabetical by designation. */
export function MyTargetsPanel({ onFind }: MyTargetsPanelProps) {
  const targets = useTargetsQuery();
  if (targets.isPending) return <LoadingView label="Loading your targets…" />;
  if (targets.isError) return <ErrorView error={targets.error} onRetry={() => targets.refetch()} retrying={targets.isFetching} title="Could not load your targets" />;
  if (targets.data.length === 0) {
    return (
      <EmptyState
        testID="targets-empty"
        title="No targets yet"
        message="Find objects in the built-in list or your catalogues, or add custom coordinates."
        action={onFind ? <Button label="Find targets" onPress={onFind} testID="targets-empty-find" /> : undefined}
      />
    );
  }
  return (
    <View style={styles.list} testID="my-targets-list">
      <AppText variant="small" tone="muted">
        {targets.data.length === 1 ? '1 target' : `${targets.data.length} targets`}
      </AppText>
      {targets.data.map((t) => (
        <TargetListItem key={t.id} target={t} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
});
