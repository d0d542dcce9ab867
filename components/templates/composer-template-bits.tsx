import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useClubsQuery, canManageClub } from '@/hooks/use-clubs';
import { useTemplateDiffQuery, useTemplateOriginQuery } from '@/hooks/use-templates';
import { spacing } from '@/constants/theme';

/** "Publish to club…" in the composer, shown to owners and admins of some club. */
export function PublishToClubButton({ recipeId, disabled }: { recipeId: string; disabled?: boolean }) {
  const clubs = useClubsQuery();
  if (!(clubs.data ?? []).some((c) => canManageClub(c.myRoles))) return null;
  return <Button label="Publish to club…" size="small" variant="secondary" disabled={disabled} onPress={() => router.push({ pathname: '/clubs/publish', params: { recipeId } })} testID="composer-publish" />;
}

const show = (v: unknown) => (v === undefined ? '—' : typeof v === 'string' ? v : JSON.stringify(v));

/** A recipe copied from a template whose club has published a newer version since. */
export function TemplateNewerNotice({ recipeId }: { recipeId: string }) {
  const origin = useTemplateOriginQuery(recipeId);
  const [comparing, setComparing] = useState(false);
  const diff = useTemplateDiffQuery(recipeId, comparing);
  const o = origin.data;
  if (!o?.newer) return null;
  return (
    <Banner tone="info" title={`“${o.title}” has version ${o.latestVersion}`} message={`This recipe started from version ${o.version}.`} testID="composer-template-newer">
      <Button label={comparing ? 'Hide changes' : 'Compare'} size="small" variant="secondary" onPress={() => setComparing((c) => !c)} testID="composer-template-compare" />
      <Button label="Open template" size="small" variant="ghost" testID="composer-template-open" onPress={() => router.push({ pathname: '/clubs/[id]/templates/[templateId]', params: { id: o.clubId, templateId: o.templateId } })} />
      {comparing && diff.data ? (
        <View style={styles.changes} testID="composer-template-changes">
          {diff.data.changes.length === 0 ? <AppText variant="small" tone="muted">No differences in the steps.</AppText> : null}
          {diff.data.changes.slice(0, 30).map((c) => (
            <AppText key={`${c.kind}-${c.path}`} variant="small" tabular>{`${c.kind} ${c.path}: ${show(c.before)} → ${show(c.after)}`}</AppText>
          ))}
        </View>
      ) : null}
    </Banner>
  );
}

const styles = StyleSheet.create({ changes: { width: '100%', gap: spacing.xxs } });
