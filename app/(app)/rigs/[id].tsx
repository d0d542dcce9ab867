import { useLocalSearchParams } from 'expo-router';

import { EditRigScreen } from '@/components/rigs/edit-rig-screen';

export default function EditRigRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // Keyed so moving between rigs starts a fresh editor.
  return <EditRigScreen key={id} id={id ?? ''} />;
}
