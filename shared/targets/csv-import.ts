import { genericRecordToInput, indexColumns } from '@/shared/targets/csv/generic';
import { guessColumns, type CsvMapping } from '@/shared/targets/csv/mapping';
import { indexOpenNgcColumns, isOpenNgcHeader, openNgcRecordToInput, OPENNGC_COLUMNS } from '@/shared/targets/csv/openngc';
import { guessDelimiter, readCsvRecords, type CsvRecord } from '@/shared/targets/csv/tokenise';
import { catalogueObjectSchema, type CatalogueObject, type CatalogueObjectInput } from '@/shared/targets/schema';

/*
 * Catalogue CSV import for the upload route: detect the layout (OpenNGC's own, or a generic CSV
 * with a guessed column mapping the user can correct), then parse every record into a
 * catalogue object or an error that names the file's line. Pure: the caller reads the file.
 */

export type { CatalogueField, CsvMapping } from '@/shared/targets/csv/mapping';
export { CATALOGUE_FIELDS } from '@/shared/targets/csv/mapping';

export interface CsvLayout {
  /** Header texts of the file, in order. */
  headers: string[];
  mapping: CsvMapping;
}

export interface CsvImportError {
  /** 1-based line of the file where the record starts (the header is line 1). */
  line: number;
  message: string;
}

export interface CsvImportResult {
  rows: CatalogueObject[];
  errors: CsvImportError[];
  /** Records not imported on purpose: OpenNGC's "Dup" (duplicate) and "NonEx" (nonexistent) rows. */
  skipped: { duplicate: number; nonexistent: number };
}

const OPENNGC_MAPPING_COLUMNS: CsvMapping['columns'] = {
  designation: 'Name',
  type: 'Type',
  ra: 'RA',
  dec: 'Dec',
  majorArcmin: 'MajAx',
  minorArcmin: 'MinAx',
  positionAngleDeg: 'PosAng',
  magnitude: 'V-Mag',
  name: 'Common names',
};

/**
 * Reads the header: OpenNGC's semicolon layout (recognised by its column names, see
 * `OPENNGC_COLUMNS`) or a generic CSV whose delimiter (comma, semicolon, tab) and column mapping
 * are guessed from the header texts (see `guessColumns`).
 */
export function detectCsvLayout(text: string): CsvLayout {
  const delimiter = guessDelimiter(text);
  const firstRecord = readCsvRecords(text.slice(0, headerEnd(text)), delimiter).records[0];
  const headers = (firstRecord?.fields ?? []).map((h) => h.trim());
  if (delimiter === ';' && isOpenNgcHeader(headers)) {
    return { headers, mapping: { layout: 'openngc', delimiter, columns: { ...OPENNGC_MAPPING_COLUMNS }, bareRaUnit: 'hours' } };
  }
  const { columns, bareRaUnit } = guessColumns(headers);
  return { headers, mapping: { layout: 'generic', delimiter, columns, bareRaUnit } };
}

/** End of the header record: the first line break outside quotes. */
function headerEnd(text: string): number {
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === '"') quoted = !quoted;
    else if (ch === '\n' && !quoted) return i;
  }
  return text.length;
}

function issuesText(issues: readonly { path: PropertyKey[]; message: string }[]): string {
  return issues.map((i) => i.message).join('; ');
}

type RecordConverter = (record: CsvRecord) => { input: CatalogueObjectInput } | { skip: 'duplicate' | 'nonexistent' } | { problems: string[] };

function converterFor(headers: string[], mapping: CsvMapping): RecordConverter | string {
  if (mapping.layout === 'openngc') {
    if (!isOpenNgcHeader(headers)) return `Not an OpenNGC header: needs the columns ${OPENNGC_COLUMNS.join(', ')}`;
    const index = indexOpenNgcColumns(headers);
    return (record) => {
      const r = openNgcRecordToInput(record.fields, index);
      return r.kind === 'object' ? { input: r.input } : r.kind === 'skip' ? { skip: r.reason } : { problems: r.problems };
    };
  }
  const required = (['designation', 'ra', 'dec'] as const).filter((f) => !mapping.columns[f]);
  if (required.length > 0) return `Choose a column for ${required.join(', ')}`;
  const { index, missing } = indexColumns(headers, mapping);
  if (missing.length > 0) return `The file has no column ${missing.map((m) => `"${m}"`).join(', ')}`;
  return (record) => {
    const r = genericRecordToInput(record.fields, index, mapping);
    return Array.isArray(r) ? { problems: r } : { input: r };
  };
}

/**
 * Parses a catalogue CSV with a mapping from `detectCsvLayout` (possibly edited by the user).
 * Each record becomes a catalogue object checked by `catalogueObjectSchema`, or an error with
 * its 1-based line: unreadable RA/Dec, values out of range, a missing designation, a designation
 * already used earlier in the file (compared after normalisation). OpenNGC "Dup" and "NonEx"
 * rows are counted in `skipped`.
 */
export function parseCatalogueCsv(text: string, mapping: CsvMapping): CsvImportResult {
  const result: CsvImportResult = { rows: [], errors: [], skipped: { duplicate: 0, nonexistent: 0 } };
  const { records, unclosedQuoteLine } = readCsvRecords(text, mapping.delimiter);
  if (unclosedQuoteLine !== null) result.errors.push({ line: unclosedQuoteLine, message: 'A quoted field is never closed' });
  const [header, ...body] = records;
  if (!header) {
    result.errors.push({ line: 1, message: 'The file is empty' });
    return result;
  }
  const convert = converterFor(header.fields.map((h) => h.trim()), mapping);
  if (typeof convert === 'string') {
    result.errors.push({ line: header.line, message: convert });
    return result;
  }
  const firstLine = new Map<string, number>();
  for (const record of body) {
    const converted = convert(record);
    if ('skip' in converted) {
      result.skipped[converted.skip]++;
      continue;
    }
    if ('problems' in converted) {
      result.errors.push({ line: record.line, message: converted.problems.join('; ') });
      continue;
    }
    const parsed = catalogueObjectSchema.safeParse(converted.input);
    if (!parsed.success) {
      result.errors.push({ line: record.line, message: `${converted.input.designation}: ${issuesText(parsed.error.issues)}` });
      continue;
    }
    const key = parsed.data.designation.toLowerCase();
    const earlier = firstLine.get(key);
    if (earlier !== undefined) {
      result.errors.push({ line: record.line, message: `Designation ${parsed.data.designation} already appears on line ${earlier}` });
      continue;
    }
    firstLine.set(key, record.line);
    result.rows.push(parsed.data);
  }
  return result;
}
