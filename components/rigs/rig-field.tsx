import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { TextField } from '@/components/ui/text-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { RigFormState } from '@/hooks/use-rig-form';
import { spacing } from '@/constants/theme';

type RigFieldProps = {
  form: RigFormState;
  /** Dotted path into the rig, also the server's error key ("optics.focalLengthMm"). */
  path: string;
  /** Visible label with the unit, e.g. "Focal length (mm)"; also the accessible name. */
  label: string;
  hint?: string;
  placeholder?: string;
  /** Text fields (names) instead of numbers. */
  kind?: 'number' | 'text';
  /** A parent path whose errors also belong here (a union such as `camera.link`). */
  errorParent?: string;
  testID?: string;
};

/** `rig-optics-focalLengthMm` from `optics.focalLengthMm`. */
export const rigTestID = (path: string) => `rig-${path.replaceAll('.', '-')}`;

/**
 * One rig input bound to the form by path: its error under it once touched, and otherwise a
 * gentle note when the value is outside the usual range of trade-defaults.md.
 */
export function RigField({ form, path, label, hint, placeholder, kind = 'number', errorParent, testID }: RigFieldProps) {
  const error = form.errorFor(path, errorParent);
  const unusual = error ? undefined : form.hintFor(path);
  const id = testID ?? rigTestID(path);
  const numeric = kind === 'number' ? { inputMode: 'decimal' as const, tabular: true } : {};
  return (
    <View style={styles.field}>
      <TextField
        label={label}
        value={String(form.value(path) ?? '')}
        onChangeText={(v) => form.set(path, v)}
        onBlur={() => form.blur(path)}
        error={error}
        hint={unusual ? undefined : hint}
        placeholder={placeholder}
        autoCorrect={false}
        autoComplete="off"
        testID={id}
        {...numeric}
      />
      {unusual ? (
        <AppText variant="small" tone="accent" testID={`${id}-unusual`}>
          {unusual}
        </AppText>
      ) : null}
    </View>
  );
}

/** Fields side by side from tablet width, stacked on phones. */
export function FieldRow({ children }: { children: ReactNode }) {
  const { isTablet } = useBreakpoints();
  return <View style={[styles.row, isTablet && styles.rowWide]}>{children}</View>;
}

/** A cell of a `FieldRow`: shares the width equally side by side, its own height when stacked. */
export function FieldCell({ children }: { children: ReactNode }) {
  const { isTablet } = useBreakpoints();
  return <View style={isTablet && styles.cell}>{children}</View>;
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  row: { gap: spacing.lg },
  rowWide: { flexDirection: 'row', alignItems: 'flex-start' },
  cell: { flex: 1, minWidth: 0 },
});
