import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { AuthFrame } from '@/components/auth/auth-frame';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { useAuthAction } from '@/hooks/use-auth-action';
import { useZodForm } from '@/hooks/use-zod-form';
import { authClient, nextPathOf, MIN_PASSWORD_LENGTH } from '@/lib/auth-client';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

const signUpSchema = z.object({
  name: z.string().trim().min(1, 'Tell us what to call you').max(80, 'At most 80 characters'),
  email: z.email('Enter a valid e-mail address'),
  password: z.string().min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters`),
});

/** Account creation. better-auth signs the new user in, and the root guard takes over. */
export function SignUpScreen() {
  const form = useZodForm({ schema: signUpSchema, initial: { name: '', email: '', password: '' } });
  // Where to go once signed in, e.g. back to an e-mailed club invitation.
  const next = nextPathOf(useLocalSearchParams<{ next?: string }>().next);
  const { pending, failure, run } = useAuthAction();
  const [needsVerification, setNeedsVerification] = useState(false);

  function submit() {
    const input = form.validate();
    if (!input) return;
    void run(async () => {
      const { data, error } = await authClient.signUp.email({ name: input.name, email: input.email.trim(), password: input.password });
      if (error) return cleanError(error);
      if (data && !data.token) setNeedsVerification(true);
      else if (next) router.replace(next);
    });
  }


  return (
    <AuthFrame
      title="Create your account"
      subtitle="Describe your sites and see each night's dark window."
      footer={
        <View style={styles.footerRow}>
          <AppText tone="muted">Already have an account?</AppText>
          <TextLink href={next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'} label="Sign in" testID="link-sign-in" />
        </View>
      }
    >
      {needsVerification ? (
        <Banner tone="ok" title="Check your mail" message="We sent a link to confirm your address. Open it, then sign in." />
      ) : null}
      {failure ? <Banner tone="danger" title="Could not create the account" message={failure} testID="sign-up-error" /> : null}
      <TextField
        label="Name"
        {...form.textField('name')}
        autoComplete="name"
        testID="sign-up-name"
      />
      <TextField
        label="Email"
        {...form.textField('email')}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        testID="sign-up-email"
      />
      <TextField
        label="Password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        {...form.textField('password')}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
        testID="sign-up-password"
      />
      <Button label="Create account" onPress={submit} pending={pending} testID="sign-up-submit" fullWidth />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  footerRow: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap', justifyContent: 'center' },
});
