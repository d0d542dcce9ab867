import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { BestNights } from '@/components/dry-run/best-nights';
import { DryRunHeader } from '@/components/dry-run/dry-run-header';
import { NightView } from '@/components/dry-run/night-view';
import { useDryRunView, type DryRunView } from '@/components/dry-run/use-dry-run-view';
import { Segmented } from '@/components/ui/segmented';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { isNoSiteError } from '@/hooks/use-tonight';
import { useNow } from '@/hooks/use-now';
import { useScan } from '@/hooks/use-scan';
import { spacing } from '@/constants/theme';

type Tab = 'night' | 'best';

/** What shows before there is a result: the run under way, no site yet, or a failure. */
function NoResult({ view }: { view: DryRunView }) {
  if (view.run.isError && isNoSiteError(view.run.error)) {
    return (
      <EmptyState
        title="Add a site first"
        message="A dry run plays the night at a place: its horizon, its twilight and its Moon. Describe your observing site, then come back."
        action={<Button label="Add a site" onPress={() => router.push('/sites/new')} testID="dry-run-add-site" />}
        testID="dry-run-no-site"
      />
    );
  }
  if (view.latest.isError) return <ErrorView error={view.latest.error} onRetry={() => view.latest.refetch()} retrying={view.latest.isFetching} title="Could not load the last dry run" />;
  if (view.run.isError) return null;
  return <LoadingView label="Playing the night…" />;
}

/** The dry-run screen: how the recipe's night will go, and which nights of a season suit it best. */
export function DryRunScreen({ id }: { id: string }) {
  const view = useDryRunView(id);
  const scan = useScan(id);
  const nowMs = useNow();
  const [tab, setTab] = useState<Tab>('night');
  const showStep = (nodeId: string) => router.push({ pathname: '/recipes/[id]', params: { id, select: nodeId } });
  const { shown } = view;

  if (view.recipe.isPending) {
    return (
      <Screen testID="dry-run-screen">
        <LoadingView label="Opening the recipe…" />
      </Screen>
    );
  }
  if (view.recipe.isError) {
    return (
      <Screen testID="dry-run-screen">
        <ErrorView error={view.recipe.error} onRetry={() => view.recipe.refetch()} retrying={view.recipe.isFetching} title="Could not open this recipe" />
      </Screen>
    );
  }

  const pickNight = (date: string) => {
    setTab('night');
    view.runNight({ date });
  };

  return (
    <Screen testID="dry-run-screen">
      <DryRunHeader recipeId={id} view={view} />
      {shown ? (
        <View style={styles.body}>
          <Segmented
            accessibilityLabel="Dry-run views"
            value={tab}
            onChange={setTab}
            segments={[
              { key: 'night', label: 'This night', testID: 'dry-run-tab-night' },
              { key: 'best', label: 'Best nights', testID: 'dry-run-tab-best' },
            ]}
          />
          <View style={view.run.isPending && styles.pending}>
            {tab === 'night' ? (
              <NightView record={shown} naming={view.naming} targets={view.targets} nowMs={nowMs} onShowStep={showStep} />
            ) : (
              <BestNights scan={scan} fromDate={shown.nightDate} siteId={shown.siteId} rigId={shown.rigId} shownDate={shown.nightDate} onPick={pickNight} />
            )}
          </View>
        </View>
      ) : (
        <NoResult view={view} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.lg },
  pending: { opacity: 0.55 },
});
