import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { NewClubForm } from '@/components/clubs/new-club-form';
import { rolesText } from '@/components/clubs/role-text';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import type { WebPressState } from '@/components/ui/pressable-state';
import { Screen } from '@/components/ui/screen';
import { useClubsQuery, type ClubSummary } from '@/hooks/use-clubs';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function ClubRow({ club }: { club: ClubSummary }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <Link href={{ pathname: '/clubs/[id]', params: { id: club.id } }} asChild>
      <Pressable role="link" accessibilityLabel={club.name} testID={`club-row-${club.slug}`} style={({ hovered }: WebPressState) => [styles.row, hovered && styles.rowHover]}>
        <View style={styles.rowText}>
          <AppText weight="semibold">{club.name}</AppText>
          <AppText variant="small" tone="muted" tabular>
            {`${count(club.memberCount, 'member')} · ${count(club.templateCount, 'template')}`}
          </AppText>
        </View>
        <AppText variant="small" tone="accent" weight="semibold">
          {rolesText(club.myRoles)}
        </AppText>
      </Pressable>
    </Link>
  );
}

/** My clubs with my role in each, and "New club". */
export function ClubsScreen() {
  const clubs = useClubsQuery();
  const [creating, setCreating] = useState(false);
  const actions = creating ? null : <Button label="New club" size="small" onPress={() => setCreating(true)} testID="clubs-new" />;
  return (
    <Screen title="Clubs" subtitle="Share proven recipes as templates with the people you image with." actions={actions} testID="clubs-screen">
      {creating ? <NewClubForm onCancel={() => setCreating(false)} /> : null}
      {clubs.isPending ? (
        <LoadingView label="Loading your clubs…" />
      ) : clubs.isError ? (
        <ErrorView error={clubs.error} onRetry={() => clubs.refetch()} retrying={clubs.isFetching} title="Could not load your clubs" />
      ) : clubs.data.length === 0 && !creating ? (
        <EmptyState testID="clubs-empty" title="No clubs yet" message="Start one for your observing group, or open the link of an invitation you received." action={<Button label="New club" onPress={() => setCreating(true)} />} />
      ) : (
        <View style={stylesStatic.list}>
          {clubs.data.map((club) => (
            <ClubRow key={club.id} club={club} />
          ))}
        </View>
      )}
    </Screen>
  );
}

const stylesStatic = StyleSheet.create({ list: { gap: spacing.sm } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: c.border, backgroundColor: c.surface },
    rowHover: { borderColor: c.borderStrong },
    rowText: { flex: 1, gap: spacing.xxs },
  });
