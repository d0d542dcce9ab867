import { router } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { NavIcon } from '@/components/nav/nav-icons';
import { RigListItem } from '@/components/rigs/rig-list-item';
import { SiteListItem } from '@/components/sites/site-list-item';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useSitesQuery } from '@/hooks/use-sites';
import { spacing } from '@/constants/theme';

type SectionProps = { title: string; description: string; action: ReactNode; children: ReactNode; testID: string };

function Section({ title, description, action, children, testID }: SectionProps) {
  return (
    <View style={styles.section} testID={testID}>
      <View style={styles.sectionHeader}>
        <View style={styles.sectionTitles}>
          <AppText variant="title" role="heading" aria-level={2}>
            {title}
          </AppText>
          <AppText variant="small" tone="muted">
            {description}
          </AppText>
        </View>
        {action}
      </View>
      {children}
    </View>
  );
}

function RigsSection() {
  const rigs = useRigsQuery();
  const { palette } = useTheme();
  return (
    <Section title="Rigs" description="Optics, camera, filters, focuser, rotator, mount and guider." action={<Button label="Add rig" size="small" onPress={() => router.push('/rigs/new')} testID="rigs-add" />} testID="setup-rigs">
      {rigs.isPending ? <LoadingView label="Loading rigs…" /> : null}
      {rigs.isError ? <ErrorView error={rigs.error} onRetry={() => rigs.refetch()} retrying={rigs.isFetching} title="Could not load your rigs" /> : null}
      {rigs.data?.length === 0 ? (
        <EmptyState icon={<NavIcon name="rig" color={palette.accent} size={36} />} title="No rigs yet" message="Describe your telescope and camera to see pixel scale, field of view and download time." testID="rigs-empty" />
      ) : null}
      {rigs.data?.map((rig) => <RigListItem key={rig.id} rig={rig} />)}
    </Section>
  );
}

function SitesSection() {
  const sites = useSitesQuery();
  const { palette } = useTheme();
  return (
    <Section title="Sites" description="Where you set up. Tonight opens with the default site." action={<Button label="Add site" size="small" onPress={() => router.push('/sites/new')} testID="sites-add" />} testID="setup-sites">
      {sites.isPending ? <LoadingView label="Loading sites…" /> : null}
      {sites.isError ? <ErrorView error={sites.error} onRetry={() => sites.refetch()} retrying={sites.isFetching} title="Could not load your sites" /> : null}
      {sites.data?.length === 0 ? (
        <EmptyState icon={<NavIcon name="sites" color={palette.accent} size={36} />} title="No sites yet" message="Add the field, garden or observatory you image from: coordinates, time zone and horizon." testID="sites-empty" />
      ) : null}
      {sites.data && sites.data.length > 0 ? (
        <View style={styles.list} testID="sites-list">
          {sites.data.map((site) => (
            <SiteListItem key={site.id} site={site} />
          ))}
        </View>
      ) : null}
    </Section>
  );
}

/** Rig & site: the equipment and the places the nights are planned for, side by side when wide. */
export function SetupScreen() {
  const { isWide } = useBreakpoints();
  return (
    <Screen title="Rig & site" subtitle="What you image with and where from.">
      <View style={[styles.columns, isWide && styles.columnsWide]}>
        <View style={styles.column}>
          <RigsSection />
        </View>
        <View style={styles.column}>
          <SitesSection />
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { gap: spacing.xxl },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  column: { flex: 1, minWidth: 0 },
  section: { gap: spacing.md },
  sectionHeader: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.md },
  sectionTitles: { flex: 1, gap: spacing.xxs },
  list: { gap: spacing.md },
});
