import { Pressable, ScrollView, StyleSheet } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { Site } from '@/shared/schemas/site';

type SitePickerProps = { sites: Site[]; selectedId: string; onSelect: (id: string) => void };

/** One chip per site, for users with several; scrolls sideways on phones. */
export function SitePicker({ sites, selectedId, onSelect }: SitePickerProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} role="radiogroup" accessibilityLabel="Site" testID="site-picker">
      {sites.map((site) => {
        const selected = site.id === selectedId;
        return (
          <Pressable
            key={site.id}
            role="radio"
            aria-checked={selected}
            accessibilityLabel={site.name}
            accessibilityState={{ selected }}
            onPress={() => onSelect(site.id)}
            style={({ hovered }: WebPressState) => [styles.chip, hovered && styles.chipHover, selected && styles.chipOn]}
          >
            <AppText variant="small" weight={selected ? 'semibold' : 'regular'} tone={selected ? 'accent' : 'muted'}>
              {site.name}
            </AppText>
          </Pressable>
        );
      })}
    </ScrollView>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { gap: spacing.sm, paddingVertical: spacing.xxs },
    chip: {
      paddingHorizontal: spacing.md,
      paddingVertical: spacing.xs + 2,
      borderRadius: radii.pill,
      borderWidth: 1,
      borderColor: c.borderStrong,
      backgroundColor: c.surface,
    },
    chipHover: { borderColor: c.textFaint },
    chipOn: { borderColor: c.accent, backgroundColor: c.accentSoft },
  });
