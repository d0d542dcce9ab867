import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { LogoMark } from '@/components/brand/logo-mark';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

/** Shown while fonts and the session load: the mark and a small spinner, nothing bright. */
export function SplashView() {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <View style={styles.root} role="progressbar" accessibilityLabel="Loading Nightloom" testID="splash">
      <LogoMark size={44} />
      <ActivityIndicator color={palette.textFaint} />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: spacing.lg, backgroundColor: c.background },
  });
