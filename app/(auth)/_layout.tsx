import { Slot } from 'expo-router';

export const unstable_settings = { initialRouteName: 'sign-in' };

/** One signed-out screen at a time (a stack would keep hidden forms, with duplicate labels, mounted). */
export default function AuthLayout() {
  return <Slot />;
}
