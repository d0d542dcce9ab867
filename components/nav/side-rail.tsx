import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { LogoMark } from '@/components/brand/logo-mark';
import { NavIcon } from '@/components/nav/nav-icons';
import { isActive, type NavItem } from '@/components/nav/nav-items';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useHover } from '@/hooks/use-hover';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, railWidth, spacing, type Palette } from '@/constants/theme';

type SideRailProps = { items: NavItem[]; userName: string | undefined };

function RailLink({ item, active }: { item: NavItem; active: boolean }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const { hovered, handlers } = useHover();
  return (
    <Link href={item.href} asChild>
      {/* Link's Slot merges styles as objects: pass a flat one, never an array. */}
      <Pressable
        testID={item.testID}
        accessibilityLabel={item.label}
        aria-current={active ? 'page' : undefined}
        accessibilityState={{ selected: active }}
        {...handlers}
        style={StyleSheet.flatten([styles.item, hovered && styles.itemHover, active && styles.itemActive])}
      >
        <NavIcon name={item.key} color={active ? palette.accent : palette.textMuted} />
        <AppText weight={active ? 'semibold' : 'regular'} tone={active ? 'default' : 'muted'}>
          {item.label}
        </AppText>
      </Pressable>
    </Link>
  );
}

/** Left navigation for wide screens, with the signed-in name at the foot. */
export function SideRail({ items, userName }: SideRailProps) {
  const styles = useThemedStyles(makeStyles);
  const pathname = usePathname();
  return (
    <View style={styles.rail} role="navigation" accessibilityLabel="Main">
      <View style={styles.brand}>
        <LogoMark size={30} />
        <AppText variant="lead" weight="bold">
          Nightloom
        </AppText>
      </View>
      <View style={styles.items}>
        {items.map((item) => (
          <RailLink key={item.key} item={item} active={isActive(item, pathname)} />
        ))}
      </View>
      <View style={styles.footer}>
        {userName ? (
          <AppText variant="small" tone="faint" numberOfLines={1} style={styles.user}>
            {userName}
          </AppText>
        ) : null}
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    rail: {
      width: railWidth,
      backgroundColor: c.surface,
      borderRightWidth: 1,
      borderRightColor: c.border,
      paddingVertical: spacing.xl,
      paddingHorizontal: spacing.md,
      gap: spacing.xl,
    },
    brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingHorizontal: spacing.sm },
    items: { gap: spacing.xs, flex: 1 },
    item: {
      flexDirection: 'row',
      alignItems: 'center',
      gap: spacing.md,
      paddingHorizontal: spacing.md,
      paddingVertical: spacing.sm + 2,
      borderRadius: radii.md,
    },
    itemHover: { backgroundColor: c.surfaceRaised },
    itemActive: { backgroundColor: c.accentSoft },
    footer: { gap: spacing.sm },
    user: { paddingHorizontal: spacing.md },
  });
