import { useLocalSearchParams } from 'expo-router';

import { TargetDetailScreen } from '@/components/targets/target-detail-screen';

export default function TargetRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // Keyed so moving between targets starts fresh editors.
  return <TargetDetailScreen key={id} id={id ?? ''} />;
}
