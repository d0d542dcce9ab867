import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { RecipePicker } from '@/components/templates/recipe-picker';
import { TagPicker } from '@/components/templates/tag-picker';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { TextField } from '@/components/ui/text-field';
import { useTemplateAdminMutations, type TemplateDetail } from '@/hooks/use-templates';
import { cleanError } from '@/lib/clean-error';
import { CHANGELOG_MAX_CHARS, TEMPLATE_DESCRIPTION_MAX_CHARS, TEMPLATE_TITLE_MAX_CHARS } from '@/shared/schemas/club-api';
import { spacing } from '@/constants/theme';

type Admin = ReturnType<typeof useTemplateAdminMutations>;

function NewVersionForm({ admin }: { admin: Admin }) {
  const [recipeId, setRecipeId] = useState('');
  const [changelog, setChangelog] = useState('');
  const [done, setDone] = useState(false);
  const ready = recipeId && changelog.trim();
  const submit = () => ready && admin.newVersion.mutate({ recipeId, changelog: changelog.trim() }, { onSuccess: () => (setDone(true), setChangelog('')) });
  return (
    <View style={styles.block}>
      <AppText weight="semibold">New version from one of my recipes</AppText>
      {admin.newVersion.error ? <Banner tone="danger" title="Could not publish the version" message={cleanError(admin.newVersion.error)} /> : null}
      {done && !admin.newVersion.error ? <Banner tone="ok" title="Version published" message="Members who used this template are told by e-mail unless they opted out." testID="template-version-published" /> : null}
      <RecipePicker value={recipeId} onChange={setRecipeId} testID="template-version-recipe" />
      <TextField label="Changelog" value={changelog} onChangeText={setChangelog} hint={`What this version changes, up to ${CHANGELOG_MAX_CHARS} characters.`} multiline numberOfLines={3} maxLength={CHANGELOG_MAX_CHARS} testID="template-version-changelog" />
      <View style={styles.row}>
        <Button label="Publish new version" onPress={submit} disabled={!ready} pending={admin.newVersion.isPending} testID="template-new-version" />
      </View>
    </View>
  );
}

function EditForm({ template, admin }: { template: TemplateDetail; admin: Admin }) {
  const [title, setTitle] = useState(template.title);
  const [description, setDescription] = useState(template.description);
  const [tags, setTags] = useState(template.tags);
  const submit = () => title.trim().length >= 2 && admin.edit.mutate({ title: title.trim(), description: description.trim(), tags });
  return (
    <View style={styles.block}>
      <AppText weight="semibold">Title, description and tags</AppText>
      {admin.edit.error ? <Banner tone="danger" title="Could not save" message={cleanError(admin.edit.error)} /> : null}
      <TextField label="Title" value={title} onChangeText={setTitle} maxLength={TEMPLATE_TITLE_MAX_CHARS} testID="template-edit-title" />
      <TextField label="Description" value={description} onChangeText={setDescription} multiline numberOfLines={3} maxLength={TEMPLATE_DESCRIPTION_MAX_CHARS} testID="template-edit-description" />
      <TagPicker tags={tags} onChange={setTags} />
      <View style={styles.row}>
        <Button label="Save" variant="secondary" onPress={submit} pending={admin.edit.isPending} testID="template-edit-save" />
      </View>
    </View>
  );
}

/** Owners and admins: new versions, metadata, retiring. */
export function TemplateAdmin({ template }: { template: TemplateDetail }) {
  const admin = useTemplateAdminMutations(template.clubId, template.id);
  const [confirmRetire, setConfirmRetire] = useState(false);
  return (
    <FormSection title="Manage this template" testID="template-admin">
      <NewVersionForm admin={admin} />
      <EditForm template={template} admin={admin} />
      <View style={styles.block}>
        {admin.retire.error ? <Banner tone="danger" title="Could not retire" message={cleanError(admin.retire.error)} /> : null}
        {template.retired ? (
          <AppText tone="muted" testID="template-retired">Retired: members can no longer use it; their copies stay.</AppText>
        ) : confirmRetire ? (
          <View style={styles.row}>
            <Button label="Retire it" variant="danger" size="small" onPress={() => admin.retire.mutate()} pending={admin.retire.isPending} testID="template-retire-confirm" />
            <Button label="Keep it" variant="ghost" size="small" onPress={() => setConfirmRetire(false)} />
          </View>
        ) : (
          <View style={styles.row}>
            <Button label="Retire template" variant="secondary" size="small" onPress={() => setConfirmRetire(true)} testID="template-retire" />
          </View>
        )}
      </View>
    </FormSection>
  );
}

const styles = StyleSheet.create({
  block: { gap: spacing.md },
  row: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap' },
});
