import { useLocalSearchParams } from 'expo-router';

import { InvitationScreen } from '@/components/clubs/invitation-screen';

/** Outside both guarded groups: the e-mailed link must work signed in or out. */
export default function InvitationRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <InvitationScreen invitationId={id ?? ''} />;
}
