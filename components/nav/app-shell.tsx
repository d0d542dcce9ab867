import { Slot } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { navItems } from '@/components/nav/nav-items';
import { SideRail } from '@/components/nav/side-rail';
import { TabBar } from '@/components/nav/tab-bar';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSessionState } from '@/hooks/use-session';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import type { Palette } from '@/constants/theme';

/** The signed-in frame: side rail from 900 px, bottom tabs below; the routed screen fills the rest. */
export function AppShell() {
  const styles = useThemedStyles(makeStyles);
  const { isWide } = useBreakpoints();
  const { user, isAdmin } = useSessionState();
  const items = navItems.filter((item) => !item.adminOnly || isAdmin);
  // One tree for both layouts, so crossing the breakpoint never remounts the screen.
  return (
    <View style={[styles.root, isWide && styles.row]}>
      {isWide ? <SideRail items={items} userName={user?.name} /> : null}
      <View style={styles.main} role="main">
        <Slot />
      </View>
      {isWide ? null : <TabBar items={items} />}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    root: { flex: 1, backgroundColor: c.background },
    row: { flexDirection: 'row' },
    main: { flex: 1, minWidth: 0 },
  });
