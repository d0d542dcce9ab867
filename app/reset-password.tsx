import { ResetPasswordScreen } from '@/components/auth/reset-password-screen';

/** Outside both guarded groups: the e-mailed link must work signed in or out. */
export default function ResetPasswordRoute() {
  return <ResetPasswordScreen />;
}
