import { Children, useState, type ReactNode } from 'react';
import { StyleSheet, TextInput, View, type LayoutChangeEvent, type TextInputProps } from 'react-native';

import type { Option } from '@/components/recipes/node-editor/choices';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import { AppText } from '@/components/ui/app-text';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { SelectField } from '@/components/ui/select-field';
import { SwitchRow } from '@/components/ui/switch-row';
import { useTheme } from '@/components/theme-provider';
import { inputSurface } from '@/components/ui/input-style';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

/** `node-editor-exposureS-input` for the field at `exposureS`. */
export const inputID = (path: string) => `node-editor-${path}-input`;
export const errorID = (path: string) => `node-editor-${path}-error`;

/** A field's message, with the testID the browser tests look for. */
export function FieldError({ path, message }: { path: string; message?: string }) {
  if (!message) return null;
  return (
    <AppText variant="small" tone="danger" role="alert" testID={errorID(path)}>
      {message}
    </AppText>
  );
}

type EditorTextProps = Omit<TextInputProps, 'style'> & {
  /** Dotted path of the parameter: testID and error key. */
  path: string;
  /** Visible label with the unit, also the accessible name. */
  label: string;
  hint?: string;
  error?: string;
  numeric?: boolean;
};

/** A labelled text box with its error (or hint) under it; testIDs from the parameter's path. */
export function EditorText({ path, label, hint, error, numeric, multiline, ...input }: EditorTextProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <View style={styles.field}>
      <AppText variant="small" weight="semibold" tone="muted">
        {label}
      </AppText>
      <TextInput
        accessibilityLabel={label}
        aria-invalid={!!error}
        placeholderTextColor={palette.textFaint}
        selectionColor={palette.accent}
        autoCorrect={false}
        autoComplete="off"
        inputMode={numeric ? 'decimal' : undefined}
        multiline={multiline}
        {...input}
        testID={inputID(path)}
        style={[styles.input, numeric && styles.numeric, multiline && styles.multiline, !!error && styles.inputError]}
      />
      {error ? <FieldError path={path} message={error} /> : hint ? <AppText variant="small" tone="faint">{hint}</AppText> : null}
    </View>
  );
}

type DraftTextProps = Omit<EditorTextProps, 'value' | 'onChangeText' | 'onBlur' | 'error'> & { ed: NodeEditorState };

/** An `EditorText` bound to the draft; its error shows once touched or after Apply. */
export function DraftText({ ed, path, ...rest }: DraftTextProps) {
  const value = ed.values[path];
  return (
    <EditorText
      {...rest}
      path={path}
      value={typeof value === 'string' ? value : ''}
      onChangeText={(v) => ed.set(path, v)}
      onBlur={() => ed.blur(path)}
      error={ed.errorFor(path)}
    />
  );
}

type DraftChoiceProps = { ed: NodeEditorState; path: string; label: string; choices: readonly Option[]; hint?: string; onChange?: (next: string) => void; select?: boolean };

/** A pick-one bound to the draft: chips, or a select list (`select`) for longer lists. */
export function DraftChoice({ ed, path, label, choices, hint, onChange, select }: DraftChoiceProps) {
  const value = ed.values[path];
  const change = (next: string) => {
    if (onChange) onChange(next);
    else ed.set(path, next);
    ed.blur(path);
  };
  const common = { label, choices, value: typeof value === 'string' ? value : '', onChange: change, testID: inputID(path) };
  return (
    <View style={fieldStyle.field}>
      {select ? <SelectField {...common} /> : <ChoiceGroup {...common} hint={hint} />}
      <FieldError path={path} message={ed.errorFor(path)} />
    </View>
  );
}

/** A yes/no parameter as a whole-row switch. */
export function DraftSwitch({ ed, path, label, description }: { ed: NodeEditorState; path: string; label: string; description?: string }) {
  return <SwitchRow label={label} description={description} value={ed.values[path] === true} onValueChange={(v) => ed.set(path, v)} testID={inputID(path)} />;
}

/** Width at which short fields sit two to a row (a bottom sheet on a phone stays single). */
const TWO_COLUMNS_FROM = 440;

/** Short fields: one column in a narrow sheet, two side by side when the editor is wide. */
export function FieldGrid({ children }: { children: ReactNode }) {
  const [wide, setWide] = useState(false);
  const onLayout = (e: LayoutChangeEvent) => setWide(e.nativeEvent.layout.width >= TWO_COLUMNS_FROM);
  return (
    <View style={gridStyles.grid} onLayout={onLayout}>
      {Children.toArray(children).map((child, i) => (
        <View key={i} style={wide ? gridStyles.half : gridStyles.full}>
          {child}
        </View>
      ))}
    </View>
  );
}

const fieldStyle = StyleSheet.create({ field: { gap: spacing.xs } });

const gridStyles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.md },
  full: { width: '100%' },
  half: { flexBasis: '40%', flexGrow: 1, minWidth: 0 },
});

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    field: { gap: spacing.xs + 2 },
    input: {
      ...inputSurface(c),
      borderRadius: radii.md,
      paddingHorizontal: spacing.md,
      paddingVertical: spacing.sm,
      minHeight: 42,
    },
    numeric: { fontVariant: ['tabular-nums'] },
    multiline: { minHeight: 96, textAlignVertical: 'top' },
    inputError: { borderColor: c.danger },
  });
