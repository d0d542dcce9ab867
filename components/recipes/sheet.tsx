import type { ReactNode } from 'react';
import { Modal, Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type SheetProps = {
  open: boolean;
  onClose: () => void;
  title: string;
  children: ReactNode;
  /** Buttons pinned under the scrolling content (e.g. Create). */
  footer?: ReactNode;
  testID?: string;
  /** Wide screens: a centred dialog (default) or a panel along the right edge. */
  wideAs?: 'dialog' | 'side';
};

/**
 * A modal surface for the recipe screens: a bottom sheet on phones, a dialog or a right-hand
 * panel on wide screens. Escape and the scrim close it.
 */
export function Sheet({ open, onClose, title, children, footer, testID, wideAs = 'dialog' }: SheetProps) {
  const styles = useThemedStyles(makeStyles);
  const insets = useSafeAreaInsets();
  const { isTablet } = useBreakpoints();
  const place = !isTablet ? styles.bottom : wideAs === 'side' ? styles.side : styles.dialog;
  return (
    <Modal visible={open} transparent animationType="none" onRequestClose={onClose}>
      <Pressable style={styles.scrim} onPress={onClose} accessibilityLabel="Close" />
      <View style={[styles.frame, !isTablet && styles.frameBottom, isTablet && wideAs === 'side' && styles.frameSide]} pointerEvents="box-none">
        <View style={[styles.sheet, place, !isTablet && { paddingBottom: insets.bottom + spacing.md }]} role="dialog" aria-modal accessibilityLabel={title} testID={testID}>
          <View style={styles.head}>
            <AppText variant="title" role="heading" aria-level={2} style={styles.title}>
              {title}
            </AppText>
            <Button label="Close" variant="ghost" size="small" onPress={onClose} testID={testID ? `${testID}-close` : undefined} />
          </View>
          <ScrollView style={styles.body} contentContainerStyle={styles.bodyContent} keyboardShouldPersistTaps="handled">
            {children}
          </ScrollView>
          {footer ? <View style={styles.footer}>{footer}</View> : null}
        </View>
      </View>
    </Modal>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    scrim: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, backgroundColor: c.scrim },
    frame: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: spacing.lg },
    frameBottom: { justifyContent: 'flex-end', padding: 0 },
    frameSide: { alignItems: 'flex-end', justifyContent: 'flex-start', padding: 0 },
    sheet: { backgroundColor: c.surface, borderColor: c.borderStrong, borderWidth: 1, overflow: 'hidden' },
    bottom: { width: '100%', maxHeight: '88%', borderTopLeftRadius: radii.lg, borderTopRightRadius: radii.lg, borderBottomWidth: 0 },
    dialog: { width: '100%', maxWidth: 560, maxHeight: '86%', borderRadius: radii.lg },
    side: { width: 420, height: '100%', borderTopWidth: 0, borderBottomWidth: 0, borderRightWidth: 0 },
    head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingLeft: spacing.lg, paddingRight: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: c.border },
    title: { flex: 1 },
    body: { flexGrow: 0, flexShrink: 1 },
    bodyContent: { padding: spacing.lg, gap: spacing.lg },
    footer: { flexDirection: 'row', justifyContent: 'flex-end', gap: spacing.sm, padding: spacing.md, borderTopWidth: 1, borderTopColor: c.border },
  });
