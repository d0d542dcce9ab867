import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { templateChangeWords } from '@/components/templates/template-change-text';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useClubsQuery, canManageClub } from '@/hooks/use-clubs';
import { useTemplateDiffQuery, useTemplateOriginQuery, type TemplateVersionNote } from '@/hooks/use-templates';
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { spacing } from '@/constants/theme';

/** "Publish to club…" in the composer, shown to owners and admins of some club. */
export function PublishToClubButton({ recipeId, disabled }: { recipeId: string; disabled?: boolean }) {
  const clubs = useClubsQuery();
  if (!(clubs.data ?? []).some((c) => canManageClub(c.myRoles))) return null;
  return <Button label="Publish to club…" size="small" variant="secondary" disabled={disabled} onPress={() => router.push({ pathname: '/clubs/publish', params: { recipeId } })} testID="composer-publish" />;
}

const MAX_NOTES = 3;
const MAX_CHANGES = 30;

function VersionNotes({ notes }: { notes: TemplateVersionNote[] }) {
  const earlier = notes.length - MAX_NOTES;
  return (
    <View style={styles.block} testID="composer-template-changelog">
      {notes.slice(0, MAX_NOTES).map((v) => (
        <View key={v.version} style={styles.note} testID={`composer-template-changelog-${v.version}`}>
          <AppText variant="small" weight="semibold" tabular>{`Version ${v.version} · ${formatLogTime(v.createdAt)}`}</AppText>
          <AppText variant="small" numberOfLines={4}>
            {v.changelog}
          </AppText>
        </View>
      ))}
      {earlier > 0 ? <AppText variant="small" tone="muted">{`${earlier} earlier ${earlier === 1 ? 'version' : 'versions'}: see the template.`}</AppText> : null}
    </View>
  );
}

function Changes({ recipeId }: { recipeId: string }) {
  const diff = useTemplateDiffQuery(recipeId, true);
  if (diff.isPending) return <AppText variant="small" tone="muted">Comparing…</AppText>;
  if (diff.isError) return <AppText variant="small" tone="danger" role="alert">{`Could not compare: ${cleanError(diff.error)}`}</AppText>;
  const { changes } = diff.data;
  return (
    <View style={styles.block} role="list" testID="composer-template-changes">
      {changes.length === 0 ? <AppText variant="small" tone="muted">No differences in the steps.</AppText> : null}
      {changes.slice(0, MAX_CHANGES).map((c) => {
        const { lead, detail } = templateChangeWords(c);
        return (
          <AppText key={`${c.kind}-${c.path}`} variant="small" role="listitem">
            <AppText variant="small" weight="semibold">{`${lead}: `}</AppText>
            {detail}
          </AppText>
        );
      })}
      {changes.length > MAX_CHANGES ? <AppText variant="small" tone="muted">{`…and ${changes.length - MAX_CHANGES} more.`}</AppText> : null}
    </View>
  );
}

/** A recipe copied from a template whose club has published a newer version since: what the new versions say, and what changed. */
export function TemplateNewerNotice({ recipeId }: { recipeId: string }) {
  const origin = useTemplateOriginQuery(recipeId);
  const [comparing, setComparing] = useState(false);
  const o = origin.data;
  if (!o?.newer) return null;
  return (
    <Banner tone="info" title={`“${o.title}” has version ${o.latestVersion}`} message={`This recipe started from version ${o.version}. Your copy stays as it is.`} testID="composer-template-newer">
      {o.newerVersions.length > 0 ? <VersionNotes notes={o.newerVersions} /> : null}
      <Button label={comparing ? 'Hide changes' : 'Compare'} size="small" variant="secondary" onPress={() => setComparing((c) => !c)} testID="composer-template-compare" />
      <Button label="Open template" size="small" variant="ghost" testID="composer-template-open" onPress={() => router.push({ pathname: '/clubs/[id]/templates/[templateId]', params: { id: o.clubId, templateId: o.templateId } })} />
      {comparing ? <Changes recipeId={recipeId} /> : null}
    </Banner>
  );
}

const styles = StyleSheet.create({
  block: { width: '100%', gap: spacing.xs },
  note: { gap: spacing.xxs },
});
