import { SetupScreen } from '@/components/setup/setup-screen';

export default function SetupRoute() {
  return <SetupScreen />;
}
