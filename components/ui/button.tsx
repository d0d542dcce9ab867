import type { ReactNode } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger';

type ButtonProps = {
  label: string;
  onPress?: () => void;
  variant?: ButtonVariant;
  size?: 'regular' | 'small';
  pending?: boolean;
  disabled?: boolean;
  icon?: ReactNode;
  testID?: string;
  /** Defaults to `label`; set when the visible label needs context for screen readers. */
  accessibilityLabel?: string;
  fullWidth?: boolean;
};

export function Button({ label, onPress, variant = 'primary', size = 'regular', pending, disabled, icon, testID, accessibilityLabel, fullWidth }: ButtonProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const inactive = disabled || pending;
  const textTone = variant === 'danger' ? 'danger' : variant === 'primary' ? undefined : 'default';
  return (
    <Pressable
      role="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled: !!inactive, busy: !!pending }}
      aria-disabled={!!inactive}
      aria-busy={!!pending}
      disabled={inactive}
      onPress={onPress}
      testID={testID}
      style={({ pressed, hovered }: WebPressState) => [
        styles.base,
        size === 'small' && styles.small,
        styles[variant],
        (pressed || hovered) && !inactive && styles[`${variant}Active`],
        inactive && styles.inactive,
        fullWidth && styles.fullWidth,
      ]}
    >
      <View style={styles.row}>
        {pending ? <ActivityIndicator size="small" color={variant === 'primary' ? palette.onAccent : palette.textMuted} /> : icon}
        <AppText
          variant={size === 'small' ? 'small' : 'body'}
          weight="semibold"
          tone={textTone}
          style={variant === 'primary' ? styles.primaryText : undefined}
          numberOfLines={1}
        >
          {label}
        </AppText>
      </View>
    </Pressable>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    base: {
      minHeight: 44,
      paddingHorizontal: spacing.lg,
      borderRadius: radii.md,
      alignItems: 'center',
      justifyContent: 'center',
      borderWidth: 1,
      borderColor: 'transparent',
    },
    small: { minHeight: 34, paddingHorizontal: spacing.md, borderRadius: radii.sm },
    row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    fullWidth: { alignSelf: 'stretch' },
    primary: { backgroundColor: c.accent },
    primaryActive: { opacity: 0.88 },
    primaryText: { color: c.onAccent },
    secondary: { backgroundColor: c.surfaceRaised, borderColor: c.borderStrong },
    secondaryActive: { borderColor: c.textFaint },
    ghost: { backgroundColor: 'transparent' },
    ghostActive: { backgroundColor: c.surfaceRaised },
    danger: { backgroundColor: c.dangerSoft, borderColor: c.danger },
    dangerActive: { opacity: 0.85 },
    inactive: { opacity: 0.55 },
  });
