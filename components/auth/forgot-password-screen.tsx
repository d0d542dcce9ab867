import { useState } from 'react';
import { z } from 'zod';

import { AuthFrame } from '@/components/auth/auth-frame';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { useAuthAction } from '@/hooks/use-auth-action';
import { useZodForm } from '@/hooks/use-zod-form';
import { authClient, resetPasswordRedirectUrl } from '@/lib/auth-client';
import { cleanError } from '@/lib/clean-error';

const forgotSchema = z.object({ email: z.email('Enter the e-mail address of your account') });

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export function ForgotPasswordScreen() {
  const form = useZodForm({ schema: forgotSchema, initial: { email: '' } });
  const { pending, failure, run } = useAuthAction();
  const [sentTo, setSentTo] = useState<string | null>(null);

  function submit() {
    const input = form.validate();
    if (!input) return;
    void run(async () => {
      const email = input.email.trim();
      const { error } = await authClient.requestPasswordReset({ email, redirectTo: resetPasswordRedirectUrl() });
      if (error) return cleanError(error);
      setSentTo(email);
    });
  }


  return (
    <AuthFrame
      title="Reset your password"
      subtitle="We will e-mail you a link to choose a new one."
      footer={<TextLink href="/sign-in" label="Back to sign in" testID="link-sign-in" />}
    >
      {sentTo ? (
        <Banner
          tone="ok"
          title="Check your mail"
          message={`If ${sentTo} belongs to an account, a reset link is on its way. It works once and expires after a while.`}
          testID="reset-requested"
        />
      ) : null}
      {failure ? <Banner tone="danger" title="Could not send the link" message={failure} /> : null}
      <TextField
        label="Email"
        {...form.textField('email')}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="forgot-email"
      />
      <Button label="Send reset link" onPress={submit} pending={pending} testID="forgot-submit" fullWidth />
    </AuthFrame>
  );
}
