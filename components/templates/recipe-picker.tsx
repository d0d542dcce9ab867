import { SelectField } from '@/components/ui/select-field';
import { useRecipesQuery } from '@/hooks/use-recipes';

/** One of my recipes, by name. */
export function RecipePicker({ value, onChange, error, testID }: { value: string; onChange: (id: string) => void; error?: string; testID?: string }) {
  const recipes = useRecipesQuery({ q: '', sort: 'updated' });
  const choices = [{ value: '', label: recipes.isPending ? 'Loading recipes…' : 'Choose a recipe' }, ...(recipes.data ?? []).map((r) => ({ value: r.id, label: r.name }))];
  return <SelectField label="Recipe" value={value} onChange={onChange} choices={choices} error={error} testID={testID} />;
}
