import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { RecipeSourcePicker, type StartKind } from '@/components/recipes/recipe-source-picker';
import { Sheet } from '@/components/recipes/sheet';
import { Chip } from '@/components/ui/chip';
import { designationSlug } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useCreateRecipeMutation, useRecipesQuery } from '@/hooks/use-recipes';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useSitesQuery } from '@/hooks/use-sites';
import { useTargetsQuery } from '@/hooks/use-targets';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { RecipeCreate } from '@/shared/schemas/recipe-api';

const MAX_STARTER_TARGETS = 20;

type Form = { kind: StartKind; name: string; rigId: string; siteId: string; targetIds: string[]; copyId: string };

function toRequest(form: Form): RecipeCreate {
  const start: RecipeCreate['start'] =
    form.kind === 'starter' ? { kind: 'starter', targetIds: form.targetIds } : form.kind === 'copy' ? { kind: 'copy', recipeId: form.copyId } : { kind: 'empty' };
  return { name: form.name.trim() || undefined, rigId: form.rigId || null, siteId: form.siteId || null, start };
}

function TargetChips({ form, toggle }: { form: Form; toggle: (id: string) => void }) {
  const targets = useTargetsQuery();
  if (targets.isPending) return <AppText tone="faint">Loading your targets…</AppText>;
  if (!targets.data?.length) return <AppText tone="muted">No targets yet: the starter gets one stage to fill in later.</AppText>;
  return (
    <View style={styles.chips} role="group" accessibilityLabel="Targets">
      {targets.data.map((t) => (
        <Chip key={t.id} role="checkbox" label={t.designation} selected={form.targetIds.includes(t.id)} onPress={() => toggle(t.id)} disabled={!form.targetIds.includes(t.id) && form.targetIds.length >= MAX_STARTER_TARGETS} testID={`recipe-new-target-${designationSlug(t.designation)}`} />
      ))}
    </View>
  );
}

function CopyChoices({ form, pick }: { form: Form; pick: (id: string) => void }) {
  const recipes = useRecipesQuery({ q: '', sort: 'updated' });
  if (recipes.isPending) return <AppText tone="faint">Loading your recipes…</AppText>;
  if (!recipes.data?.length) return <AppText tone="muted">There is no recipe to copy yet.</AppText>;
  return (
    <View style={styles.chips} role="radiogroup" accessibilityLabel="Recipe to copy">
      {recipes.data.map((r) => (
        <Chip key={r.id} label={r.name} selected={form.copyId === r.id} onPress={() => pick(r.id)} testID={`recipe-new-copy-${r.id}`} />
      ))}
    </View>
  );
}

/** "New recipe": start empty, from the built-in starter for chosen targets, or as a copy; opens the composer. */
export function NewRecipeSheet({ open, onClose }: { open: boolean; onClose: () => void }) {
  const rigs = useRigsQuery();
  const sites = useSitesQuery();
  const create = useCreateRecipeMutation();
  const [form, setForm] = useState<Form>({ kind: 'empty', name: '', rigId: '', siteId: '', targetIds: [], copyId: '' });
  const update = (patch: Partial<Form>) => setForm((f) => ({ ...f, ...patch }));
  const defaultSite = sites.data?.find((s) => s.isDefault);
  const siteId = form.siteId || defaultSite?.id || '';
  const rigId = form.rigId || (rigs.data?.length === 1 ? rigs.data[0]!.id : '');
  const blocked = form.kind === 'copy' && !form.copyId;

  const submit = () =>
    create.mutate(toRequest({ ...form, rigId, siteId }), {
      onSuccess: (recipe) => {
        onClose();
        router.push(`/recipes/${recipe.id}`);
      },
    });
  const footer = (
    <>
      <Button label="Cancel" variant="ghost" onPress={onClose} />
      <Button label="Create and open" onPress={submit} pending={create.isPending} disabled={blocked} testID="recipe-new-create" />
    </>
  );
  return (
    <Sheet open={open} onClose={onClose} title="New recipe" footer={footer} testID="recipe-new-sheet">
      <RecipeSourcePicker value={form.kind} onChange={(kind) => update({ kind })} />
      {form.kind === 'starter' ? <TargetChips form={form} toggle={(id) => update({ targetIds: form.targetIds.includes(id) ? form.targetIds.filter((t) => t !== id) : [...form.targetIds, id] })} /> : null}
      {form.kind === 'copy' ? <CopyChoices form={form} pick={(copyId) => update({ copyId })} /> : null}
      <TextField label="Name" placeholder={form.kind === 'copy' ? 'Copy of …' : form.kind === 'starter' ? 'Starter: the chosen targets' : 'New recipe'} value={form.name} onChangeText={(name) => update({ name })} maxLength={80} testID="recipe-new-name" />
      <SelectField label="Rig" value={rigId} onChange={(v) => update({ rigId: v })} choices={[{ value: '', label: 'No rig yet' }, ...(rigs.data ?? []).map((r) => ({ value: r.id, label: r.name }))]} testID="recipe-new-rig" />
      <SelectField label="Site" value={siteId} onChange={(v) => update({ siteId: v })} choices={[{ value: '', label: 'No site yet' }, ...(sites.data ?? []).map((s) => ({ value: s.id, label: s.name }))]} testID="recipe-new-site" />
      {create.isError ? <Banner tone="danger" title="Could not create the recipe" message={cleanError(create.error)} /> : null}
    </Sheet>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
