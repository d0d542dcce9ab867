import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { SearchResultItem } from '@/components/targets/search-result-item';
import { sameDesignation } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { useCatalogueSearchQuery, type CatalogueSearchParams, type CatalogueSearchResponse } from '@/hooks/use-catalogues';
import { useAddTargetMutation, useTargetsQuery } from '@/hooks/use-targets';
import { isNoSiteError } from '@/hooks/use-tonight';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { formatNightDate } from '@/lib/format';
import { spacing } from '@/constants/theme';
import type { CatalogueSearchResult, Target, TargetInput } from '@/shared/schemas/target';

const resultKey = (r: CatalogueSearchResult) => `${r.source}|${r.catalogueId ?? ''}|${r.designation}`;

/** A search hit as a new target: the catalogue fields, no notes yet. */
export function targetInputFromResult(r: CatalogueSearchResult): TargetInput {
  const { designation, aliases, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude } = r;
  return { designation, aliases, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude, notes: '' };
}

function summaryText(data: CatalogueSearchResponse): string {
  const shown = data.results.length;
  const total = data.total ?? shown;
  const count = total > shown ? `First ${shown} of ${total} objects` : `${shown} ${shown === 1 ? 'object' : 'objects'}`;
  if (!data.night) return count;
  return `${count} · well placed on ${formatNightDate(data.night.date, { year: false })} at ${data.night.siteName}`;
}

function onListId(targets: Target[] | undefined, designation: string): string | null {
  return targets?.find((t) => sameDesignation(t.designation, designation))?.id ?? null;
}

/** The answer to the Find panel's filters; the previous answer stays (dimmed) while the next loads. */
export function SearchResults({ params }: { params: CatalogueSearchParams }) {
  const search = useCatalogueSearchQuery(params);
  const targets = useTargetsQuery();
  const add = useAddTargetMutation();
  const [errors, setErrors] = useState<Record<string, string>>({});

  function addResult(r: CatalogueSearchResult) {
    const key = resultKey(r);
    setErrors(({ [key]: _drop, ...rest }) => rest);
    add.mutate(targetInputFromResult(r), {
      onError: (e) => setErrors((current) => ({ ...current, [key]: isApiError(e, 409) ? 'Already on your list.' : cleanError(e) })),
    });
  }

  if (search.isPending) return <LoadingView label="Searching…" />;
  if (search.isError && isNoSiteError(search.error)) {
    return (
      <Banner title="Add a site first" message="“Well placed tonight” is worked out for your default site." testID="search-no-site">
        <Button label="Add a site" size="small" variant="secondary" onPress={() => router.push('/sites/new')} />
      </Banner>
    );
  }
  if (search.isError) return <ErrorView error={search.error} onRetry={() => search.refetch()} retrying={search.isFetching} title="Could not search" />;

  const data = search.data;
  const pendingKey = add.isPending && add.variables ? add.variables.designation : null;
  return (
    <View style={[styles.list, search.isPlaceholderData && styles.stale]} testID="search-results" aria-busy={search.isFetching}>
      <AppText variant="small" tone="muted" testID="search-summary">
        {summaryText(data)}
      </AppText>
      {data.results.length === 0 ? (
        <AppText tone="muted" testID="search-empty">
          Nothing matches. Try fewer filters, another spelling, or add custom coordinates below.
        </AppText>
      ) : null}
      {data.results.map((r) => (
        <SearchResultItem
          key={resultKey(r)}
          result={r}
          onListId={onListId(targets.data, r.designation)}
          onAdd={() => addResult(r)}
          pending={pendingKey === r.designation}
          error={errors[resultKey(r)]}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  stale: { opacity: 0.6 },
});
