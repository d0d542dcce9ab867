import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextLink } from '@/components/ui/text-link';
import type { CatalogueImportResult } from '@/hooks/use-catalogues';

type ImportDoneProps = { result: CatalogueImportResult; onAnother: () => void };

/** The import is stored: how many objects, where, and the way to search them. */
export function ImportDone({ result, onAnother }: ImportDoneProps) {
  const { catalogue, imported, skippedRows } = result;
  const where = catalogue.clubName ? ` for ${catalogue.clubName}` : '';
  const skipped = skippedRows > 0 ? ` ${skippedRows.toLocaleString('en-GB')} bad rows were skipped.` : '';
  return (
    <Banner tone="ok" title={`Imported ${imported.toLocaleString('en-GB')} objects into “${catalogue.name}”${where}`} message={`They can be found in Targets › Find now.${skipped}`} testID="catalogue-done">
      <TextLink href="/targets?part=find" label="Search them ›" testID="catalogue-done-search" />
      <Button label="Import another file" size="small" variant="ghost" onPress={onAnother} testID="catalogue-import-another" />
    </Banner>
  );
}
