import { router } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { TemplateCard } from '@/components/templates/template-card';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { TextField } from '@/components/ui/text-field';
import { SUGGESTED_TAGS, useTemplatesQuery } from '@/hooks/use-templates';
import { spacing } from '@/constants/theme';

function useSettled(value: string, ms = 250): string {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

/** The club's templates: search, tag chips, cards; owners and admins publish and may list retired ones too. */
export function ClubTemplatesSection({ clubId, canManage, knownTags }: { clubId: string; canManage: boolean; knownTags: string[] }) {
  const [q, setQ] = useState('');
  const [tag, setTag] = useState('');
  const [showRetired, setShowRetired] = useState(false);
  const settledQ = useSettled(q);
  const templates = useTemplatesQuery(clubId, settledQ, tag, canManage && showRetired);
  const tags = [...new Set([...SUGGESTED_TAGS, ...knownTags])];
  const publish = canManage ? <Button label="Publish a recipe" size="small" onPress={() => router.push({ pathname: '/clubs/publish', params: { clubId } })} testID="club-publish" /> : null;
  return (
    <FormSection title="Templates" description="Recipes shared in this club. Use one to get your own copy on your rig." actions={publish} testID="club-templates">
      <TextField label="Search templates" placeholder="Title or description" value={q} onChangeText={setQ} role="searchbox" autoCapitalize="none" testID="club-templates-search" />
      <View style={styles.chips} role="radiogroup" accessibilityLabel="Tag">
        <Chip label="All" selected={tag === ''} onPress={() => setTag('')} testID="club-tag-all" />
        {tags.map((t) => (
          <Chip key={t} label={t} selected={tag === t} onPress={() => setTag(tag === t ? '' : t)} testID={`club-tag-${t.replace(/\s+/g, '-')}`} />
        ))}
      </View>
      {canManage ? (
        <View style={styles.chips}>
          <Chip label="Show retired" role="checkbox" selected={showRetired} onPress={() => setShowRetired((v) => !v)} testID="club-templates-show-retired" />
        </View>
      ) : null}
      {templates.isPending ? (
        <LoadingView label="Loading templates…" />
      ) : templates.isError ? (
        <ErrorView error={templates.error} onRetry={() => templates.refetch()} retrying={templates.isFetching} title="Could not load the templates" />
      ) : templates.data.length === 0 ? (
        <AppText tone="muted">{q || tag ? 'No template matches.' : 'No templates yet.'}</AppText>
      ) : (
        <View style={styles.list}>
          {templates.data.map((t) => (
            <TemplateCard key={t.id} template={t} />
          ))}
        </View>
      )}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  list: { gap: spacing.sm },
});
