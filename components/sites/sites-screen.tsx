import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { NavIcon } from '@/components/nav/nav-icons';
import { SiteListItem } from '@/components/sites/site-list-item';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSitesQuery } from '@/hooks/use-sites';
import { spacing } from '@/constants/theme';

/** Splits a list into rows of `size` for a grid with equal cells. */
function pairs<T>(items: T[], size: number): T[][] {
  const rows: T[][] = [];
  for (let i = 0; i < items.length; i += size) rows.push(items.slice(i, i + size));
  return rows;
}

/** The places the user observes from; the default one is what Tonight opens with. */
export function SitesScreen() {
  const sites = useSitesQuery();
  const { palette } = useTheme();
  const { isWide } = useBreakpoints();
  const addButton = <Button label="Add site" onPress={() => router.push('/sites/new')} testID="sites-add" />;

  return (
    <Screen title="Sites" subtitle="Where you set up. Tonight uses the default site unless you pick another." actions={addButton}>
      {sites.isPending ? <LoadingView label="Loading sites…" /> : null}
      {sites.isError ? <ErrorView error={sites.error} onRetry={() => sites.refetch()} retrying={sites.isFetching} title="Could not load your sites" /> : null}
      {sites.data && sites.data.length === 0 ? (
        <EmptyState
          icon={<NavIcon name="sites" color={palette.accent} size={36} />}
          title="No sites yet"
          message="Add the field, garden or observatory you image from: its coordinates, elevation and time zone."
          testID="sites-empty"
        />
      ) : null}
      {sites.data && sites.data.length > 0 ? (
        <View style={styles.list} testID="sites-list">
          {pairs(sites.data, isWide ? 2 : 1).map((row) => (
            <View key={row.map((s) => s.id).join()} style={styles.row}>
              {row.map((site) => (
                <View key={site.id} style={styles.cell}>
                  <SiteListItem site={site} />
                </View>
              ))}
              {row.length < (isWide ? 2 : 1) ? <View style={styles.cell} /> : null}
            </View>
          ))}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
  row: { flexDirection: 'row', gap: spacing.md },
  cell: { flex: 1, minWidth: 0 },
});
