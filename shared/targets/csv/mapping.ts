import type { CsvDelimiter } from '@/shared/targets/csv/tokenise';

/*
 * Which CSV column feeds which catalogue field. Columns are named by their header text so a
 * mapping can be shown in the upload form and edited there.
 */

export const CATALOGUE_FIELDS = ['designation', 'aliases', 'name', 'type', 'ra', 'dec', 'majorArcmin', 'minorArcmin', 'positionAngleDeg', 'magnitude'] as const;
export type CatalogueField = (typeof CATALOGUE_FIELDS)[number];

export interface CsvMapping {
  /** 'openngc' reads OpenNGC's fixed columns (and ignores `columns`); 'generic' uses `columns`. */
  layout: 'openngc' | 'generic';
  delimiter: CsvDelimiter;
  /** Header text of the column for each field; designation, ra and dec are required. */
  columns: Partial<Record<CatalogueField, string>>;
  /** How a bare number in the RA column is read; sexagesimal text is always hours. */
  bareRaUnit: 'degrees' | 'hours';
}

/** Header texts we recognise for each field, folded (lower case, letters and digits only), best first. */
const HEADER_GUESSES: Record<CatalogueField, readonly string[]> = {
  designation: ['designation', 'desig', 'id', 'object', 'objectid', 'catalogueid', 'catalogid', 'identifier', 'target'],
  aliases: ['aliases', 'alias', 'othernames', 'otherids', 'crossids', 'identifiers'],
  name: ['name', 'commonname', 'commonnames', 'popularname'],
  type: ['type', 'kind', 'class', 'objecttype', 'objtype'],
  ra: ['ra', 'raj2000', 'ra2000', 'rightascension', 'radeg', 'rah', 'rahms'],
  dec: ['dec', 'decj2000', 'dej2000', 'de', 'declination', 'decdeg', 'decdms'],
  majorArcmin: ['majorarcmin', 'major', 'majax', 'majoraxis', 'maj', 'size', 'sizemax', 'diameter', 'diam'],
  minorArcmin: ['minorarcmin', 'minor', 'minax', 'minoraxis', 'min', 'sizemin'],
  positionAngleDeg: ['positionangledeg', 'pa', 'posang', 'positionangle'],
  magnitude: ['vmag', 'mag', 'magnitude', 'v', 'bmag', 'b'],
};

export function foldHeader(header: string): string {
  return header.toLowerCase().replace(/[^a-z0-9]/g, '');
}

/**
 * A guessed mapping from header texts. A column is used for one field at most; when there is no
 * designation column, a "name" column is taken as the designation.
 */
export function guessColumns(headers: readonly string[]): { columns: CsvMapping['columns']; bareRaUnit: CsvMapping['bareRaUnit'] } {
  const folded = headers.map(foldHeader);
  const used = new Set<number>();
  const columns: CsvMapping['columns'] = {};
  for (const field of CATALOGUE_FIELDS) {
    for (const guess of HEADER_GUESSES[field]) {
      const i = folded.findIndex((h, k) => h === guess && !used.has(k));
      if (i >= 0) {
        used.add(i);
        columns[field] = headers[i];
        break;
      }
    }
  }
  if (columns.designation === undefined && columns.name !== undefined) {
    columns.designation = columns.name;
    delete columns.name;
  }
  const ra = columns.ra === undefined ? '' : columns.ra.toLowerCase();
  const bareRaUnit = /hour|\bh\b|\(h\)|_h$|rah/.test(ra) ? 'hours' : 'degrees';
  return { columns, bareRaUnit };
}
