import { Composer } from '@/components/recipes/composer';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useRecipeQuery } from '@/hooks/use-recipes';
import { isApiError } from '@/lib/api';

/**
 * Opens a recipe in the composer. It starts from a copy fetched for this visit (never a cached
 * one), since the version it holds guards every save.
 */
export function ComposerScreen({ id, select }: { id: string; select?: string }) {
  const recipe = useRecipeQuery(id);
  if (recipe.isError) {
    const gone = isApiError(recipe.error, 404);
    return (
      <Screen above={<TextLink href="/recipes" label="‹ Recipes" variant="small" />}>
        <ErrorView error={recipe.error} title={gone ? 'This recipe is gone' : 'Could not open the recipe'} onRetry={gone ? undefined : () => recipe.refetch()} retrying={recipe.isFetching} />
      </Screen>
    );
  }
  if (!recipe.data || !recipe.isFetchedAfterMount) return <LoadingView label="Opening the recipe…" />;
  return <Composer recipe={recipe.data} initialSelect={select} />;
}
