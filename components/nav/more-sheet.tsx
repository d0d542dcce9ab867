import { Link, usePathname } from 'expo-router';
import { Modal, Pressable, StyleSheet, View } from 'react-native';

import { NavIcon } from '@/components/nav/nav-icons';
import { isActive, type NavItem } from '@/components/nav/nav-items';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useHover } from '@/hooks/use-hover';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type MoreSheetProps = { items: NavItem[]; open: boolean; onClose: () => void; bottomOffset: number };

function SheetLink({ item, active, onClose }: { item: NavItem; active: boolean; onClose: () => void }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const { hovered, handlers } = useHover();
  return (
    <Link href={item.href} asChild>
      {/* Link's Slot merges styles as objects: pass a flat one, never an array. */}
      <Pressable
        testID={item.testID}
        accessibilityLabel={item.label}
        role="menuitem"
        aria-current={active ? 'page' : undefined}
        onPress={onClose}
        {...handlers}
        style={StyleSheet.flatten([styles.link, hovered && styles.linkHover, active && styles.linkActive])}
      >
        <NavIcon name={item.key} color={active ? palette.accent : palette.textMuted} />
        <AppText weight={active ? 'semibold' : 'regular'} tone={active ? 'default' : 'muted'}>
          {item.label}
        </AppText>
      </Pressable>
    </Link>
  );
}

/** The sections that do not fit the phone's tab bar, in a sheet just above it. */
export function MoreSheet({ items, open, onClose, bottomOffset }: MoreSheetProps) {
  const styles = useThemedStyles(makeStyles);
  const pathname = usePathname();
  if (items.length === 0) return null;
  return (
    <Modal visible={open} transparent animationType="none" onRequestClose={onClose}>
      <Pressable style={styles.scrim} onPress={onClose} accessibilityLabel="Close menu" testID="nav-more-close" />
      <View style={[styles.sheet, { bottom: bottomOffset + spacing.sm }]} role="menu" accessibilityLabel="More sections" testID="nav-more-sheet">
        {items.map((item) => (
          <SheetLink key={item.key} item={item} active={isActive(item, pathname)} onClose={onClose} />
        ))}
      </View>
    </Modal>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    scrim: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, backgroundColor: c.scrim },
    sheet: {
      position: 'absolute',
      right: spacing.sm,
      left: spacing.sm,
      backgroundColor: c.surfaceRaised,
      borderColor: c.borderStrong,
      borderWidth: 1,
      borderRadius: radii.lg,
      padding: spacing.sm,
      gap: spacing.xxs,
    },
    link: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, paddingHorizontal: spacing.md, minHeight: 48, borderRadius: radii.md },
    linkHover: { backgroundColor: c.surface },
    linkActive: { backgroundColor: c.accentSoft },
  });
