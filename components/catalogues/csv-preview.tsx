import { StyleSheet, View } from 'react-native';

import { ImportErrors } from '@/components/catalogues/import-errors';
import type { ImportFlow } from '@/components/catalogues/import-flow';
import { MappingEditor } from '@/components/catalogues/mapping-editor';
import { kindLabel } from '@/components/targets/kinds';
import { formatSizeArcmin } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { FormSection } from '@/components/ui/form-section';
import { spacing } from '@/constants/theme';
import type { CataloguePreview } from '@/hooks/use-catalogues';
import { formatDec, formatRa } from '@/shared/targets/schema';

const SAMPLE_ROWS = 5;
const count = (n: number) => n.toLocaleString('en-GB');

function layoutText(p: CataloguePreview): string {
  const delimiter = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' }[p.layout.mapping.delimiter] ?? 'an unknown delimiter';
  const kind = p.layout.mapping.layout === 'openngc' ? 'Recognised as the OpenNGC layout' : 'A generic CSV';
  return `${kind}, ${p.layout.headers.length} columns separated by ${delimiter}.`;
}

function skippedText(p: CataloguePreview): string | null {
  const { duplicate, nonexistent } = p.skipped;
  if (duplicate + nonexistent === 0) return null;
  return `Left out as the file marks them: ${count(duplicate)} duplicate and ${count(nonexistent)} nonexistent entries.`;
}

function Sample({ preview }: { preview: CataloguePreview }) {
  return (
    <View style={styles.sample} testID="catalogue-sample">
      <AppText eyebrow tone="faint" weight="semibold">
        First objects
      </AppText>
      {preview.sample.slice(0, SAMPLE_ROWS).map((o) => (
        <AppText key={o.designation} variant="small" tabular numberOfLines={1}>
          {`${o.designation}  ·  ${formatRa(o.raDeg)} ${formatDec(o.decDeg)}  ·  ${kindLabel(o.type)}  ·  ${formatSizeArcmin(o.majorArcmin, o.minorArcmin)}`}
        </AppText>
      ))}
    </View>
  );
}

/** What the server read from the file: layout, columns, good rows, a sample and the bad rows. */
export function CsvPreview({ flow, preview }: { flow: ImportFlow; preview: CataloguePreview }) {
  const skipped = skippedText(preview);
  return (
    <FormSection title="2 · Check what was read" description={layoutText(preview)} testID="catalogue-preview">
      <AppText variant="small" tone="muted" numberOfLines={3}>
        {`Columns: ${preview.layout.headers.join(', ')}`}
      </AppText>
      {flow.mapping && flow.mapping.layout === 'generic' ? (
        <MappingEditor headers={preview.layout.headers} mapping={flow.mapping} onChange={flow.editMapping} edited={flow.mappingEdited} onRecheck={flow.recheck} checking={flow.preview.isPending} />
      ) : null}
      <View style={[styles.summary, flow.preview.isPending && styles.stale]}>
        <AppText variant="title" tabular testID="catalogue-preview-count">
          {`${count(preview.count)} ${preview.count === 1 ? 'object' : 'objects'} ready to import`}
        </AppText>
        {skipped ? (
          <AppText variant="small" tone="muted">
            {skipped}
          </AppText>
        ) : null}
      </View>
      {preview.sample.length > 0 ? <Sample preview={preview} /> : null}
      <ImportErrors errors={preview.errors} errorCount={preview.errorCount} />
    </FormSection>
  );
}

const styles = StyleSheet.create({
  summary: { gap: spacing.xs },
  stale: { opacity: 0.6 },
  sample: { gap: spacing.xxs },
});
