import { describe, expect, it } from 'vitest';
import { catalogueMatch, centreText, isUnnamedObject, targetAtCentre, targetFromMatch, targetTitle } from '@/components/history/object-target';
import { historySummary, linkLight, objectHistory } from '@/shared/calibration/history';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import type { CatalogueSearchResult, TargetInput } from '@/shared/schemas/target';
import { BUILTIN_TARGETS } from '@/shared/targets/builtin';
import { searchTargets } from '@/shared/targets/search';
import { storedFrame } from './calibration-fixtures';

/*
 * "Add as a target" for lights no target matched: the catalogue object their OBJECT names (the
 * built-in list searched as GET /api/catalogue/search does), else a target at their recorded
 * centre; either way the lights then link to it (history is computed when read).
 */

/** What the search API answers for `q` over the built-in list (no imported catalogues). */
function search(q: string): CatalogueSearchResult[] {
  return searchTargets(BUILTIN_TARGETS, { query: q }).map((o) => ({ ...o, source: 'builtin', catalogueId: null, catalogueName: null, darkMinutes: null }));
}

// M 42's J2000 centre as the built-in list gives it (05:35:17.3 −05:23:28).
const M42 = { raDeg: 83.8221, decDeg: -5.3911 };

/** A plate-solved 300 s light with this OBJECT, taken 20 Nov 2026 at 21:00 UTC plus `minute`. */
function light(object: string | undefined, at: { raDeg: number; decDeg: number }, minute = 0): StoredFrame {
  const dateObs = `2026-11-20T21:${String(minute).padStart(2, '0')}:00`;
  return storedFrame({ type: 'Light Frame', dateObs, exposureS: 300, filter: 'Ha', object, wcs: { ...at, positionAngleDeg: 90, scaleArcsecPerPx: 1.46 } });
}

/** The new target as history links to it. */
const asRef = (t: TargetInput): HistoryTargetRef => ({ id: 'new', designation: t.designation, name: t.name, aliases: t.aliases, raDeg: t.raDeg, decDeg: t.decDeg, framings: [] });

describe('catalogueMatch', () => {
  it('takes the one object the OBJECT text names exactly, among the type-ahead hits', () => {
    expect(catalogueMatch('M 42', search('M 42'))?.designation).toBe('M42');
    // "m4" also finds M40–M49 by substring; only M4 is named so
    expect(search('M 4').length).toBeGreaterThan(1);
    expect(catalogueMatch('M 4', search('M 4'))?.designation).toBe('M4');
    expect(catalogueMatch('ngc1976', search('ngc1976'))?.designation).toBe('M42');
    expect(catalogueMatch('orion nebula', search('orion nebula'))?.designation).toBe('M42');
  });

  it('takes the only hit when nothing is named exactly, and none when several could be meant or none is found', () => {
    expect(catalogueMatch('Rosette', search('Rosette'))?.designation).toBe('NGC 2244');
    expect(catalogueMatch('Nebula', search('Nebula'))).toBeNull();
    expect(catalogueMatch('Sh2-240', search('Sh2-240'))).toBeNull();
  });
});

describe('targetFromMatch', () => {
  it('copies the catalogue object and adds the OBJECT text as an alias only when the object does not go by it', () => {
    const m42 = targetFromMatch(catalogueMatch('M 42', search('M 42'))!, 'M 42');
    expect(m42).toMatchObject({ designation: 'M42', name: 'Orion Nebula', aliases: ['NGC 1976'], type: 'emission-nebula', notes: '' });
    expect(targetTitle(m42)).toBe('M42 · Orion Nebula');
    const rosette = targetFromMatch(catalogueMatch('Rosette', search('Rosette'))!, ' Rosette ');
    expect(rosette.aliases).toEqual(['Rosette']);
  });

  it('links the lights that were unmatched, by position and by name', () => {
    const frames = [light('M 42', M42, 0), light('M 42', M42, 5)];
    expect(historySummary(frames, [], new Map())[0]).toMatchObject({ targetId: null, label: 'M 42', frames: 2 });
    const target = targetFromMatch(catalogueMatch('M 42', search('M 42'))!, 'M 42');
    expect(frames.map((f) => linkLight(f, [asRef(target)]))).toEqual(['new', 'new']);
    expect(historySummary(frames, [asRef(target)], new Map())[0]).toMatchObject({ targetId: 'new', label: 'M42', frames: 2, seconds: 600 });
  });
});

describe('targetAtCentre', () => {
  it('puts the target at the first recorded framing, named by the OBJECT, and the lights then link to it', () => {
    const at = { raDeg: 84.8, decDeg: 28.03 };
    const frames = [light('Sh2-240', at, 0), light('Sh2-240', at, 5)];
    const history = objectHistory('Sh2-240', frames, []);
    const target = targetAtCentre('Sh2-240', history)!;
    expect(target).toMatchObject({ designation: 'Sh2-240', name: '', aliases: [], type: 'other', majorArcmin: 0 });
    expect(target.raDeg).toBeCloseTo(at.raDeg, 4);
    expect(target.decDeg).toBeCloseTo(at.decDeg, 4);
    expect(centreText(target)).toBe('05:39:12.0  +28:01:48');
    expect(objectHistory('Sh2-240', frames, [asRef(target)]).target.frames).toBe(0);
    expect(historySummary(frames, [asRef(target)], new Map())[0]).toMatchObject({ targetId: 'new', frames: 2 });
  });

  it('offers nothing without a plate solution or an OBJECT name', () => {
    const unsolved = storedFrame({ type: 'Light Frame', dateObs: '2026-11-20T21:00:00', exposureS: 300, object: 'Sh2-240' });
    expect(targetAtCentre('Sh2-240', objectHistory('Sh2-240', [unsolved], []))).toBeNull();
    const unnamed = light(undefined, { raDeg: 84.8, decDeg: 28.03 });
    const history = objectHistory('Unnamed', [unnamed], []);
    expect(history.target.label).toBe('Unnamed');
    expect(isUnnamedObject(history.target.label)).toBe(true);
    expect(isUnnamedObject('M 42')).toBe(false);
    expect(targetAtCentre('Unnamed', history)).toBeNull();
  });

  it('cuts an OBJECT longer than a designation may be', () => {
    const long = 'A very long object name typed into the capture software by hand';
    expect(long.length).toBeGreaterThan(60);
    const target = targetAtCentre(long, objectHistory(long, [light(long, M42)], []))!;
    expect(target.designation).toBe(long.slice(0, 60));
  });
});
