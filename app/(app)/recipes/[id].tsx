import { useLocalSearchParams } from 'expo-router';

import { ComposerScreen } from '@/components/recipes/composer-screen';

export default function RecipeComposerRoute() {
  const { id, select } = useLocalSearchParams<{ id: string; select?: string }>();
  // Keyed so moving between recipes starts a fresh composer (history, selection, autosave).
  // `select` opens the composer on one step (e.g. from a dry-run finding).
  return <ComposerScreen key={id} id={id ?? ''} select={select} />;
}
