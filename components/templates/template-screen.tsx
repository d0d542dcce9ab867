import { StyleSheet, View } from 'react-native';

import { TagList } from '@/components/templates/template-card';
import { TemplateAdmin } from '@/components/templates/template-admin';
import { TemplatePreview } from '@/components/templates/template-preview';
import { TemplateTree } from '@/components/templates/template-tree';
import { TemplateUseForm } from '@/components/templates/template-use-form';
import { AppText } from '@/components/ui/app-text';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { canManageClub, useClubQuery } from '@/hooks/use-clubs';
import { useTemplateQuery, type TemplateDetail } from '@/hooks/use-templates';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatLogTime } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';

function Versions({ template }: { template: TemplateDetail }) {
  const styles = useThemedStyles(makeStyles);
  const versions = [...template.versions].sort((a, b) => b.version - a.version);
  const mine = new Set(template.myUses.map((u) => u.version));
  return (
    <FormSection title="Versions" description={`Used ${template.useCount === 1 ? 'once' : `${template.useCount} times`} in all.`} testID="template-versions">
      {versions.map((v) => (
        <View key={v.version} style={styles.version} testID={`template-version-${v.version}`}>
          <AppText weight="semibold" tabular>{`Version ${v.version}`}</AppText>
          <AppText variant="small" tone="muted" tabular>{`${formatLogTime(v.createdAt)} · ${v.createdBy} · ${v.useCount === 1 ? '1 use' : `${v.useCount} uses`}${mine.has(v.version) ? ' · you started from this one' : ''}`}</AppText>
          <AppText variant="small">{v.changelog}</AppText>
        </View>
      ))}
    </FormSection>
  );
}

/** One template: what it is, its versions, its steps, a preview on my rig, and using it. */
export function TemplateScreen({ clubId, templateId }: { clubId: string; templateId: string }) {
  const template = useTemplateQuery(clubId, templateId);
  const club = useClubQuery(clubId);
  const back = <TextLink href={`/clubs/${clubId}`} label={`‹ ${club.data?.club.name ?? 'Club'}`} variant="small" testID="template-back" />;
  if (template.isPending) return <Screen above={back}><LoadingView label="Loading the template…" /></Screen>;
  if (template.isError) return <Screen above={back}><ErrorView error={template.error} onRetry={() => template.refetch()} retrying={template.isFetching} title="Could not load this template" /></Screen>;
  const t = template.data;
  const manage = canManageClub(club.data?.myRoles ?? []);
  return (
    <Screen title={t.title} subtitle={`Version ${t.latestVersion}${t.retired ? ' · retired' : ''}`} above={back} testID="template-screen">
      {t.description ? <AppText tone="muted">{t.description}</AppText> : null}
      <TagList tags={t.tags} />
      {t.bands.length > 0 ? <AppText variant="small" tone="muted">{`Filter bands: ${t.bands.join(', ')}`}</AppText> : null}
      <TemplateUseForm template={t} />
      <FormSection title="Steps" description="Filters are named by band; targets may be left for you to choose.">
        <TemplateTree tree={t.tree} />
      </FormSection>
      <TemplatePreview tree={t.tree} />
      <Versions template={t} />
      {manage ? <TemplateAdmin template={t} /> : null}
    </Screen>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    version: { gap: spacing.xxs, paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: c.border },
  });
