import { describe, expect, it } from 'vitest';
import { BUILTIN_TARGETS } from '@/shared/targets/builtin';
import type { CatalogueObject } from '@/shared/targets/schema';
import { foldForSearch, matchesQuery, normaliseDesignation, passesFilter, searchTargets } from '@/shared/targets/search';

function obj(patch: Partial<CatalogueObject> & Pick<CatalogueObject, 'designation'>): CatalogueObject {
  return { aliases: [], name: '', type: 'galaxy', raDeg: 0, decDeg: 0, majorArcmin: 10, minorArcmin: null, positionAngleDeg: null, magnitude: null, ...patch };
}

const m31 = obj({ designation: 'M31', aliases: ['NGC 224'], name: 'Andromeda Galaxy', majorArcmin: 190, magnitude: 3.4 });
const m42 = obj({ designation: 'M42', aliases: ['NGC 1976'], name: 'Orion Nebula', type: 'emission-nebula', majorArcmin: 85, magnitude: 4 });
const ic434 = obj({ designation: 'IC 434', name: '', type: 'emission-nebula', majorArcmin: 60 });
const accented = obj({ designation: 'NGC 6822', name: "Barnard's Galaxy", aliases: ['Nébuleuse de Barnard'], majorArcmin: 15.5, magnitude: 8.8 });
const m3 = obj({ designation: 'M3', aliases: ['NGC 5272'], type: 'globular-cluster', majorArcmin: 18, magnitude: 6.2 });
const m33 = obj({ designation: 'M33', aliases: ['NGC 598'], name: 'Triangulum Galaxy', majorArcmin: 70.8, magnitude: 5.7 });
const all = [m31, m42, ic434, accented, m33, m3];

describe('normaliseDesignation', () => {
  it.each([
    ['m 31', 'M31'],
    ['M31', 'M31'],
    ['Messier 31', 'M31'],
    ['M031', 'M31'],
    ['ngc224', 'NGC 224'],
    ['NGC0224', 'NGC 224'],
    ['ngc  224', 'NGC 224'],
    ['IC434', 'IC 434'],
    ['ic 0434', 'IC 434'],
    ['ngc 1530a', 'NGC 1530A'],
    ['IC0080 NED01', 'IC 80 NED01'],
    ['Mel022', 'Mel 22'],
    ['B033', 'B33'],
    ['ESO056-115', 'ESO 56-115'],
    ['  Andromeda   Galaxy ', 'Andromeda Galaxy'],
    ['Sh2-155', 'Sh2-155'],
  ])('%s → %s', (input, expected) => {
    expect(normaliseDesignation(input)).toBe(expected);
  });
});

describe('matchesQuery', () => {
  it('finds designations however they are typed', () => {
    for (const q of ['m31', 'M 31', 'ngc224', 'NGC 0224', 'ngc 224']) expect(matchesQuery(m31, q)).toBe(true);
    expect(matchesQuery(ic434, 'ic434')).toBe(true);
    expect(matchesQuery(m42, 'M31')).toBe(false);
  });

  it('matches names ignoring case, diacritics, spaces and punctuation', () => {
    expect(matchesQuery(m31, 'ANDROMEDA')).toBe(true);
    expect(matchesQuery(m42, 'orion neb')).toBe(true);
    expect(matchesQuery(accented, 'barnards')).toBe(true);
    expect(matchesQuery(accented, 'Bárnard')).toBe(true);
    expect(matchesQuery(accented, 'nebuleuse')).toBe(true);
    expect(matchesQuery(m31, 'orion')).toBe(false);
  });

  it('matches everything for an empty query and substrings for type-ahead', () => {
    expect(all.every((o) => matchesQuery(o, '  '))).toBe(true);
    expect(matchesQuery(m33, 'm3')).toBe(true);
    expect(foldForSearch("Barnard's Galaxy")).toBe('barnardsgalaxy');
  });
});

describe('passesFilter / searchTargets', () => {
  it('filters by kind', () => {
    expect(searchTargets(all, { types: ['emission-nebula'] }).map((o) => o.designation)).toEqual(['M42', 'IC 434']);
    expect(searchTargets(all, { types: [] })).toHaveLength(all.length);
  });

  it('filters by major-axis size range, bounds included', () => {
    expect(searchTargets(all, { minSizeArcmin: 60, maxSizeArcmin: 85 }).map((o) => o.designation)).toEqual(['M42', 'IC 434', 'M33']);
  });

  it('filters by magnitude range and drops unknown magnitudes unless asked', () => {
    expect(searchTargets(all, { brightestMag: 4, faintestMag: 7 }).map((o) => o.designation)).toEqual(['M42', 'M33', 'M3']);
    expect(searchTargets(all, { faintestMag: 5, keepUnknownMagnitude: true }).map((o) => o.designation)).toEqual(['M31', 'M42', 'IC 434']);
    expect(passesFilter(ic434, { faintestMag: 20 })).toBe(false);
    expect(passesFilter(ic434, { faintestMag: 20, keepUnknownMagnitude: true, query: 'orion' })).toBe(false);
  });

  it('puts exact designation matches first and honours the limit', () => {
    expect(searchTargets(all, { query: 'm3' }).map((o) => o.designation)).toEqual(['M3', 'M31', 'M33']);
    expect(searchTargets(all, { query: 'galaxy' }, 2).map((o) => o.designation)).toEqual(['M31', 'NGC 6822']);
  });

  it('works on the built-in list', () => {
    expect(searchTargets(BUILTIN_TARGETS, { query: 'north america' }).map((o) => o.designation)).toEqual(['NGC 7000']);
    expect(searchTargets(BUILTIN_TARGETS, { query: 'ngc0224' })[0]?.designation).toBe('M31');
    expect(searchTargets(BUILTIN_TARGETS, { types: ['globular-cluster'], brightestMag: -5, faintestMag: 5 }).map((o) => o.designation).sort()).toEqual(['NGC 104', 'NGC 5139']);
  });
});
