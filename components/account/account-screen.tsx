import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { TemplateMailSetting } from '@/components/templates/template-mail-setting';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { SwitchRow } from '@/components/ui/switch-row';
import { useTheme } from '@/components/theme-provider';
import { useSessionState } from '@/hooks/use-session';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { authClient } from '@/lib/auth-client';
import { cleanError } from '@/lib/clean-error';
import { radii, spacing, type Palette } from '@/constants/theme';

function Row({ label, value, testID }: { label: string; value: string; testID?: string }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.row}>
      <AppText tone="muted">{label}</AppText>
      <AppText testID={testID} style={styles.value} numberOfLines={1}>
        {value}
      </AppText>
    </View>
  );
}

/** Who is signed in, the night view and signing out. */
export function AccountScreen() {
  const styles = useThemedStyles(makeStyles);
  const { user, isAdmin } = useSessionState();
  const { nightView, setNightView } = useTheme();
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);

  async function signOut() {
    setPending(true);
    setFailure(null);
    try {
      const { error } = await authClient.signOut();
      // On success the root guard moves to sign-in and drops this user's cached data.
      if (error) throw error;
    } catch (e) {
      setFailure(cleanError(e));
      setPending(false);
    }
  }

  return (
    <Screen title="Account" width="form">
      <Card>
        <AppText eyebrow tone="faint" weight="semibold">
          Signed in as
        </AppText>
        <Row label="Name" value={user?.name ?? ''} testID="account-name" />
        <Row label="Email" value={user?.email ?? ''} testID="account-email" />
        {isAdmin ? (
          <View style={styles.badge}>
            <AppText variant="caption" tone="accent" weight="semibold">
              Site admin
            </AppText>
          </View>
        ) : null}
      </Card>
      <Card>
        <AppText eyebrow tone="faint" weight="semibold">
          Display
        </AppText>
        <SwitchRow
          label="Night view"
          description="Red on black only, to keep your eyes dark-adapted at the telescope. Remembered on this device."
          value={nightView}
          onValueChange={setNightView}
          testID="night-view-switch"
        />
      </Card>
      <Card>
        <AppText eyebrow tone="faint" weight="semibold">
          Club mail
        </AppText>
        <TemplateMailSetting />
      </Card>
      <View style={styles.signOut}>
        {failure ? <AppText tone="danger">{failure}</AppText> : null}
        <Button label="Sign out" variant="secondary" onPress={signOut} pending={pending} testID="sign-out" />
      </View>
    </Screen>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: {
      flexDirection: 'row',
      justifyContent: 'space-between',
      gap: spacing.md,
      paddingVertical: spacing.sm,
      borderBottomWidth: StyleSheet.hairlineWidth,
      borderBottomColor: c.border,
    },
    value: { flexShrink: 1, textAlign: 'right' },
    badge: {
      alignSelf: 'flex-start',
      borderColor: c.accent,
      borderWidth: 1,
      borderRadius: radii.pill,
      paddingHorizontal: spacing.sm,
      paddingVertical: 1,
      backgroundColor: c.accentSoft,
    },
    signOut: { alignItems: 'flex-start', gap: spacing.sm },
  });
