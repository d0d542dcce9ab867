import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useHover } from '@/hooks/use-hover';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatElevation, formatLatitude, formatLongitude } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { Site } from '@/shared/schemas/site';

/** One site in the list: name, default badge, coordinates and zone; opens the edit page. */
export function SiteListItem({ site }: { site: Site }) {
  const styles = useThemedStyles(makeStyles);
  const { hovered, handlers } = useHover();
  return (
    <Link href={`/sites/${site.id}`} asChild>
      {/* Link's Slot merges styles as objects: pass a flat one, never an array. */}
      <Pressable
        accessibilityLabel={site.isDefault ? `${site.name}, default site` : site.name}
        testID={`site-item-${site.id}`}
        {...handlers}
        style={StyleSheet.flatten([styles.item, hovered && styles.itemHover])}
      >
        <View style={styles.top}>
          <AppText variant="lead" weight="semibold" numberOfLines={1} style={styles.name}>
            {site.name}
          </AppText>
          {site.isDefault ? (
            <View style={styles.badge} testID="site-default-badge">
              <AppText variant="caption" tone="accent" weight="semibold">
                Default
              </AppText>
            </View>
          ) : null}
        </View>
        <AppText tone="muted" tabular>
          {`${formatLatitude(site.latitudeDeg)}   ${formatLongitude(site.longitudeDeg)}   ${formatElevation(site.elevationM)}`}
        </AppText>
        <AppText variant="small" tone="faint">
          {`${site.timeZone} · imaging above ${site.minAltitudeDeg}° · ${site.horizon.length === 0 ? 'flat horizon' : `horizon of ${site.horizon.length} points`}`}
        </AppText>
      </Pressable>
    </Link>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: {
      backgroundColor: c.surface,
      borderColor: c.border,
      borderWidth: 1,
      borderRadius: radii.lg,
      padding: spacing.lg,
      gap: spacing.xs,
    },
    itemHover: { borderColor: c.borderStrong, backgroundColor: c.surfaceRaised },
    top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    name: { flexShrink: 1 },
    badge: {
      borderColor: c.accent,
      borderWidth: 1,
      borderRadius: radii.pill,
      paddingHorizontal: spacing.sm,
      paddingVertical: 1,
      backgroundColor: c.accentSoft,
    },
  });
