import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { kindLabel } from '@/components/targets/kinds';
import { designationSlug, formatDarkMinutes, formatMagnitude, formatSizeArcmin } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { CatalogueSearchResult } from '@/shared/schemas/target';

type SearchResultItemProps = {
  result: CatalogueSearchResult;
  /** The id of the same object on the user's list, if it is there. */
  onListId: string | null;
  onAdd: () => void;
  pending: boolean;
  error?: string;
};

/** One search hit: designation, name, kind, size, brightness, dark time; add it or open it. */
export function SearchResultItem({ result, onListId, onAdd, pending, error }: SearchResultItemProps) {
  const styles = useThemedStyles(makeStyles);
  const slug = designationSlug(result.designation);
  const dark = formatDarkMinutes(result.darkMinutes);
  const facts = [kindLabel(result.type), formatSizeArcmin(result.majorArcmin, result.minorArcmin), formatMagnitude(result.magnitude)];
  return (
    <View style={styles.item} testID={`search-result-${slug}`}>
      <View style={styles.text}>
        <View style={styles.titleRow}>
          <AppText weight="semibold" tabular>
            {result.designation}
          </AppText>
          {result.name ? (
            <AppText tone="muted" numberOfLines={1} style={styles.name}>
              {result.name}
            </AppText>
          ) : null}
        </View>
        <AppText variant="small" tone="muted" tabular>
          {facts.join(' · ')}
        </AppText>
        {dark ? (
          <AppText variant="small" tone={result.darkMinutes ? 'accent' : 'faint'} tabular testID="search-result-dark">
            {dark}
          </AppText>
        ) : null}
        <AppText variant="caption" tone="faint">
          {result.source === 'builtin' ? 'Built-in list' : (result.catalogueName ?? 'Imported catalogue')}
        </AppText>
        {error ? (
          <AppText variant="small" tone="danger" role="alert">
            {error}
          </AppText>
        ) : null}
      </View>
      {onListId ? (
        <Button label="On my list ›" size="small" variant="ghost" onPress={() => router.push(`/targets/${onListId}`)} testID={`open-target-${slug}`} />
      ) : (
        <Button label="Add to my targets" size="small" variant="secondary" onPress={onAdd} pending={pending} testID={`add-target-${slug}`} />
      )}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: {
      flexDirection: 'row',
      alignItems: 'center',
      flexWrap: 'wrap',
      gap: spacing.md,
      padding: spacing.md,
      borderRadius: radii.md,
      borderWidth: 1,
      borderColor: c.border,
      backgroundColor: c.surface,
    },
    text: { flex: 1, minWidth: 180, gap: spacing.xxs },
    titleRow: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
    name: { flexShrink: 1 },
  });
