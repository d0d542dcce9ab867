/*
 * OpenNGC by Mattia Verga (github.com/mattiaverga/OpenNGC), CC-BY-SA-4.0: NGC.csv and
 * addendum.csv, read at test run time from the shared data folder beside the repository. Nothing
 * from it is copied into the repository. This reader is deliberately independent of the
 * project's own CSV importer so the built-in list is judged by a second implementation.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export const OPENNGC_DIR = path.resolve(repoRoot, '..', 'shared', 'data', 'openngc');
export const OPENNGC_NGC_CSV = path.join(OPENNGC_DIR, 'NGC.csv');
export const OPENNGC_ADDENDUM_CSV = path.join(OPENNGC_DIR, 'addendum.csv');
export const openNgcAvailable = fs.existsSync(OPENNGC_NGC_CSV) && fs.existsSync(OPENNGC_ADDENDUM_CSV);
export const OPENNGC_SKIP_REASON = `OpenNGC not found at ${OPENNGC_DIR}`;

/** A suite title that says why the suite is skipped when the dataset is absent (use with `describe.skipIf(!openNgcAvailable)`). */
export function openNgcSuite(title: string): string {
  return openNgcAvailable ? title : `${title} — skipped: ${OPENNGC_SKIP_REASON}`;
}

export interface OpenNgcRow {
  /** As in the file: "NGC0224", "IC0434", "M040", "Mel022". */
  name: string;
  type: string;
  raDeg: number;
  decDeg: number;
  /** Messier number from the `M` column, or null. For a Dup row it names the Messier object it duplicates. */
  messier: number | null;
  /** NGC and IC numbers from the `NGC`/`IC` columns, as "NGC0281", "IC0011" (for a Dup row: the real entry). */
  crossIds: string[];
  file: 'NGC.csv' | 'addendum.csv';
}

/** Splits one semicolon-separated line; fields may be double-quoted and contain semicolons. */
function splitLine(line: string): string[] {
  const out: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') {
      if (quoted && line[i + 1] === '"') {
        field += '"';
        i++;
      } else quoted = !quoted;
    } else if (ch === ';' && !quoted) {
      out.push(field);
      field = '';
    } else field += ch;
  }
  out.push(field);
  return out;
}

function sexagesimal(text: string, scale: number): number {
  const negative = text.trim().startsWith('-');
  const [a = 0, b = 0, c = 0] = text.replace(/^[+-]/, '').split(':').map(Number);
  const value = (a + b / 60 + c / 3600) * scale;
  return negative ? -value : value;
}

function padded(prefix: 'NGC' | 'IC', list: string): string[] {
  return list
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '')
    .map((s) => `${prefix}${s}`);
}

function readRows(file: 'NGC.csv' | 'addendum.csv'): OpenNgcRow[] {
  const lines = fs.readFileSync(path.join(OPENNGC_DIR, file), 'utf8').split(/\r?\n/);
  const header = splitLine(lines[0] ?? '');
  const col = (name: string) => {
    const i = header.indexOf(name);
    if (i < 0) throw new Error(`OpenNGC ${file}: no column ${name}`);
    return i;
  };
  const [iName, iType, iRa, iDec, iM, iNgc, iIc] = ['Name', 'Type', 'RA', 'Dec', 'M', 'NGC', 'IC'].map(col) as number[];
  const rows: OpenNgcRow[] = [];
  for (const line of lines.slice(1)) {
    if (line.trim() === '') continue;
    const f = splitLine(line);
    const get = (i: number | undefined) => (i === undefined ? '' : (f[i] ?? '').trim());
    const ra = get(iRa);
    const dec = get(iDec);
    rows.push({
      name: get(iName),
      type: get(iType),
      raDeg: ra === '' ? NaN : sexagesimal(ra, 15),
      decDeg: dec === '' ? NaN : sexagesimal(dec, 1),
      messier: get(iM) === '' ? null : Number(get(iM)),
      crossIds: [...padded('NGC', get(iNgc)), ...padded('IC', get(iIc))],
      file,
    });
  }
  return rows;
}

export interface OpenNgc {
  rows: OpenNgcRow[];
  byName: Map<string, OpenNgcRow>;
}

let cache: OpenNgc | undefined;

/** Both files, parsed once per test process. */
export function loadOpenNgc(): OpenNgc {
  if (cache) return cache;
  const rows = [...readRows('NGC.csv'), ...readRows('addendum.csv')];
  cache = { rows, byName: new Map(rows.map((r) => [r.name, r])) };
  return cache;
}

/** Our designation → OpenNGC's padded name: "NGC 224" → "NGC0224", "IC 434" → "IC0434", "NGC 1530A" → "NGC1530A". */
export function openNgcName(designation: string): string | undefined {
  const m = /^(NGC|IC)\s*(\d+)([A-Z]?)$/i.exec(designation.trim());
  if (!m) return undefined;
  return `${m[1]!.toUpperCase()}${m[2]!.padStart(4, '0')}${m[3]!.toUpperCase()}`;
}

/** Follows "Dup" rows to the entry they duplicate (via the NGC/IC columns, else the M column). */
export function followDuplicates(db: OpenNgc, row: OpenNgcRow, trail: string[] = []): { row: OpenNgcRow; trail: string[] } | undefined {
  if (row.type !== 'Dup') return { row, trail: [...trail, row.name] };
  if (trail.length > 5) return undefined;
  const target = row.crossIds.map((id) => db.byName.get(id)).find((r) => r !== undefined) ?? (row.messier === null ? undefined : findMessier(db, row.messier));
  return target ? followDuplicates(db, target, [...trail, `${row.name} (Dup)`]) : undefined;
}

/** The real (non-Dup) row carrying this Messier number in its `M` column, in either file. */
export function findMessier(db: OpenNgc, n: number): OpenNgcRow | undefined {
  return db.rows.find((r) => r.messier === n && r.type !== 'Dup');
}

/** Great-circle distance in arcminutes: the haversine form (R. W. Sinnott, Sky & Telescope 68, 159, 1984), stable at small separations. */
export function separationArcmin(ra1Deg: number, dec1Deg: number, ra2Deg: number, dec2Deg: number): number {
  const rad = Math.PI / 180;
  const dDec = (dec2Deg - dec1Deg) * rad;
  const dRa = (ra2Deg - ra1Deg) * rad;
  const h = Math.sin(dDec / 2) ** 2 + Math.cos(dec1Deg * rad) * Math.cos(dec2Deg * rad) * Math.sin(dRa / 2) ** 2;
  return (2 * Math.asin(Math.min(1, Math.sqrt(h))) * 180 * 60) / Math.PI;
}
