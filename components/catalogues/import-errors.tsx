import { ScrollView, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { CsvImportError } from '@/shared/targets/csv-import';

type ImportErrorsProps = { errors: CsvImportError[]; errorCount: number };

/** Rows the server could not read, by line of the file (the first 200). */
export function ImportErrors({ errors, errorCount }: ImportErrorsProps) {
  const styles = useThemedStyles(makeStyles);
  if (errorCount === 0) return null;
  const title = errorCount === 1 ? '1 row has an error' : `${errorCount.toLocaleString('en-GB')} rows have errors`;
  return (
    <View style={styles.box} testID="catalogue-errors">
      <AppText weight="semibold" tone="danger">
        {title}
      </AppText>
      {errorCount > errors.length ? (
        <AppText variant="small" tone="muted">{`The first ${errors.length} are listed.`}</AppText>
      ) : null}
      <ScrollView style={styles.scroll} contentContainerStyle={styles.list} nestedScrollEnabled>
        {errors.map((e) => (
          <View key={`${e.line}-${e.message}`} style={styles.row}>
            <AppText variant="small" tone="muted" tabular style={styles.line}>
              {`Line ${e.line}`}
            </AppText>
            <AppText variant="small" style={styles.message}>
              {e.message}
            </AppText>
          </View>
        ))}
      </ScrollView>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    box: { gap: spacing.sm, borderWidth: 1, borderColor: c.danger, backgroundColor: c.dangerSoft, borderRadius: radii.md, padding: spacing.md },
    scroll: { maxHeight: 260 },
    list: { gap: spacing.xs },
    row: { flexDirection: 'row', gap: spacing.md },
    line: { width: 72 },
    message: { flex: 1 },
  });
