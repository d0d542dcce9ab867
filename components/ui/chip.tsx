import { Pressable, StyleSheet } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type ChipProps = {
  label: string;
  selected: boolean;
  onPress: () => void;
  /** `checkbox` in a multi-choice row (kind filters), `radio` in a single-choice row. */
  role?: 'checkbox' | 'radio';
  testID?: string;
  disabled?: boolean;
};

/** A small toggle in the palette: the filter and picker rows of the Targets screens. */
export function Chip({ label, selected, onPress, role = 'radio', testID, disabled }: ChipProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <Pressable
      role={role}
      aria-checked={selected}
      accessibilityLabel={label}
      accessibilityState={{ checked: selected, disabled: !!disabled }}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ hovered }: WebPressState) => [styles.chip, hovered && styles.chipHover, selected && styles.chipOn, disabled && styles.disabled]}
    >
      <AppText variant="small" weight={selected ? 'semibold' : 'regular'} tone={selected ? 'accent' : 'muted'} numberOfLines={1}>
        {label}
      </AppText>
    </Pressable>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    chip: {
      paddingHorizontal: spacing.md,
      paddingVertical: spacing.xs + 2,
      borderRadius: radii.pill,
      borderWidth: 1,
      borderColor: c.borderStrong,
      backgroundColor: c.surface,
    },
    chipHover: { borderColor: c.textFaint },
    chipOn: { borderColor: c.accent, backgroundColor: c.accentSoft },
    disabled: { opacity: 0.5 },
  });
