import { parseDec, parseRa } from '@/shared/targets/coordinates';
import { kindFromText } from '@/shared/targets/csv/kinds';
import type { CatalogueField, CsvMapping } from '@/shared/targets/csv/mapping';
import type { CatalogueObjectInput } from '@/shared/targets/schema';
import { normaliseDesignation } from '@/shared/targets/search';

/*
 * One record of a generic catalogue CSV → a catalogue object input (validated later by the
 * schema), or the sentences that say what is wrong with it.
 */

export type ColumnIndex = Partial<Record<CatalogueField, number>>;

/** Header texts of the mapping → column positions; lists mapped headers that the file lacks. */
export function indexColumns(headers: readonly string[], mapping: CsvMapping): { index: ColumnIndex; missing: string[] } {
  const index: ColumnIndex = {};
  const missing: string[] = [];
  for (const [field, header] of Object.entries(mapping.columns) as [CatalogueField, string | undefined][]) {
    if (header === undefined || header === '') continue;
    const i = headers.findIndex((h) => h.trim() === header.trim());
    if (i < 0) missing.push(header);
    else index[field] = i;
  }
  return { index, missing };
}

/** The parser's sentence, prefixed with the field's label unless it already names the field. */
export function labelled(label: string, message: string): string {
  return message.startsWith(label) ? message : `${label}: ${message}`;
}

/** A number or null for an empty cell; a sentence when the cell holds something else. */
export function optionalNumber(text: string, label: string): number | null | string {
  const t = text.trim();
  if (t === '') return null;
  const v = Number(t);
  return Number.isFinite(v) ? v : `${label} "${t}" is not a number`;
}

function readRa(text: string, bareUnit: CsvMapping['bareRaUnit']): number | string {
  const t = text.trim();
  if (/^\d+(?:\.\d*)?$/.test(t)) {
    const v = Number(t);
    return bareUnit === 'hours' ? (v < 24 ? v * 15 : 'Right ascension must be below 24h') : v < 360 ? v : 'Right ascension must be below 360°';
  }
  const r = parseRa(t);
  return r.ok ? r.valueDeg : labelled('Right ascension', r.error);
}

/** Splits an aliases cell on "," "|" or ";" and normalises each designation. */
export function splitAliases(text: string): string[] {
  return text
    .split(/[,|;]/)
    .map((a) => a.trim())
    .filter((a) => a !== '')
    .map(normaliseDesignation);
}

/** A generic record → input for `catalogueObjectSchema`, or the problems found. */
export function genericRecordToInput(fields: readonly string[], index: ColumnIndex, mapping: CsvMapping): CatalogueObjectInput | string[] {
  const cell = (f: CatalogueField) => {
    const i = index[f];
    return i === undefined ? '' : (fields[i] ?? '');
  };
  const problems: string[] = [];
  const designation = normaliseDesignation(cell('designation'));
  if (designation === '') problems.push('Missing designation');
  const ra = cell('ra').trim() === '' ? 'Missing right ascension' : readRa(cell('ra'), mapping.bareRaUnit);
  if (typeof ra === 'string') problems.push(ra);
  const decResult = cell('dec').trim() === '' ? { ok: false as const, error: 'Missing declination' } : parseDec(cell('dec'));
  if (!decResult.ok) problems.push(decResult.error.startsWith('Missing') ? decResult.error : labelled('Declination', decResult.error));
  const major = optionalNumber(cell('majorArcmin'), 'Major axis');
  const minor = optionalNumber(cell('minorArcmin'), 'Minor axis');
  const pa = optionalNumber(cell('positionAngleDeg'), 'Position angle');
  const mag = optionalNumber(cell('magnitude'), 'Magnitude');
  for (const v of [major, minor, pa, mag]) if (typeof v === 'string') problems.push(v);
  if (problems.length > 0 || typeof ra === 'string' || !decResult.ok) return problems;
  const num = (v: number | null | string) => (typeof v === 'number' ? v : null);
  return {
    designation,
    aliases: splitAliases(cell('aliases')).filter((a) => a !== designation),
    name: cell('name').trim(),
    type: kindFromText(cell('type')),
    raDeg: ra,
    decDeg: decResult.valueDeg,
    majorArcmin: num(major) ?? 0,
    minorArcmin: num(minor),
    positionAngleDeg: num(pa),
    magnitude: num(mag),
  };
}
