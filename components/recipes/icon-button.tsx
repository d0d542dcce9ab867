import { Pressable, StyleSheet } from 'react-native';

import { ComposerIcon, type ComposerIconName } from '@/components/recipes/composer-icons';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type IconButtonProps = {
  icon: ComposerIconName;
  /** The accessible name; also shown beside the icon when `showLabel`. */
  label: string;
  onPress: () => void;
  disabled?: boolean;
  showLabel?: boolean;
  tone?: 'default' | 'danger' | 'accent';
  size?: 'small' | 'regular';
  testID?: string;
};

/** A square tool button with a line icon; its name is for screen readers and tooltips. */
export function IconButton({ icon, label, onPress, disabled, showLabel, tone = 'default', size = 'regular', testID }: IconButtonProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const color = disabled ? palette.textFaint : tone === 'danger' ? palette.danger : tone === 'accent' ? palette.accent : palette.textMuted;
  return (
    <Pressable
      role="button"
      accessibilityLabel={label}
      aria-disabled={!!disabled}
      accessibilityState={{ disabled: !!disabled }}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ hovered, pressed }: WebPressState) => [styles.base, size === 'small' && styles.small, showLabel && styles.withLabel, (hovered || pressed) && !disabled && styles.active]}
    >
      <ComposerIcon name={icon} color={color} size={size === 'small' ? 16 : 18} />
      {showLabel ? (
        <AppText variant="small" weight="semibold" style={{ color }} numberOfLines={1}>
          {label}
        </AppText>
      ) : null}
    </Pressable>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    base: { minWidth: 40, height: 40, borderRadius: radii.sm, alignItems: 'center', justifyContent: 'center', flexDirection: 'row', gap: spacing.xs },
    small: { minWidth: 30, height: 30 },
    withLabel: { paddingHorizontal: spacing.sm },
    active: { backgroundColor: c.surfaceRaised },
  });
