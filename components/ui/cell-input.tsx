import { forwardRef } from 'react';
import { StyleSheet, TextInput, type TextInputProps } from 'react-native';

import { useTheme } from '@/components/theme-provider';
import { inputSurface } from '@/components/ui/input-style';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type CellInputProps = Omit<TextInputProps, 'style'> & {
  /** The column header this cell sits under: its visible label and accessible name. */
  label: string;
  invalid?: boolean;
  numeric?: boolean;
  /** Flex weight in its row. */
  grow?: number;
};

/**
 * A compact input for a row of an editable table, labelled by its column header. The row shows
 * its errors beneath itself, so the cell only turns its border red.
 */
export const CellInput = forwardRef<TextInput, CellInputProps>(function CellInput({ label, invalid, numeric, grow = 1, ...input }, ref) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <TextInput
      ref={ref}
      accessibilityLabel={label}
      aria-invalid={!!invalid}
      placeholderTextColor={palette.textFaint}
      selectionColor={palette.accent}
      autoCorrect={false}
      autoComplete="off"
      inputMode={numeric ? 'decimal' : undefined}
      {...input}
      style={[styles.input, { flex: grow }, numeric && styles.numeric, invalid && styles.invalid]}
    />
  );
});

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    input: {
      ...inputSurface(c),
      borderRadius: radii.sm,
      paddingHorizontal: spacing.sm,
      paddingVertical: spacing.xs + 2,
      minHeight: 40,
      minWidth: 0,
    },
    numeric: { fontVariant: ['tabular-nums'] },
    invalid: { borderColor: c.danger },
  });
