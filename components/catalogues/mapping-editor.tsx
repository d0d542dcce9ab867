import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { SelectField } from '@/components/ui/select-field';
import { spacing } from '@/constants/theme';
import { CATALOGUE_FIELDS, type CatalogueField, type CsvMapping } from '@/shared/targets/csv-import';

const FIELD_LABELS: Record<CatalogueField, string> = {
  designation: 'Designation (required)',
  aliases: 'Other designations',
  name: 'Common name',
  type: 'Kind',
  ra: 'RA (required)',
  dec: 'Dec (required)',
  majorArcmin: 'Major axis (′)',
  minorArcmin: 'Minor axis (′)',
  positionAngleDeg: 'Position angle (°)',
  magnitude: 'Magnitude',
};

const NONE = '';

type MappingEditorProps = {
  headers: string[];
  mapping: CsvMapping;
  onChange: (next: CsvMapping) => void;
  edited: boolean;
  onRecheck: () => void;
  checking: boolean;
};

/** Which column feeds which field of a generic CSV, and how a bare RA number is read. */
export function MappingEditor({ headers, mapping, onChange, edited, onRecheck, checking }: MappingEditorProps) {
  const columns = [...new Set(headers.filter((h) => h.trim() !== ''))];
  const choices = [{ value: NONE, label: '— not in this file —' }, ...columns.map((h) => ({ value: h, label: h }))];

  function setColumn(field: CatalogueField, header: string) {
    const next = { ...mapping.columns };
    if (header === NONE) delete next[field];
    else next[field] = header;
    onChange({ ...mapping, columns: next });
  }

  return (
    <View style={styles.box} testID="catalogue-mapping">
      <AppText variant="small" tone="muted">
        Check the guessed columns. Designation, RA and Dec are needed; the rest is optional.
      </AppText>
      <View style={styles.grid}>
        {CATALOGUE_FIELDS.map((field) => (
          <View key={field} style={styles.cell}>
            <SelectField label={FIELD_LABELS[field]} choices={choices} value={mapping.columns[field] ?? NONE} onChange={(h) => setColumn(field, h)} testID={`mapping-${field}`} />
          </View>
        ))}
      </View>
      <ChoiceGroup
        label="A bare number in the RA column is in"
        choices={[
          { value: 'hours', label: 'Hours' },
          { value: 'degrees', label: 'Degrees' },
        ]}
        value={mapping.bareRaUnit}
        onChange={(bareRaUnit) => onChange({ ...mapping, bareRaUnit })}
        hint="Sexagesimal text such as 05:35:17 is always read as hours."
        testID="mapping-ra-unit"
      />
      {edited ? (
        <View style={styles.recheck}>
          <AppText variant="small" tone="accent" style={styles.grow}>
            The mapping changed: check the file again before importing.
          </AppText>
          <Button label="Check again" size="small" onPress={onRecheck} pending={checking} testID="mapping-recheck" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 220 },
  recheck: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  grow: { flex: 1, minWidth: 180 },
});
