/*
 * The built-in target list against OpenNGC by Mattia Verga (github.com/mattiaverga/OpenNGC,
 * CC-BY-SA-4.0), read at run time from ../shared/data/openngc/ and never copied into the repo.
 * Every built-in position must lie within 2′ (great-circle) of OpenNGC's position for the same
 * object. Lookup: a Messier entry by the `M` column (a real row in NGC.csv or addendum.csv,
 * e.g. M40 and M45 live in addendum.csv); M102 has no real row there, since OpenNGC follows
 * NED and lists M102 as a duplicate of M101, so it falls back to its NGC alias (NGC 5866, the
 * usual identification). NGC/IC designations and aliases by OpenNGC's padded name
 * ("NGC0224"), following "Dup" rows to the entry they duplicate.
 */
import { describe, expect, it } from 'vitest';
import { BUILTIN_TARGETS, findBuiltinTarget } from '@/shared/targets/builtin';
import { catalogueObjectSchema, type CatalogueObject } from '@/shared/targets/schema';
import { normaliseDesignation } from '@/shared/targets/search';
import {
  findMessier,
  followDuplicates,
  loadOpenNgc,
  openNgcAvailable,
  openNgcName,
  openNgcSuite,
  separationArcmin,
  type OpenNgc,
  type OpenNgcRow,
} from '@/tests/helpers/openngc';

const LIMIT_ARCMIN = 2;

function byNgcIc(db: OpenNgc, designation: string) {
  const name = openNgcName(designation);
  const row = name === undefined ? undefined : db.byName.get(name);
  return row ? followDuplicates(db, row) : undefined;
}

/** OpenNGC's row for an entry and how it was found, or undefined. */
function resolve(db: OpenNgc, entry: CatalogueObject): { row: OpenNgcRow; via: string } | undefined {
  const messier = /^M(\d+)$/.exec(entry.designation);
  if (messier) {
    const row = findMessier(db, Number(messier[1]));
    if (row) return { row, via: `M column → ${row.file} ${row.name}` };
  }
  for (const id of [entry.designation, ...entry.aliases]) {
    const found = byNgcIc(db, id);
    if (found) return { row: found.row, via: found.trail.join(' → ') };
  }
  return undefined;
}

function offset(entry: CatalogueObject, row: OpenNgcRow): number {
  return separationArcmin(entry.raDeg, entry.decDeg, row.raDeg, row.decDeg);
}

describe('built-in target list', () => {
  it('parses every entry with the catalogue schema', () => {
    const bad = BUILTIN_TARGETS.flatMap((o) => {
      const r = catalogueObjectSchema.safeParse(o);
      return r.success ? [] : [`${o.designation}: ${r.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ')}`];
    });
    expect(bad).toEqual([]);
  });

  it('writes designations and aliases in the canonical form and never reuses one', () => {
    const seen = new Map<string, string>();
    const problems: string[] = [];
    for (const o of BUILTIN_TARGETS) {
      for (const d of [o.designation, ...o.aliases]) {
        if (normaliseDesignation(d) !== d) problems.push(`${o.designation}: "${d}" is not canonical`);
        const key = d.toLowerCase();
        const owner = seen.get(key);
        if (owner !== undefined) problems.push(`${d} is used by ${owner} and ${o.designation}`);
        seen.set(key, o.designation);
      }
    }
    expect(problems).toEqual([]);
  });

  it('holds all 110 Messier objects', () => {
    const missing = Array.from({ length: 110 }, (_, i) => `M${i + 1}`).filter((m) => !BUILTIN_TARGETS.some((o) => o.designation === m));
    expect(missing).toEqual([]);
    expect(findBuiltinTarget('ngc0224')?.designation).toBe('M31');
  });
});

describe.skipIf(!openNgcAvailable)(openNgcSuite('built-in target list against OpenNGC'), () => {
  it(`puts every entry within ${LIMIT_ARCMIN}′ of its OpenNGC position`, () => {
    const db = loadOpenNgc();
    const failures: string[] = [];
    for (const entry of BUILTIN_TARGETS) {
      const found = resolve(db, entry);
      if (!found) {
        failures.push(`${entry.designation}: no entry in OpenNGC`);
        continue;
      }
      const off = offset(entry, found.row);
      if (!(off <= LIMIT_ARCMIN)) failures.push(`${entry.designation}: ${off.toFixed(2)}′ from ${found.via}`);
    }
    expect(failures).toEqual([]);
  });

  it(`puts every NGC/IC alias of an entry within ${LIMIT_ARCMIN}′ too`, () => {
    const db = loadOpenNgc();
    const failures: string[] = [];
    for (const entry of BUILTIN_TARGETS) {
      const primary = resolve(db, entry)?.row;
      for (const alias of entry.aliases.filter((a) => openNgcName(a) !== undefined)) {
        const found = byNgcIc(db, alias);
        if (!found) failures.push(`${entry.designation}: alias ${alias} not in OpenNGC`);
        // The primary row is judged by the test above; only a different row needs its own check.
        else if (found.row === primary) continue;
        else if (!(offset(entry, found.row) <= LIMIT_ARCMIN)) failures.push(`${entry.designation}: alias ${alias} is ${offset(entry, found.row).toFixed(2)}′ away (${found.trail.join(' → ')})`);
      }
    }
    expect(failures).toEqual([]);
  });
});
