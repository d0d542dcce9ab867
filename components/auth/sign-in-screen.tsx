import { router, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { AuthFrame } from '@/components/auth/auth-frame';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { AppText } from '@/components/ui/app-text';
import { useAuthAction } from '@/hooks/use-auth-action';
import { useZodForm } from '@/hooks/use-zod-form';
import { authClient, nextPathOf } from '@/lib/auth-client';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

const signInSchema = z.object({
  email: z.email('Enter your e-mail address'),
  password: z.string().min(1, 'Enter your password'),
});

/** E-mail and password sign-in; the root guard moves to Tonight once the session exists. */
export function SignInScreen() {
  const form = useZodForm({ schema: signInSchema, initial: { email: '', password: '' } });
  // Where to go once signed in, e.g. back to an e-mailed club invitation.
  const next = nextPathOf(useLocalSearchParams<{ next?: string }>().next);
  const { pending, failure, run } = useAuthAction();

  function submit() {
    const input = form.validate();
    if (!input) return;
    void run(async () => {
      const { error } = await authClient.signIn.email({ email: input.email.trim(), password: input.password });
      if (error) return error.status === 401 ? 'That e-mail and password do not match an account.' : cleanError(error);
      if (next) router.replace(next);
    });
  }


  return (
    <AuthFrame
      title="Sign in"
      subtitle="Pick up your plans for the night."
      footer={
        <View style={styles.footerRow}>
          <AppText tone="muted">New to Nightloom?</AppText>
          <TextLink href={next ? `/sign-up?next=${encodeURIComponent(next)}` : '/sign-up'} label="Create an account" testID="link-sign-up" />
        </View>
      }
    >
      {failure ? <Banner tone="danger" title="Could not sign in" message={failure} testID="sign-in-error" /> : null}
      <TextField
        label="Email"
        {...form.textField('email')}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        testID="sign-in-email"
      />
      <TextField
        label="Password"
        {...form.textField('password')}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
        testID="sign-in-password"
      />
      <View style={styles.forgot}>
        <TextLink href="/forgot-password" label="Forgot password?" variant="small" testID="link-forgot-password" />
      </View>
      <Button label="Sign in" onPress={submit} pending={pending} testID="sign-in-submit" fullWidth />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  footerRow: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap', justifyContent: 'center' },
  forgot: { alignItems: 'flex-end', marginTop: -spacing.sm },
});
