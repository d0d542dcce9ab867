import { StyleSheet, View } from 'react-native';

import { MailItem } from '@/components/mail/mail-item';
import { NavIcon } from '@/components/nav/nav-icons';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { useTheme } from '@/components/theme-provider';
import { useDevMailQuery } from '@/hooks/use-dev-mail';
import { useSessionState } from '@/hooks/use-session';
import { spacing } from '@/constants/theme';

/** Site admins only: the mail this server sent (its local mail catcher), newest first. */
export function MailScreen() {
  const { isAdmin } = useSessionState();
  const { palette } = useTheme();
  const mail = useDevMailQuery(isAdmin);
  const refresh = <Button label="Refresh" variant="secondary" size="small" onPress={() => mail.refetch()} pending={mail.isFetching && !mail.isPending} testID="mail-refresh" />;

  if (!isAdmin) {
    return (
      <Screen title="Mail">
        <EmptyState title="Site admins only" message="The sent-mail log is visible to the admins of this Nightloom server." />
      </Screen>
    );
  }

  return (
    <Screen title="Mail" subtitle="Messages this server sent, newest first. Refreshes every few seconds." actions={refresh}>
      {mail.isPending ? <LoadingView label="Loading mail…" /> : null}
      {mail.isError ? <ErrorView error={mail.error} onRetry={() => mail.refetch()} retrying={mail.isFetching} title="Could not load the mail" /> : null}
      {mail.data && mail.data.length === 0 ? (
        <EmptyState icon={<NavIcon name="mail" color={palette.accent} size={36} />} title="No mail sent yet" message="Password resets and invitations will appear here." testID="mail-empty" />
      ) : null}
      {mail.data && mail.data.length > 0 ? (
        <View style={styles.list} testID="mail-list">
          {mail.data.map((m) => (
            <MailItem key={m.id} message={m} />
          ))}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
