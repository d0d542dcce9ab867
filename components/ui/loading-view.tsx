import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { spacing } from '@/constants/theme';

/** A quiet placeholder while data loads: a small spinner, no bright skeletons. */
export function LoadingView({ label = 'Loading…' }: { label?: string }) {
  const { palette } = useTheme();
  return (
    <View style={styles.box} role="progressbar" accessibilityLabel={label}>
      <ActivityIndicator color={palette.textMuted} />
      <AppText variant="small" tone="faint">
        {label}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', justifyContent: 'center', gap: spacing.sm, paddingVertical: spacing.xxxl },
});
