import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

export type Choice<T extends string> = { value: T; label: string };

type ChoiceGroupProps<T extends string> = {
  label: string;
  choices: readonly Choice<T>[];
  value: T;
  onChange: (next: T) => void;
  hint?: string;
  error?: string;
  /** Each chip gets `${testID}-${value}`. */
  testID?: string;
  /** Hide the visible label (the group keeps it as its accessible name), e.g. inside a table row. */
  hideLabel?: boolean;
};

/** A small set of exclusive options as wrapping chips (role radiogroup; name = label). */
export function ChoiceGroup<T extends string>({ label, choices, value, onChange, hint, error, testID, hideLabel }: ChoiceGroupProps<T>) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.field}>
      {hideLabel ? null : (
        <AppText variant="small" weight="semibold" tone="muted">
          {label}
        </AppText>
      )}
      <View style={styles.row} role="radiogroup" accessibilityLabel={label} testID={testID}>
        {choices.map((choice) => {
          const selected = choice.value === value;
          return (
            <Pressable
              key={choice.value}
              role="radio"
              aria-checked={selected}
              accessibilityLabel={choice.label}
              accessibilityState={{ selected }}
              onPress={() => onChange(choice.value)}
              testID={testID ? `${testID}-${choice.value}` : undefined}
              style={({ hovered }: WebPressState) => [styles.chip, hovered && styles.chipHover, selected && styles.chipOn]}
            >
              <AppText variant="small" weight={selected ? 'semibold' : 'regular'} tone={selected ? 'accent' : 'muted'}>
                {choice.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
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
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    field: { gap: spacing.xs + 2 },
    row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
    chip: {
      minHeight: 36,
      justifyContent: 'center',
      paddingHorizontal: spacing.md,
      borderRadius: radii.pill,
      borderWidth: 1,
      borderColor: c.borderStrong,
      backgroundColor: c.surface,
    },
    chipHover: { borderColor: c.textFaint },
    chipOn: { borderColor: c.accent, backgroundColor: c.accentSoft },
  });
