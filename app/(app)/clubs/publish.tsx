import { useLocalSearchParams } from 'expo-router';

import { PublishScreen } from '@/components/templates/publish-screen';

/** "Publish to club…": from the composer (`recipeId`) or a club page (`clubId`). */
export default function PublishRoute() {
  const { recipeId, clubId } = useLocalSearchParams<{ recipeId?: string; clubId?: string }>();
  return <PublishScreen recipeId={recipeId ?? ''} clubId={clubId ?? ''} />;
}
