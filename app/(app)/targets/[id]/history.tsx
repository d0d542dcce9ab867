import { useLocalSearchParams } from 'expo-router';

import { TargetHistoryScreen } from '@/components/history/target-history-screen';

export default function TargetHistoryRoute() {
  const { id, from } = useLocalSearchParams<{ id: string; from?: string }>();
  // Keyed so another target starts with a fresh choice of framing and angle.
  return <TargetHistoryScreen key={id} targetId={id ?? ''} from={from === 'calibration' ? 'calibration' : 'target'} />;
}
