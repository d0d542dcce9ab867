import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type BannerProps = {
  tone?: 'info' | 'danger' | 'ok';
  title: string;
  message?: string;
  children?: ReactNode;
  testID?: string;
};

/** An inline notice (errors, conflicts, confirmations). Web has no `Alert`, so these carry it. */
export function Banner({ tone = 'info', title, message, children, testID }: BannerProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={[styles.banner, styles[tone]]} role={tone === 'danger' ? 'alert' : 'status'} testID={testID}>
      <AppText weight="semibold" tone={tone === 'danger' ? 'danger' : tone === 'ok' ? 'ok' : 'accent'}>
        {title}
      </AppText>
      {message ? <AppText variant="small" tone="muted">{message}</AppText> : null}
      {children ? <View style={styles.actions}>{children}</View> : null}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    banner: { borderRadius: radii.md, borderWidth: 1, padding: spacing.md, gap: spacing.xs },
    info: { backgroundColor: c.accentSoft, borderColor: c.accent },
    danger: { backgroundColor: c.dangerSoft, borderColor: c.danger },
    ok: { backgroundColor: c.okSoft, borderColor: c.ok },
    actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.sm },
  });
