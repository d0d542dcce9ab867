import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import type { TemplateSummary } from '@/hooks/use-clubs';
import { slugOf } from '@/hooks/use-clubs';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

export function TagList({ tags }: { tags: string[] }) {
  const styles = useThemedStyles(makeStyles);
  if (tags.length === 0) return null;
  return (
    <View style={styles.tags}>
      {tags.map((t) => (
        <View key={t} style={styles.tag}>
          <AppText variant="caption" tone="muted">
            {t}
          </AppText>
        </View>
      ))}
    </View>
  );
}

/** One template in a club's list: title, tags, latest version, how often it was used. */
export function TemplateCard({ template }: { template: TemplateSummary }) {
  const styles = useThemedStyles(makeStyles);
  const uses = template.useCount === 1 ? '1 use' : `${template.useCount} uses`;
  return (
    <Link href={{ pathname: '/clubs/[id]/templates/[templateId]', params: { id: template.clubId, templateId: template.id } }} asChild>
      <Pressable role="link" accessibilityLabel={template.title} testID={`template-card-${slugOf(template.title)}`} style={({ hovered }: WebPressState) => [styles.card, hovered && styles.cardHover]}>
        <View style={styles.top}>
          <AppText weight="semibold" style={styles.title}>
            {template.title}
          </AppText>
          <AppText variant="small" tone="muted" tabular>{`v${template.latestVersion} · ${uses}`}</AppText>
        </View>
        {template.description ? (
          <AppText variant="small" tone="muted" numberOfLines={2}>
            {template.description}
          </AppText>
        ) : null}
        <TagList tags={template.tags} />
        {template.retired ? (
          <AppText variant="caption" tone="faint" testID="template-card-retired">
            Retired
          </AppText>
        ) : null}
      </Pressable>
    </Link>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { gap: spacing.sm, padding: spacing.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: c.border, backgroundColor: c.surface },
    cardHover: { borderColor: c.borderStrong },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.md },
    title: { flex: 1 },
    tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
    tag: { paddingHorizontal: spacing.sm, paddingVertical: 1, borderRadius: radii.pill, borderWidth: 1, borderColor: c.border },
  });
