import { useLocalSearchParams } from 'expo-router';

import { DryRunScreen } from '@/components/dry-run/dry-run-screen';

export default function RecipeDryRunRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // Keyed so another recipe starts with a fresh screen (its scan, its selection).
  return <DryRunScreen key={id} id={id ?? ''} />;
}
