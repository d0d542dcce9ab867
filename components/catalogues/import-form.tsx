import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { ImportErrors } from '@/components/catalogues/import-errors';
import { suggestedName, type ImportFlow } from '@/components/catalogues/import-flow';
import { UploadProgress } from '@/components/catalogues/upload-progress';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { FormSection } from '@/components/ui/form-section';
import { TextField } from '@/components/ui/text-field';
import { useManagedClubsQuery, type CataloguePreview } from '@/hooks/use-catalogues';
import { useZodForm } from '@/hooks/use-zod-form';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { CsvImportError } from '@/shared/targets/csv-import';

const nameSchema = z.object({ name: z.string().trim().min(1, 'Give the catalogue a name').max(80, 'At most 80 characters') });
const PERSONAL = 'personal';
const count = (n: number) => n.toLocaleString('en-GB');

/** The rows a 400 `invalid-csv` answer lists (the file changed since its preview, or the mapping did). */
function rejectedRows(error: unknown): { rows: CsvImportError[]; errorCount?: number } | null {
  if (!isApiError(error, 400) || error.code !== 'invalid-csv') return null;
  const body = error.body as { error?: { rows?: CsvImportError[]; errorCount?: number } } | undefined;
  const rows = body?.error?.rows;
  return rows && rows.length ? { rows, errorCount: body?.error?.errorCount } : null;
}

function useDestinations() {
  const clubs = useManagedClubsQuery();
  const choices = [{ value: PERSONAL, label: 'Just me' }, ...(clubs.data ?? []).map((c) => ({ value: c.id, label: c.name }))];
  return { choices, clubs };
}

/** Name, who sees it (personal or a club the user runs), and the import with its progress. */
export function ImportForm({ flow, preview, fileName }: { flow: ImportFlow; preview: CataloguePreview; fileName: string }) {
  const form = useZodForm({ schema: nameSchema, initial: { name: suggestedName(fileName) } });
  const [destination, setDestination] = useState(PERSONAL);
  const [confirming, setConfirming] = useState(false);
  const { choices, clubs } = useDestinations();
  const upload = flow.upload;
  const bad = preview.errorCount;

  function start(acceptErrors: boolean) {
    const v = form.validate();
    if (!v) return;
    if (bad > 0 && !acceptErrors) return setConfirming(true);
    setConfirming(false);
    flow.startImport(v.name, destination === PERSONAL ? undefined : destination, acceptErrors, (e) => {
      if (isApiError(e, 400) && e.fields) form.setServerErrors(e.fields);
    });
  }

  if (upload.isPending) {
    return (
      <FormSection title="3 · Import">
        <UploadProgress progress={upload.progress} />
      </FormSection>
    );
  }
  const fieldError = isApiError(upload.error, 400) && !!upload.error.fields;
  const rejected = rejectedRows(upload.error);
  const blocked = flow.mappingEdited || flow.preview.isPending || preview.count === 0;
  return (
    <FormSection title="3 · Import" description="Imported objects show up in Find beside the built-in list." testID="catalogue-import">
      {upload.isError && !fieldError ? <Banner tone="danger" title="Nothing was imported" message={cleanError(upload.error)} testID="catalogue-import-error" /> : null}
      {rejected ? <ImportErrors errors={rejected.rows} errorCount={rejected.errorCount ?? rejected.rows.length} /> : null}
      <TextField label="Catalogue name" value={form.values.name} onChangeText={(v) => form.setField('name', v)} onBlur={() => form.blur('name')} error={form.errorFor('name')} testID="catalogue-name-input" />
      <ChoiceGroup label="Who can search it" choices={choices} value={destination} onChange={setDestination} hint={clubs.isError ? 'Your clubs could not be loaded; you can still import it for yourself.' : 'Clubs are listed where you are an owner or admin.'} testID="catalogue-destination" />
      {confirming ? (
        <View style={styles.confirm} role="alert" testID="catalogue-import-confirm-box">
          <AppText>{`${count(bad)} ${bad === 1 ? 'row has' : 'rows have'} errors and will be left out.`}</AppText>
          <View style={styles.actions}>
            <Button label="Cancel" variant="ghost" onPress={() => setConfirming(false)} />
            <Button label={`Import the ${count(preview.count)} good rows and skip ${count(bad)} bad ones`} onPress={() => start(true)} testID="catalogue-import-confirm" />
          </View>
        </View>
      ) : (
        <View style={styles.actions}>
          <Button label={`Import ${count(preview.count)} objects`} onPress={() => start(false)} disabled={blocked} testID="catalogue-import-submit" />
        </View>
      )}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  confirm: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'flex-end', gap: spacing.sm },
});
