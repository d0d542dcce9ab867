import type { CatalogueObject, TargetKind } from '@/shared/targets/schema';

/*
 * In-memory search over catalogue objects: designation normalisation ("ngc224" → "NGC 224"),
 * a text match over designation, aliases and name that ignores case, diacritics, spaces and
 * punctuation, and filters by kind, size and magnitude.
 */

/** Catalogue prefixes and how we spell them; one-letter catalogues are written without a space. */
const PREFIXES: Record<string, string> = {
  M: 'M',
  MESSIER: 'M',
  NGC: 'NGC',
  IC: 'IC',
  B: 'B',
  C: 'C',
  H: 'H',
  MEL: 'Mel',
  CR: 'Cr',
  CL: 'Cl',
  HCG: 'HCG',
  ESO: 'ESO',
  PGC: 'PGC',
  UGC: 'UGC',
  MWSC: 'MWSC',
};

/** Prefix, number (leading zeros dropped), letter or "-n" suffix, and NED's component tag ("IC0080 NED01"). */
const DESIGNATION = /^([a-z]+)\s*\.?\s*0*(\d+)([a-z]?(?:-\d+)?)(?:\s*(ned)\s*(\d+))?$/i;

/**
 * A designation in our canonical form: "m 31" → "M31", "Messier 31" → "M31", "ngc224" → "NGC 224",
 * "NGC0224" (OpenNGC's padded form) → "NGC 224", "IC434" → "IC 434", "ngc 1530a" → "NGC 1530A",
 * "ESO056-115" → "ESO 56-115", "IC0080 NED01" → "IC 80 NED01". Text in no known catalogue form comes back trimmed, with single spaces.
 */
export function normaliseDesignation(text: string): string {
  const collapsed = text.trim().replace(/\s+/g, ' ');
  const m = DESIGNATION.exec(collapsed);
  if (!m) return collapsed;
  const [, rawPrefix = '', digits = '', suffix = '', ned, component = ''] = m;
  const prefix = PREFIXES[rawPrefix.toUpperCase()];
  if (prefix === undefined) return collapsed;
  const number = String(Number(digits));
  const space = prefix.length === 1 ? '' : ' ';
  const part = ned === undefined ? '' : ` NED${component.padStart(2, '0')}`;
  return `${prefix}${space}${number}${suffix.toUpperCase()}${part}`;
}

/** Lower case without diacritics, spaces or punctuation: "Barnard's Galaxy" → "barnardsgalaxy". */
export function foldForSearch(text: string): string {
  return text
    .normalize('NFD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]/gu, '');
}

interface CompiledQuery {
  folded: string;
  /** The query as a designation, lower case, for exact matches. */
  designation: string;
}

function compileQuery(query: string): CompiledQuery {
  return { folded: foldForSearch(query), designation: normaliseDesignation(query).toLowerCase() };
}

function isNamed(obj: CatalogueObject, wantedLower: string): boolean {
  if (obj.designation.toLowerCase() === wantedLower) return true;
  return [obj.designation, ...obj.aliases].some((d) => normaliseDesignation(d).toLowerCase() === wantedLower);
}

function matchesCompiled(obj: CatalogueObject, q: CompiledQuery): boolean {
  if (q.folded === '') return true;
  if (isNamed(obj, q.designation)) return true;
  return [obj.designation, ...obj.aliases, obj.name].some((field) => foldForSearch(field).includes(q.folded));
}

/** Whether `designation` names this object (designation or alias), after normalisation. */
export function hasDesignation(obj: CatalogueObject, designation: string): boolean {
  return isNamed(obj, normaliseDesignation(designation).toLowerCase());
}

/**
 * Whether the object matches a free-text query: the folded query (see `foldForSearch`) occurs in
 * the folded designation, an alias or the name; an exact designation ("m 31", "ngc0224") always
 * matches. An empty query matches everything. Substring matching suits type-ahead: "m3" also
 * finds M30–M39; use `searchTargets` for exact matches first.
 */
export function matchesQuery(obj: CatalogueObject, query: string): boolean {
  return matchesCompiled(obj, compileQuery(query));
}

export interface TargetFilter {
  /** Free text, see `matchesQuery`. */
  query?: string;
  /** Kinds to keep; empty or absent keeps all. */
  types?: readonly TargetKind[];
  minSizeArcmin?: number;
  maxSizeArcmin?: number;
  /** Brightest magnitude to keep (the smaller number), e.g. 4. */
  brightestMag?: number;
  /** Faintest magnitude to keep (the larger number), e.g. 10. */
  faintestMag?: number;
  /** Keep objects without a magnitude when a magnitude bound is set (default false). */
  keepUnknownMagnitude?: boolean;
}

/** Whether the object passes every part of the filter; size is the major axis in arcminutes. */
export function passesFilter(obj: CatalogueObject, filter: TargetFilter): boolean {
  return passesCompiled(obj, filter, filter.query === undefined ? undefined : compileQuery(filter.query));
}

function passesCompiled(obj: CatalogueObject, filter: TargetFilter, query: CompiledQuery | undefined): boolean {
  const { types, minSizeArcmin, maxSizeArcmin, brightestMag, faintestMag } = filter;
  if (types && types.length > 0 && !types.includes(obj.type)) return false;
  if (minSizeArcmin !== undefined && obj.majorArcmin < minSizeArcmin) return false;
  if (maxSizeArcmin !== undefined && obj.majorArcmin > maxSizeArcmin) return false;
  const mag = obj.magnitude;
  if (mag === null && (brightestMag !== undefined || faintestMag !== undefined) && filter.keepUnknownMagnitude !== true) return false;
  if (mag !== null && brightestMag !== undefined && mag < brightestMag) return false;
  if (mag !== null && faintestMag !== undefined && mag > faintestMag) return false;
  return query === undefined || matchesCompiled(obj, query);
}

/**
 * Objects passing the filter, exact designation matches first, then in the input order
 * (a stable sort), at most `limit` of them.
 */
export function searchTargets<T extends CatalogueObject>(objects: readonly T[], filter: TargetFilter, limit = Infinity): T[] {
  const query = filter.query === undefined ? undefined : compileQuery(filter.query);
  const hits = objects.filter((o) => passesCompiled(o, filter, query));
  if (query !== undefined && query.folded !== '') {
    const exact = (o: T) => (isNamed(o, query.designation) ? 0 : 1);
    hits.sort((a, b) => exact(a) - exact(b));
  }
  return hits.slice(0, limit);
}
