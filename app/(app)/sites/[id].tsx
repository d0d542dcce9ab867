import { useLocalSearchParams } from 'expo-router';

import { EditSiteScreen } from '@/components/sites/edit-site-screen';

export default function EditSiteRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // Keyed so moving between sites starts a fresh editor.
  return <EditSiteScreen key={id} id={id ?? ''} />;
}
