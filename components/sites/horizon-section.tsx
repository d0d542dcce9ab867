import { StyleSheet, View } from 'react-native';

import { HorizonPreview } from '@/components/sites/horizon-preview';
import { HorizonTable } from '@/components/sites/horizon-table';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FilePicker } from '@/components/ui/file-picker';
import { FormSection } from '@/components/ui/form-section';
import type { HorizonTableState } from '@/hooks/use-horizon-table';
import { downloadText, readFileText } from '@/lib/files';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import { horizonToCsv } from '@/shared/horizon/profile';

export type HorizonUpload = {
  onUpload: (csv: string, fileName: string) => void;
  pending: boolean;
  /** A failure not shown elsewhere (conflicts and refused lines have their own notices). */
  error: unknown;
};

type HorizonSectionProps = {
  table: HorizonTableState;
  minAltitudeDeg: number;
  siteName: string;
  /** Only for a saved site: store a loaded file right away through the CSV endpoint. */
  upload?: HorizonUpload;
};

function csvFileName(siteName: string): string {
  const stem = siteName.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
  return `${stem || 'site'}-horizon.csv`;
}

function CsvNotice({ table, upload }: Pick<HorizonSectionProps, 'table' | 'upload'>) {
  const csv = table.csv;
  if (!csv) return null;
  if ('errors' in csv) {
    const lines = csv.errors.map((e) => `Line ${e.line}: ${e.message}`).join('\n');
    const count = csv.errors.length === 1 ? 'a bad row' : `${csv.errors.length} bad rows`;
    return (
      <Banner tone="danger" title={`${csv.fileName} has ${count}; nothing was loaded`} message={lines} testID="site-horizon-errors">
        <Button label="Dismiss" size="small" variant="ghost" onPress={table.clearCsv} />
      </Banner>
    );
  }
  const message = upload ? 'Save the site to keep them, or store the horizon now on its own.' : 'They are stored when you save the site.';
  return (
    <Banner tone="info" title={`Loaded ${csv.count} points from ${csv.fileName}`} message={message} testID="site-horizon-loaded">
      {upload ? <Button label="Store horizon now" size="small" variant="secondary" pending={upload.pending} onPress={() => upload.onUpload(csv.text, csv.fileName)} testID="site-horizon-upload" /> : null}
    </Banner>
  );
}

/** The local horizon: a silhouette preview, the points as a table, and CSV in and out. */
export function HorizonSection({ table, minAltitudeDeg, siteName, upload }: HorizonSectionProps) {
  async function onFiles(files: File[]) {
    const file = files[0];
    if (file) table.loadCsv(file.name, await readFileText(file));
  }
  const uploadError = upload?.error ? cleanError(upload.error) : null;
  return (
    <FormSection
      title="Horizon"
      description="Trees, roofs and hills as the skyline's altitude by azimuth (north 0°, east 90°). Targets are planned above both the skyline and the minimum altitude."
      testID="site-horizon"
    >
      <HorizonPreview points={table.preview} minAltitudeDeg={minAltitudeDeg} />
      <View style={styles.actions}>
        <FilePicker label="Load CSV…" accept=".csv,.txt,text/csv,text/plain" onFiles={onFiles} size="small" testID="site-horizon-csv" />
        <Button label="Download CSV" size="small" variant="secondary" disabled={table.hasErrors} onPress={() => downloadText(csvFileName(siteName), horizonToCsv({ points: table.preview }))} testID="site-horizon-download" />
        <Button label="Add point" size="small" variant="secondary" onPress={table.addRow} testID="site-horizon-add" />
      </View>
      <AppText variant="caption" tone="faint">
        CSV: azimuth and altitude in degrees, one point per line; a header row and # comments are fine.
      </AppText>
      <CsvNotice table={table} upload={upload} />
      {uploadError ? <AppText tone="danger">{uploadError}</AppText> : null}
      <HorizonTable table={table} />
    </FormSection>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm } });
