import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { z } from 'zod';

import { AuthFrame } from '@/components/auth/auth-frame';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { useSessionState } from '@/hooks/use-session';
import { useAuthAction } from '@/hooks/use-auth-action';
import { useZodForm } from '@/hooks/use-zod-form';
import { authClient, MIN_PASSWORD_LENGTH } from '@/lib/auth-client';
import { cleanError } from '@/lib/clean-error';

const resetSchema = z
  .object({
    password: z.string().min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters`),
    repeat: z.string(),
  })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], message: 'The two passwords differ' });

function firstParam(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

/**
 * Where the e-mailed link lands (`/reset-password?token=…`). It works signed in or out, because
 * the link may be opened in a browser where someone is already signed in.
 */
export function ResetPasswordScreen() {
  const params = useLocalSearchParams<{ token?: string; error?: string }>();
  const token = firstParam(params.token);
  const linkError = firstParam(params.error);
  const { session } = useSessionState();
  const form = useZodForm({ schema: resetSchema, initial: { password: '', repeat: '' } });
  const { pending, failure, run } = useAuthAction();
  const [done, setDone] = useState(false);
  const onward = session ? { href: '/', label: 'Back to Nightloom' } : { href: '/sign-in', label: 'Go to sign in' };

  function submit() {
    const input = form.validate();
    if (!input || !token) return;
    void run(async () => {
      const { error } = await authClient.resetPassword({ newPassword: input.password, token });
      if (error) return error.code === 'INVALID_TOKEN' ? 'This reset link is invalid or has expired. Ask for a new one.' : cleanError(error);
      setDone(true);
    });
  }


  if (linkError || !token) {
    return (
      <AuthFrame title="This link does not work" footer={<TextLink href={onward.href} label={onward.label} />}>
        <Banner
          tone="danger"
          title={linkError ? 'The reset link is invalid or has expired' : 'The reset link is incomplete'}
          message="Reset links work once and only for a limited time. Ask for a new one and use the newest e-mail."
          testID="reset-link-invalid"
        />
        <TextLink href="/forgot-password" label="Ask for a new link" testID="link-forgot-password" />
      </AuthFrame>
    );
  }

  if (done) {
    return (
      <AuthFrame title="Password changed" footer={<TextLink href={onward.href} label={onward.label} testID="reset-onward" />}>
        <Banner tone="ok" title="Your new password is set" message="Use it the next time you sign in." testID="reset-done" />
      </AuthFrame>
    );
  }

  return (
    <AuthFrame title="Choose a new password" footer={<TextLink href={onward.href} label={onward.label} />}>
      {failure ? <Banner tone="danger" title="Could not change the password" message={failure} testID="reset-error" /> : null}
      <TextField
        label="New password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        {...form.textField('password')}
        secureTextEntry
        autoComplete="new-password"
        testID="reset-password"
      />
      <TextField
        label="Repeat new password"
        {...form.textField('repeat')}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
        testID="reset-repeat"
      />
      <Button label="Set new password" onPress={submit} pending={pending} testID="reset-submit" fullWidth />
    </AuthFrame>
  );
}
