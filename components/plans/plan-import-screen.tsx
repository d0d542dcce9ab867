import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';

import { codeFont, PlanErrors } from '@/components/plans/plan-errors';
import { PlanPreviewCard } from '@/components/plans/plan-preview-card';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FilePicker } from '@/components/ui/file-picker';
import { FormSection } from '@/components/ui/form-section';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useTheme } from '@/components/theme-provider';
import { planIssuesOf, usePlanImportMutation, usePlanPreviewMutation } from '@/hooks/use-plans';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { readFileText } from '@/lib/files';
import { radii, spacing, type Palette } from '@/constants/theme';

/**
 * Import a YAML plan: paste it or pick a .yaml file → the server checks it against the account
 * (preview; nothing stored) → the user chooses whether a missing site and rig are added →
 * Confirm stores everything in one transaction and opens the new recipe.
 */
export function PlanImportScreen() {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const [text, setText] = useState('');
  const [checkedText, setCheckedText] = useState('');
  const [fileError, setFileError] = useState<string | null>(null);
  const [createSite, setCreateSite] = useState(true);
  const [createRig, setCreateRig] = useState(true);
  const preview = usePlanPreviewMutation();
  const store = usePlanImportMutation();

  const check = (value: string) => {
    setCheckedText(value);
    store.reset();
    preview.mutate(value);
  };
  const edit = (value: string) => {
    setText(value);
    if (preview.data || preview.error) preview.reset();
  };
  const pick = async (file: File) => {
    setFileError(null);
    try {
      const content = await readFileText(file);
      setText(content);
      check(content);
    } catch (err) {
      setFileError(cleanError(err));
    }
  };
  const confirm = () =>
    store.mutate({ text: checkedText, createSite, createRig }, { onSuccess: (result) => router.replace(`/recipes/${result.recipe.id}`) });

  const issues = planIssuesOf(preview.error ?? store.error);
  const otherError = (preview.error && issues.length === 0 ? preview.error : null) ?? (store.error && issues.length === 0 ? store.error : null);
  return (
    <Screen title="Import a plan" subtitle="A Nightloom plan (format nightloom.plan/1) from a club member, a script or another account." width="form" above={<TextLink href="/recipes" label="‹ Recipes" variant="small" testID="back-to-recipes" />}>
      <FormSection title="1 · The plan" description="Paste the YAML, or choose a .yaml file. Nothing is stored until you confirm.">
        <AppText variant="small" weight="semibold" tone="muted">
          Plan (YAML)
        </AppText>
        <TextInput
          value={text}
          onChangeText={edit}
          multiline
          accessibilityLabel="Plan (YAML)"
          placeholder={'format: nightloom.plan/1\nmeta:\n  title: …'}
          placeholderTextColor={palette.textFaint}
          autoCapitalize="none"
          autoCorrect={false}
          spellCheck={false}
          style={styles.text}
          testID="plan-import-text"
        />
        <View style={styles.row}>
          <Button label="Preview" onPress={() => check(text)} disabled={text.trim() === ''} pending={preview.isPending} testID="plan-import-preview" />
          <FilePicker label="Choose .yaml file…" accept=".yaml,.yml,text/yaml,application/yaml" onFiles={([f]) => f && void pick(f)} disabled={preview.isPending} testID="plan-import-file" />
        </View>
        {fileError ? <Banner tone="danger" title="Could not read that file" message={fileError} /> : null}
      </FormSection>
      {issues.length > 0 ? <PlanErrors issues={issues} text={checkedText} /> : null}
      {otherError ? <Banner tone="danger" title="The plan could not be checked" message={cleanError(otherError)} testID="plan-import-failed" /> : null}
      {preview.data && !preview.error ? (
        <PlanPreviewCard preview={preview.data} createSite={createSite} createRig={createRig} onCreateSite={setCreateSite} onCreateRig={setCreateRig} onConfirm={confirm} pending={store.isPending} />
      ) : null}
    </Screen>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    text: {
      minHeight: 220,
      maxHeight: 420,
      borderWidth: 1,
      borderColor: c.borderStrong,
      borderRadius: radii.md,
      backgroundColor: c.background,
      color: c.text,
      padding: spacing.md,
      fontFamily: codeFont,
      fontSize: 13,
      lineHeight: 18,
      textAlignVertical: 'top',
    },
    row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  });
