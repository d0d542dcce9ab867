import { forwardRef } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { inputSurface } from '@/components/ui/input-style';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  hint?: string;
  /** Shown under the field in place of the hint. */
  error?: string;
  tabular?: boolean;
};

/** A labelled input whose accessible name is exactly its visible label. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField({ label, hint, error, tabular, ...input }, ref) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <View style={styles.field}>
      <AppText variant="small" weight="semibold" tone="muted">
        {label}
      </AppText>
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-invalid={!!error}
        placeholderTextColor={palette.textFaint}
        selectionColor={palette.accent}
        {...input}
        style={[styles.input, tabular && styles.tabular, !!error && styles.inputError]}
      />
      {error ? (
        <AppText variant="small" tone="danger" role="alert">
          {error}
        </AppText>
      ) : hint ? (
        <AppText variant="small" tone="faint">
          {hint}
        </AppText>
      ) : null}
    </View>
  );
});

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    field: { gap: spacing.xs + 2 },
    input: {
      ...inputSurface(c),
      borderRadius: radii.md,
      paddingHorizontal: spacing.md,
      paddingVertical: spacing.sm + 2,
      minHeight: 44,
    },
    inputError: { borderColor: c.danger },
    tabular: { fontVariant: ['tabular-nums'] },
  });
