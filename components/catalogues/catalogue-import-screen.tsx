import { StyleSheet, View } from 'react-native';

import { CatalogueList } from '@/components/catalogues/catalogue-list';
import { CsvPreview } from '@/components/catalogues/csv-preview';
import { ImportDone } from '@/components/catalogues/import-done';
import { formatBytes, useImportFlow, type ImportFlow } from '@/components/catalogues/import-flow';
import { ImportForm } from '@/components/catalogues/import-form';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { FilePicker } from '@/components/ui/file-picker';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

function ChooseFile({ flow }: { flow: ImportFlow }) {
  const busy = flow.reading || flow.upload.isPending;
  return (
    <FormSection title="1 · Choose a CSV file" description="OpenNGC’s NGC.csv is read as it is. Other files need columns for designation, RA and Dec; you can match them up next.">
      <View style={styles.row}>
        <FilePicker label={flow.file ? 'Choose another file…' : 'Choose CSV file…'} accept=".csv,.txt,text/csv" onFiles={([f]) => f && flow.choose(f)} pending={flow.reading} disabled={busy} testID="catalogue-file" />
        {flow.file ? (
          <AppText tone="muted" testID="catalogue-file-name" style={styles.grow}>
            {`${flow.file.name} · ${formatBytes(flow.file.sizeBytes)}`}
          </AppText>
        ) : null}
      </View>
      {flow.readError ? <Banner tone="danger" title="Could not use that file" message={flow.readError} /> : null}
      {flow.preview.isError ? <Banner tone="danger" title="Could not read the file" message={cleanError(flow.preview.error)} testID="catalogue-preview-error" /> : null}
    </FormSection>
  );
}

/** Catalogue import: choose a CSV, check what the server reads, then store it for yourself or a club. */
export function CatalogueImportScreen() {
  const flow = useImportFlow();
  const preview = flow.preview.data;
  const done = flow.upload.data;
  return (
    <Screen title="Import a catalogue" subtitle="Your own object lists, searchable beside the built-in one." width="form" above={<TextLink href="/targets" label="‹ Targets" variant="small" testID="back-to-targets" />}>
      {done ? <ImportDone result={done} onAnother={flow.restart} /> : null}
      {done ? null : <ChooseFile flow={flow} />}
      {!done && flow.preview.isPending && !preview ? <LoadingView label="Reading the file…" /> : null}
      {!done && preview && flow.file ? <CsvPreview flow={flow} preview={preview} /> : null}
      {!done && preview && flow.file ? <ImportForm key={flow.file.name} flow={flow} preview={preview} fileName={flow.file.name} /> : null}
      <CatalogueList />
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  grow: { flexShrink: 1 },
});
