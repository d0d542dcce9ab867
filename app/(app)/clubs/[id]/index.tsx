import { useLocalSearchParams } from 'expo-router';

import { ClubScreen } from '@/components/clubs/club-screen';

export default function ClubRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ClubScreen clubId={id ?? ''} />;
}
