import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { RecipePicker } from '@/components/templates/recipe-picker';
import { TagPicker } from '@/components/templates/tag-picker';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { canManageClub, useClubsQuery } from '@/hooks/use-clubs';
import { usePublishTemplateMutation } from '@/hooks/use-templates';
import { cleanError } from '@/lib/clean-error';
import { CHANGELOG_MAX_CHARS, TEMPLATE_DESCRIPTION_MAX_CHARS, TEMPLATE_TITLE_MAX_CHARS } from '@/shared/schemas/club-api';
import { spacing } from '@/constants/theme';

type Draft = { clubId: string; recipeId: string; title: string; description: string; tags: string[]; changelog: string };

function errorsOf(d: Draft): Partial<Record<keyof Draft, string>> {
  return {
    clubId: d.clubId ? undefined : 'Choose a club',
    recipeId: d.recipeId ? undefined : 'Choose a recipe',
    title: d.title.trim().length >= 2 ? undefined : 'Give the template a title',
    changelog: d.changelog.trim() ? undefined : 'Say what this version is',
  };
}

/** Publish one of my recipes to a club as a template (owners and admins). */
export function PublishScreen({ recipeId, clubId }: { recipeId: string; clubId: string }) {
  const clubs = useClubsQuery();
  const [draft, setDraft] = useState<Draft>({ clubId, recipeId, title: '', description: '', tags: [], changelog: 'First version' });
  const [touched, setTouched] = useState(false);
  const publish = usePublishTemplateMutation(draft.clubId);
  const set = (patch: Partial<Draft>) => setDraft((d) => ({ ...d, ...patch }));
  const errors = touched ? errorsOf(draft) : {};
  const fields = publish.error && 'fields' in publish.error ? (publish.error.fields as Record<string, string[]> | undefined) : undefined;
  const clubChoices = [{ value: '', label: 'Choose a club' }, ...(clubs.data ?? []).filter((c) => canManageClub(c.myRoles)).map((c) => ({ value: c.id, label: c.name }))];

  function submit() {
    setTouched(true);
    if (Object.values(errorsOf(draft)).some(Boolean)) return;
    const { clubId: club, ...body } = draft;
    publish.mutate(
      { ...body, title: body.title.trim(), description: body.description.trim(), changelog: body.changelog.trim() },
      { onSuccess: (t) => router.replace({ pathname: '/clubs/[id]/templates/[templateId]', params: { id: club, templateId: t.id } }) },
    );
  }

  const back = clubId ? <TextLink href={`/clubs/${clubId}`} label="‹ Club" variant="small" /> : recipeId ? <TextLink href={`/recipes/${recipeId}`} label="‹ Recipe" variant="small" /> : null;
  return (
    <Screen title="Publish to club" subtitle="A snapshot of the recipe: filters by band, no rig-specific numbers. Later edits to your recipe do not change it." above={back} width="form" testID="publish-screen">
      <Card>
        {publish.error ? <Banner tone="danger" title="Could not publish" message={cleanError(publish.error)} /> : null}
        <SelectField label="Club" value={draft.clubId} onChange={(v) => set({ clubId: v })} choices={clubChoices} error={errors.clubId} testID="publish-club" />
        <RecipePicker value={draft.recipeId} onChange={(v) => set({ recipeId: v })} error={errors.recipeId} testID="publish-recipe" />
        <TextField label="Title" value={draft.title} onChangeText={(v) => set({ title: v })} error={errors.title ?? fields?.title?.[0]} maxLength={TEMPLATE_TITLE_MAX_CHARS} testID="publish-title" />
        <TextField label="Description" value={draft.description} onChangeText={(v) => set({ description: v })} multiline numberOfLines={3} maxLength={TEMPLATE_DESCRIPTION_MAX_CHARS} testID="publish-description" />
        <TagPicker tags={draft.tags} onChange={(tags) => set({ tags })} />
        <TextField
          label="Changelog"
          value={draft.changelog}
          onChangeText={(v) => set({ changelog: v })}
          error={errors.changelog ?? fields?.changelog?.[0]}
          hint={`What this version is, up to ${CHANGELOG_MAX_CHARS} characters.`}
          multiline
          numberOfLines={3}
          maxLength={CHANGELOG_MAX_CHARS}
          testID="publish-changelog"
        />
        <View style={styles.actions}>
          <Button label="Publish" onPress={submit} pending={publish.isPending} testID="publish-submit" />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: spacing.sm } });
