import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { RowErrors } from '@/components/rigs/row-errors';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { CellInput } from '@/components/ui/cell-input';
import type { HorizonTableState } from '@/hooks/use-horizon-table';
import { spacing } from '@/constants/theme';

/** Rows shown before "Show all": a loaded profile may hold hundreds of points. */
const FIRST_ROWS = 24;

/** The horizon's points as an editable azimuth/altitude table; errors under each row. */
export function HorizonTable({ table }: { table: HorizonTableState }) {
  const [showAll, setShowAll] = useState(false);
  const rows = showAll ? table.rows : table.rows.slice(0, FIRST_ROWS);
  const hidden = table.rows.length - rows.length;
  return (
    <View style={styles.table} testID="site-horizon-table">
      {table.rows.length === 0 ? (
        <AppText variant="small" tone="faint">
          No points: a flat horizon at 0°. Add points or load a CSV file.
        </AppText>
      ) : (
        <View style={styles.row} aria-hidden>
          <AppText variant="caption" tone="faint" style={styles.cell}>
            Azimuth (°)
          </AppText>
          <AppText variant="caption" tone="faint" style={styles.cell}>
            Altitude (°)
          </AppText>
          <View style={styles.actionSpace} />
        </View>
      )}
      {rows.map((row, i) => {
        const errors = table.errorsFor(i);
        return (
          <View key={row.key} style={styles.rowBox} role="group" accessibilityLabel={`Point ${i + 1}`}>
            <View style={styles.row}>
              <CellInput label="Azimuth (°)" value={row.azDeg} numeric placeholder="0–360" onChangeText={(v) => table.setCell(row.key, 'azDeg', v)} onBlur={() => table.blur(row.key, 'azDeg')} invalid={!!errors.azDeg} testID={`site-horizon-${i}-az`} />
              <CellInput label="Altitude (°)" value={row.altDeg} numeric placeholder="0–90" onChangeText={(v) => table.setCell(row.key, 'altDeg', v)} onBlur={() => table.blur(row.key, 'altDeg')} invalid={!!errors.altDeg} testID={`site-horizon-${i}-alt`} />
              <Button label="Remove" accessibilityLabel={`Remove point ${i + 1}`} size="small" variant="ghost" onPress={() => table.removeRow(row.key)} testID={`site-horizon-${i}-remove`} />
            </View>
            <RowErrors messages={[errors.azDeg, errors.altDeg]} testID={`site-horizon-${i}-errors`} />
          </View>
        );
      })}
      {hidden > 0 ? <Button label={`Show all ${table.rows.length} points`} size="small" variant="ghost" onPress={() => setShowAll(true)} testID="site-horizon-show-all" /> : null}
      <RowErrors messages={[table.listError]} />
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: spacing.sm },
  rowBox: { gap: spacing.xxs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  cell: { flex: 1 },
  actionSpace: { width: 84 },
});
