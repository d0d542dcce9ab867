import { parseDec, parseRa } from '@/shared/targets/coordinates';
import { OPENNGC_KINDS, OPENNGC_SKIPPED_TYPES } from '@/shared/targets/csv/kinds';
import { labelled, optionalNumber } from '@/shared/targets/csv/generic';
import type { CatalogueObjectInput } from '@/shared/targets/schema';
import { normaliseDesignation } from '@/shared/targets/search';

/*
 * OpenNGC's layout (NGC.csv and addendum.csv by Mattia Verga, github.com/mattiaverga/OpenNGC,
 * CC-BY-SA-4.0): semicolons, a header row, RA "HH:MM:SS.ss" and Dec "±DD:MM:SS.s" (J2000), MajAx
 * and MinAx in arcmin, PosAng in degrees, B-Mag and V-Mag, the Messier number in `M`, other NGC
 * and IC numbers in `NGC`/`IC`, and comma-separated `Common names`. Rows of type "Dup" point at
 * the real entry and rows of type "NonEx" name objects that do not exist.
 */

export const OPENNGC_COLUMNS = ['Name', 'Type', 'RA', 'Dec', 'MajAx', 'MinAx', 'PosAng', 'B-Mag', 'V-Mag', 'M', 'NGC', 'IC', 'Common names'] as const;
type OpenNgcColumn = (typeof OPENNGC_COLUMNS)[number];

/** Whether a header row is OpenNGC's (all the columns we read are present). */
export function isOpenNgcHeader(headers: readonly string[]): boolean {
  const set = new Set(headers.map((h) => h.trim()));
  return OPENNGC_COLUMNS.every((c) => set.has(c));
}

export type OpenNgcColumnIndex = Record<OpenNgcColumn, number>;

export function indexOpenNgcColumns(headers: readonly string[]): OpenNgcColumnIndex {
  const trimmed = headers.map((h) => h.trim());
  return Object.fromEntries(OPENNGC_COLUMNS.map((c) => [c, trimmed.indexOf(c)])) as OpenNgcColumnIndex;
}

export type OpenNgcRecordResult =
  | { kind: 'object'; input: CatalogueObjectInput }
  | { kind: 'skip'; reason: 'duplicate' | 'nonexistent' }
  | { kind: 'error'; problems: string[] };

function list(text: string): string[] {
  return text
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

/** Messier number, other NGC/IC numbers and the common names after the first, without repeats. */
function aliasesOf(cell: (c: OpenNgcColumn) => string, designation: string, extraNames: string[]): string[] {
  const m = cell('M').trim();
  const ids = [
    ...(m === '' ? [] : [`M${Number(m)}`]),
    ...list(cell('NGC')).map((n) => normaliseDesignation(`NGC${n}`)),
    ...list(cell('IC')).map((n) => normaliseDesignation(`IC${n}`)),
    ...extraNames,
  ];
  return [...new Set(ids)].filter((a) => a !== designation);
}

/** One OpenNGC record → input for `catalogueObjectSchema`, a skip, or the problems found. */
export function openNgcRecordToInput(fields: readonly string[], index: OpenNgcColumnIndex): OpenNgcRecordResult {
  const cell = (c: OpenNgcColumn) => (fields[index[c]] ?? '').trim();
  const type = cell('Type');
  if (type === OPENNGC_SKIPPED_TYPES.duplicate) return { kind: 'skip', reason: 'duplicate' };
  if (type === OPENNGC_SKIPPED_TYPES.nonexistent) return { kind: 'skip', reason: 'nonexistent' };
  const problems: string[] = [];
  const designation = normaliseDesignation(cell('Name'));
  if (designation === '') problems.push('Missing designation');
  const kind = OPENNGC_KINDS[type];
  if (kind === undefined) problems.push(`Unknown OpenNGC type "${type}"`);
  const ra = parseRa(cell('RA'));
  if (!ra.ok) problems.push(labelled('Right ascension', ra.error));
  const dec = parseDec(cell('Dec'));
  if (!dec.ok) problems.push(labelled('Declination', dec.error));
  const numbers = {
    major: optionalNumber(cell('MajAx'), 'Major axis'),
    minor: optionalNumber(cell('MinAx'), 'Minor axis'),
    pa: optionalNumber(cell('PosAng'), 'Position angle'),
    v: optionalNumber(cell('V-Mag'), 'V magnitude'),
    b: optionalNumber(cell('B-Mag'), 'B magnitude'),
  };
  for (const v of Object.values(numbers)) if (typeof v === 'string') problems.push(v);
  if (problems.length > 0 || kind === undefined || !ra.ok || !dec.ok) return { kind: 'error', problems };
  const num = (v: number | null | string) => (typeof v === 'number' ? v : null);
  const [name = '', ...extraNames] = list(cell('Common names'));
  return {
    kind: 'object',
    input: {
      designation,
      aliases: aliasesOf(cell, designation, extraNames),
      name,
      type: kind,
      raDeg: ra.valueDeg,
      decDeg: dec.valueDeg,
      majorArcmin: num(numbers.major) ?? 0,
      minorArcmin: num(numbers.minor),
      positionAngleDeg: num(numbers.pa),
      magnitude: num(numbers.v) ?? num(numbers.b),
    },
  };
}
