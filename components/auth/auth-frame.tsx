import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { LogoMark } from '@/components/brand/logo-mark';
import { AppText } from '@/components/ui/app-text';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type AuthFrameProps = { title: string; subtitle?: string; children: ReactNode; footer?: ReactNode };

/** The signed-out frame: the mark, a short heading and one narrow form, centred. */
export function AuthFrame({ title, subtitle, children, footer }: AuthFrameProps) {
  const styles = useThemedStyles(makeStyles);
  const insets = useSafeAreaInsets();
  const { isTablet } = useBreakpoints();
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={[styles.content, { paddingTop: insets.top + spacing.xxl, paddingBottom: insets.bottom + spacing.xxl }]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column}>
        <View style={styles.brand}>
          <LogoMark size={40} />
          <AppText variant="title" weight="bold">
            Nightloom
          </AppText>
          <AppText variant="small" tone="muted">
            Plan every dark hour.
          </AppText>
        </View>
        <View style={[styles.panel, isTablet && styles.panelFramed]}>
          <View style={styles.heading}>
            <AppText variant="title" role="heading" aria-level={1}>
              {title}
            </AppText>
            {subtitle ? <AppText tone="muted">{subtitle}</AppText> : null}
          </View>
          {children}
        </View>
        {footer ? <View style={styles.footer}>{footer}</View> : null}
      </View>
    </ScrollView>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    scroll: { flex: 1, backgroundColor: c.background },
    content: { flexGrow: 1, justifyContent: 'center', alignItems: 'center', paddingHorizontal: spacing.lg },
    column: { width: '100%', maxWidth: 420, gap: spacing.xl },
    brand: { alignItems: 'center', gap: spacing.xs },
    panel: { gap: spacing.lg },
    panelFramed: {
      backgroundColor: c.surface,
      borderColor: c.border,
      borderWidth: 1,
      borderRadius: radii.lg,
      padding: spacing.xl,
    },
    heading: { gap: spacing.xs },
    footer: { alignItems: 'center', gap: spacing.sm },
  });
