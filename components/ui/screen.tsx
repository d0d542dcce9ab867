import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { AppText } from '@/components/ui/app-text';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { maxContentWidth, maxFormWidth, spacing, type Palette } from '@/constants/theme';

type ScreenProps = {
  title?: string;
  subtitle?: string;
  /** Buttons shown beside the title. */
  actions?: ReactNode;
  /** A line above the title, e.g. a back link. */
  above?: ReactNode;
  children: ReactNode;
  /** `form` keeps single-column forms readable on wide screens. */
  width?: 'content' | 'form';
  testID?: string;
};

/** Every screen's frame: scrolls, pads by breakpoint and caps the content width on wide screens. */
export function Screen({ title, subtitle, actions, above, children, width = 'content', testID }: ScreenProps) {
  const styles = useThemedStyles(makeStyles);
  const insets = useSafeAreaInsets();
  const { isTablet, isWide } = useBreakpoints();
  const pad = isWide ? spacing.xxl : isTablet ? spacing.xl : spacing.lg;
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={[styles.content, { paddingHorizontal: pad, paddingTop: pad + insets.top, paddingBottom: spacing.xxxl }]}
      keyboardShouldPersistTaps="handled"
      testID={testID}
    >
      <View style={[styles.column, { maxWidth: width === 'form' ? maxFormWidth : maxContentWidth }]}>
        {above}
        {title || actions ? (
          <View style={styles.header}>
            <View style={styles.titles}>
              {title ? (
                <AppText variant={isWide ? 'heading' : 'title'} role="heading" aria-level={1}>
                  {title}
                </AppText>
              ) : null}
              {subtitle ? <AppText tone="muted">{subtitle}</AppText> : null}
            </View>
            {actions ? <View style={styles.actions}>{actions}</View> : null}
          </View>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    scroll: { flex: 1, backgroundColor: c.background },
    content: { flexGrow: 1, alignItems: 'center' },
    column: { width: '100%', gap: spacing.xl },
    header: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.lg, flexWrap: 'wrap' },
    titles: { flexShrink: 1, gap: spacing.xs },
    actions: { flexDirection: 'row', gap: spacing.sm, alignItems: 'center' },
  });
