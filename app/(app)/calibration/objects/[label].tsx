import { useLocalSearchParams } from 'expo-router';

import { ObjectHistoryScreen } from '@/components/history/object-history-screen';

export default function ObjectHistoryRoute() {
  const { label } = useLocalSearchParams<{ label: string }>();
  return <ObjectHistoryScreen key={label} label={label ?? ''} />;
}
