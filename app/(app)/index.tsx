import { TonightScreen } from '@/components/tonight/tonight-screen';

export default function TonightRoute() {
  return <TonightScreen />;
}
