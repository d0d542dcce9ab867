import { router } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { NewRecipeSheet } from '@/components/recipes/new-recipe-sheet';
import { RecipeList } from '@/components/recipes/recipe-list';
import { Snackbar } from '@/components/recipes/snackbar';
import { useRecipeDeletion } from '@/components/recipes/use-recipe-deletion';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useRecipesQuery, type RecipeSort } from '@/hooks/use-recipes';
import { spacing } from '@/constants/theme';

const SORTS: { value: RecipeSort; label: string }[] = [
  { value: 'updated', label: 'Last changed' },
  { value: 'name', label: 'Name' },
  { value: 'exposure', label: 'Most exposure' },
];

/** The search text, passed on once typing pauses. */
function useSettled(value: string, ms = 250): string {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

type Deletion = ReturnType<typeof useRecipeDeletion>;

function Results({ q, sort, onNew, deletion }: { q: string; sort: RecipeSort; onNew: () => void; deletion: Deletion }) {
  const recipes = useRecipesQuery({ q, sort });
  if (recipes.isPending) return <LoadingView label="Loading your recipes…" />;
  if (recipes.isError) return <ErrorView error={recipes.error} onRetry={() => recipes.refetch()} retrying={recipes.isFetching} title="Could not load your recipes" />;
  const empty = recipes.data.length === 0;
  return (
    <>
      {deletion.error ? <Banner tone="danger" title="That did not work" message={deletion.error} /> : null}
      {empty && !q ? (
        <EmptyState testID="recipes-empty" title="No recipes yet" message="A recipe is the night's plan as a tree of steps: cool, point, capture, calibrate, park." action={<Button label="New recipe" onPress={onNew} />} />
      ) : empty ? (
        <AppText tone="muted">{`No recipe name contains “${q}”.`}</AppText>
      ) : (
        <RecipeList recipes={recipes.data} onDelete={(item) => deletion.deleteRecipe({ id: item.id, name: item.name })} deletingId={deletion.deleting ?? null} />
      )}
    </>
  );
}

/** Recipes: search, sort, the list, and "New recipe". */
export function RecipesScreen() {
  const { isTablet } = useBreakpoints();
  const [q, setQ] = useState('');
  const [sort, setSort] = useState<RecipeSort>('updated');
  const [newOpen, setNewOpen] = useState(false);
  const settledQ = useSettled(q);
  const deletion = useRecipeDeletion();
  const newButton = (
    <View style={styles.headerActions}>
      <Button label="Import plan" size="small" variant="secondary" onPress={() => router.push('/recipes/import')} testID="recipes-import" />
      <Button label="New recipe" size="small" onPress={() => setNewOpen(true)} testID="recipes-new" />
    </View>
  );
  return (
    <View style={styles.fill}>
      <Screen title="Recipes" subtitle={isTablet ? 'Night plans as trees of steps, saved as you compose.' : undefined} actions={newButton} testID="recipes-screen">
        <View style={styles.filters}>
          <View style={styles.search}>
            <TextField label="Search" placeholder="Recipe name" value={q} onChangeText={setQ} autoCapitalize="none" autoCorrect={false} role="searchbox" testID="recipes-search" />
          </View>
          <View style={isTablet ? styles.sortWide : styles.sortPhone}>
            <SelectField label="Sort by" value={sort} onChange={setSort} choices={SORTS} testID="recipes-sort" />
          </View>
        </View>
        <Results q={settledQ} sort={sort} onNew={() => setNewOpen(true)} deletion={deletion} />
      </Screen>
      {deletion.deleted ? (
        <Snackbar
          message={`Deleted “${deletion.deleted.name}”`}
          actionLabel="Undo"
          onAction={deletion.undoDelete}
          actionPending={deletion.restoring}
          onDismiss={deletion.dismiss}
          testID="recipe-deleted"
          actionTestID="recipe-deleted-undo"
        />
      ) : null}
      {newOpen ? <NewRecipeSheet open onClose={() => setNewOpen(false)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  filters: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.md },
  search: { flex: 1 },
  sortWide: { width: 220 },
  sortPhone: { width: 150 },
  headerActions: { flexDirection: 'row', gap: spacing.sm },
});
