import { router, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { NightBand } from '@/components/tonight/night-band';
import { NightHeader } from '@/components/tonight/night-header';
import { NightSummary } from '@/components/tonight/night-summary';
import { NightTimes } from '@/components/tonight/night-times';
import { NoSiteState } from '@/components/tonight/no-site-state';
import { SafetyNote } from '@/components/tonight/safety-note';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { useNow } from '@/hooks/use-now';
import { useSitesQuery } from '@/hooks/use-sites';
import { isNoSiteError, useTonightQuery } from '@/hooks/use-tonight';
import { unusualNightText } from '@/lib/night-text';
import { spacing } from '@/constants/theme';
import { currentNightDate } from '@/shared/night-date';
import { nightDateSchema } from '@/shared/schemas/night';

function param(value: string | string[] | undefined): string | undefined {
  const v = Array.isArray(value) ? value[0] : value;
  return v ? v : undefined;
}

/** Tonight: the chosen (or default) site's night, with the site and date kept in the URL. */
export function TonightScreen() {
  const params = useLocalSearchParams<{ site?: string; date?: string }>();
  const siteId = param(params.site);
  const rawDate = param(params.date);
  const date = rawDate && nightDateSchema.safeParse(rawDate).success ? rawDate : undefined;
  const tonight = useTonightQuery(siteId, date);
  const sites = useSitesQuery();
  const nowMs = useNow();

  if (tonight.isPending) {
    return (
      <Screen>
        <LoadingView label="Working out the night…" />
      </Screen>
    );
  }
  if (tonight.isError && isNoSiteError(tonight.error) && siteId) {
    // A link to a site that was deleted since: offer the default instead of the first-run state.
    return (
      <Screen title="Tonight">
        <Banner title="That site is no longer in your list" message="It may have been deleted.">
          <Button label="Show my default site" size="small" variant="secondary" onPress={() => router.setParams({ site: undefined })} />
        </Banner>
      </Screen>
    );
  }
  if (tonight.isError && isNoSiteError(tonight.error)) {
    return (
      <Screen title="Tonight">
        <NoSiteState />
        <SafetyNote />
      </Screen>
    );
  }
  if (tonight.isError) {
    return (
      <Screen title="Tonight">
        <ErrorView error={tonight.error} onRetry={() => tonight.refetch()} retrying={tonight.isFetching} title="Could not load the night" />
      </Screen>
    );
  }

  const { site, night } = tonight.data;
  const isCurrentNight = night.date === currentNightDate(site.timeZone, new Date(nowMs));
  const unusual = unusualNightText(night);
  return (
    <Screen testID="tonight-screen">
      <NightHeader
        site={site}
        date={night.date}
        sites={sites.data ?? []}
        isCurrentNight={isCurrentNight}
        onDate={(next) => router.setParams({ date: next })}
        onSite={(id) => router.setParams({ site: id })}
      />
      <View style={[styles.body, tonight.isPlaceholderData && styles.stale]}>
        {unusual ? <Banner title={unusual} testID="tonight-unusual" /> : null}
        <NightSummary night={night} />
        <Card padded={false} style={styles.bandCard}>
          <NightBand night={night} nowMs={nowMs} />
        </Card>
        <NightTimes night={night} />
      </View>
      <SafetyNote />
    </Screen>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.lg },
  stale: { opacity: 0.6 },
  bandCard: { paddingVertical: spacing.lg },
});
