import type { ChangeEvent } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { SelectFieldProps } from '@/components/ui/select-field-props';
import { useTheme } from '@/components/theme-provider';
import { fonts, radii, spacing, typeScale } from '@/constants/theme';

/**
 * A labelled pick-one list as the browser's own `<select>` (keyboard, screen readers and
 * phones' native pickers for free), drawn in the palette. Accessible name = visible label.
 */
export function SelectField<T extends string>({ label, choices, value, onChange, error, testID, compact }: SelectFieldProps<T>) {
  const { palette } = useTheme();
  const onSelect = (event: ChangeEvent<HTMLSelectElement>) => {
    const next = choices.find((c) => c.value === event.target.value);
    if (next) onChange(next.value);
  };
  return (
    <View style={[styles.field, compact && styles.compact]}>
      {compact ? null : (
        <AppText variant="small" weight="semibold" tone="muted">
          {label}
        </AppText>
      )}
      <select
        aria-label={label}
        aria-invalid={!!error}
        value={value}
        onChange={onSelect}
        data-testid={testID}
        style={{
          // React DOM reads a bare number line height as a multiple: give pixels.
          fontSize: typeScale.body.fontSize,
          lineHeight: `${typeScale.body.lineHeight}px`,
          fontFamily: fonts.regular,
          color: palette.text,
          backgroundColor: palette.surface,
          border: `1px solid ${error ? palette.danger : palette.borderStrong}`,
          borderRadius: compact ? radii.sm : radii.md,
          padding: compact ? `${spacing.xs + 2}px ${spacing.sm}px` : `${spacing.sm + 2}px ${spacing.md}px`,
          minHeight: compact ? 40 : 44,
          outlineColor: palette.accent,
          colorScheme: 'dark',
        }}
      >
        {choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
      {error && !compact ? (
        <AppText variant="small" tone="danger" role="alert">
          {error}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ field: { gap: spacing.xs + 2 }, compact: { gap: 0 } });
