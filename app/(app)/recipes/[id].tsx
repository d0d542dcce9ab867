import { useLocalSearchParams } from 'expo-router';

import { ComposerScreen } from '@/components/recipes/composer-screen';

export default function RecipeComposerRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // Keyed so moving between recipes starts a fresh composer (history, selection, autosave).
  return <ComposerScreen key={id} id={id ?? ''} />;
}
