import { Link, usePathname } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { MoreSheet } from '@/components/nav/more-sheet';
import { NavIcon, type NavIconName } from '@/components/nav/nav-icons';
import { isActive, splitTabs, type NavItem } from '@/components/nav/nav-items';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, tabBarHeight, type Palette } from '@/constants/theme';

type TabFaceProps = { icon: NavIconName; label: string; active: boolean };

/** Icon, caption and the accent bar above an active tab. */
function TabFace({ icon, label, active }: TabFaceProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const color = active ? palette.accent : palette.textMuted;
  return (
    <>
      <View style={[styles.indicator, active && styles.indicatorOn]} />
      <NavIcon name={icon} color={color} />
      <AppText variant="caption" weight={active ? 'semibold' : 'regular'} numberOfLines={1} style={{ color }}>
        {label}
      </AppText>
    </>
  );
}

/**
 * Bottom navigation for narrow screens. Up to five sections show as tabs; with more, the last
 * slot becomes "More", which lists the rest in a sheet above the bar.
 */
export function TabBar({ items }: { items: NavItem[] }) {
  const styles = useThemedStyles(makeStyles);
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  const [moreOpen, setMoreOpen] = useState(false);
  const { tabs, more } = splitTabs(items);
  const moreActive = more.some((item) => isActive(item, pathname));
  return (
    <View style={[styles.bar, { paddingBottom: insets.bottom }]} role="navigation" accessibilityLabel="Main">
      {tabs.map((item) => {
        const active = isActive(item, pathname);
        return (
          <Link key={item.key} href={item.href} asChild>
            <Pressable testID={item.testID} accessibilityLabel={item.label} aria-current={active ? 'page' : undefined} accessibilityState={{ selected: active }} style={styles.item}>
              <TabFace icon={item.key} label={item.label} active={active} />
            </Pressable>
          </Link>
        );
      })}
      {more.length > 0 ? (
        <Pressable
          testID="nav-more"
          accessibilityLabel="More"
          aria-expanded={moreOpen}
          aria-haspopup="menu"
          accessibilityState={{ selected: moreActive, expanded: moreOpen }}
          onPress={() => setMoreOpen((open) => !open)}
          style={styles.item}
        >
          <TabFace icon="more" label="More" active={moreActive || moreOpen} />
        </Pressable>
      ) : null}
      <MoreSheet items={more} open={moreOpen} onClose={() => setMoreOpen(false)} bottomOffset={tabBarHeight + insets.bottom} />
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
      minWidth: 0,
      height: tabBarHeight,
      alignItems: 'center',
      justifyContent: 'center',
      gap: spacing.xxs,
      paddingHorizontal: spacing.xxs,
    },
    indicator: { position: 'absolute', top: 0, width: 28, height: 2, borderRadius: 1, backgroundColor: 'transparent' },
    indicatorOn: { backgroundColor: c.accent },
  });
