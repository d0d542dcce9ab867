import { SignUpScreen } from '@/components/auth/sign-up-screen';

export default function SignUpScreenRoute() {
  return <SignUpScreen />;
}
