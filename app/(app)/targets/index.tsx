import { TargetsScreen } from '@/components/targets/targets-screen';

export default function TargetsRoute() {
  return <TargetsScreen />;
}
