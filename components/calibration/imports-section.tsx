import { StyleSheet, View } from 'react-native';

import { ImportRow } from '@/components/calibration/import-row';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { useIntakesQuery } from '@/hooks/use-calibration';
import { spacing } from '@/constants/theme';

/**
 * "Imports": every past import still on record, newest first, so a wrong folder can be found
 * and its frames removed long after the import (the result panel's undo is only right after).
 */
export function ImportsSection() {
  const list = useIntakesQuery();
  const intakes = list.data?.pages.flatMap((p) => p.intakes) ?? [];
  return (
    <FormSection title="Imports" description="Each import with the frames it recorded that are still on record. Removing one takes its frames off the dark library, flats and history." testID="imports-section">
      {list.isPending ? <LoadingView label="Loading your imports…" /> : null}
      {list.isError && !list.data ? <ErrorView error={list.error} onRetry={() => list.refetch()} retrying={list.isFetching} title="Could not load your imports" /> : null}
      {list.data ? (
        intakes.length === 0 ? (
          <AppText tone="muted" testID="imports-empty">
            No imports on record. Frames you add above are listed here, one entry per import.
          </AppText>
        ) : (
          <View style={styles.list} role="list" aria-label="Imports" testID="imports-list">
            {intakes.map((intake) => (
              <ImportRow key={intake.intakeId} intake={intake} />
            ))}
          </View>
        )
      ) : null}
      {list.hasNextPage ? (
        <Button label="Show older imports" size="small" variant="secondary" pending={list.isFetchingNextPage} onPress={() => list.fetchNextPage()} testID="imports-more" />
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
});
