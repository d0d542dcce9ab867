import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { NavIcon } from '@/components/nav/nav-icons';
import { isActive, type NavItem } from '@/components/nav/nav-items';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, tabBarHeight, type Palette } from '@/constants/theme';

/** Bottom navigation for narrow screens. */
export function TabBar({ items }: { items: NavItem[] }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.bar, { paddingBottom: insets.bottom }]} role="navigation" accessibilityLabel="Main">
      {items.map((item) => {
        const active = isActive(item, pathname);
        const color = active ? palette.accent : palette.textMuted;
        return (
          <Link key={item.key} href={item.href} asChild>
            <Pressable
              testID={item.testID}
              accessibilityLabel={item.label}
              aria-current={active ? 'page' : undefined}
              accessibilityState={{ selected: active }}
              style={styles.item}
            >
              <View style={[styles.indicator, active && styles.indicatorOn]} />
              <NavIcon name={item.key} color={color} />
              <AppText variant="caption" weight={active ? 'semibold' : 'regular'} style={{ color }}>
                {item.label}
              </AppText>
            </Pressable>
          </Link>
        );
      })}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    bar: {
      flexDirection: 'row',
      backgroundColor: c.surface,
      borderTopWidth: 1,
      borderTopColor: c.border,
    },
    item: {
      flex: 1,
      height: tabBarHeight,
      alignItems: 'center',
      justifyContent: 'center',
      gap: spacing.xxs,
    },
    indicator: { position: 'absolute', top: 0, width: 28, height: 2, borderRadius: 1, backgroundColor: 'transparent' },
    indicatorOn: { backgroundColor: c.accent },
  });
