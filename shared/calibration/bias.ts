import type { StoredFrame } from '@/shared/calibration/types';
import { darkFrameTemperatureC, isDarkSetStale, keyPart as part } from '@/shared/calibration/darks';
import type { BiasLibrarySet } from '@/shared/schemas/calibration-api';

/*
 * Bias frames calibrate flats (with darks at the flats' exposure as the alternative): they must
 * match the flats' gain, offset and binning (common practice), and flats are taken at the lights'
 * settings. Bias sets are grouped from recorded frames only, like grouped dark sets.
 */

/** The settings a bias set is told apart by, plus its night. */
interface BiasGroupKey {
  gain: number | null;
  offset: number | null;
  binning: number;
  readoutMode: string | null;
  temperatureC: number | null;
  nightDate: string;
}

/** A stable, readable key of a bias set, e.g. `2026-03-14|g100|o50|b1|-10C|High%20Gain` (`-C` without a temperature). */
export function biasGroupKey(k: BiasGroupKey): string {
  return [k.nightDate, `g${part(k.gain)}`, `o${part(k.offset)}`, `b${k.binning}`, `${part(k.temperatureC)}C`, encodeURIComponent(k.readoutMode ?? '')].join('|');
}

/**
 * Bias frames grouped into library sets: one per (gain, offset, binning, readout mode,
 * temperature rounded to 1 °C, night). A bias frame may record no temperature: its set's
 * temperature is null. Staleness follows the dark validity (`isDarkSetStale`). Sorted by
 * temperature (none last), then gain, offset, binning, then newest night first.
 */
export function groupBiasFrames(frames: readonly StoredFrame[], validityMonths: number, today: string): BiasLibrarySet[] {
  const groups = new Map<string, BiasLibrarySet>();
  for (const f of frames) {
    if (f.frameType !== 'bias') continue;
    const key: BiasGroupKey = { gain: f.gain, offset: f.offset, binning: f.binning, readoutMode: f.readoutMode, temperatureC: darkFrameTemperatureC(f), nightDate: f.nightDate };
    const id = `bias:${biasGroupKey(key)}`;
    const found = groups.get(id);
    if (found) {
      found.frames += 1;
      continue;
    }
    const { nightDate, ...settings } = key;
    groups.set(id, { id, source: 'intake', ...settings, frames: 1, takenOn: nightDate, stale: isDarkSetStale(nightDate, validityMonths, today) });
  }
  return [...groups.values()].sort(compareBiasSets);
}

/** Ascending with nulls last. */
const byNullable = (a: number | null, b: number | null) => (a === null || b === null ? (a === b ? 0 : a === null ? 1 : -1) : a - b);

export function compareBiasSets(a: BiasLibrarySet, b: BiasLibrarySet): number {
  return (
    byNullable(a.temperatureC, b.temperatureC) ||
    byNullable(a.gain, b.gain) ||
    byNullable(a.offset, b.offset) ||
    a.binning - b.binning ||
    (a.takenOn < b.takenOn ? 1 : a.takenOn > b.takenOn ? -1 : 0) ||
    (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
  );
}

/**
 * True when a fresh bias set serves lights (and so their flats) at these settings: same binning,
 * same gain and offset; a light without a gain (offset) takes any set's, as darks do
 * (`shared/dry-run/engine/darks.ts`). Readout mode and temperature are not matched: bias is the
 * read-out floor at the flats' gain and offset (common practice).
 */
export function biasServes(sets: readonly BiasLibrarySet[], light: { gain: number | null; offset: number | null; binning: number }): boolean {
  return sets.some((s) => !s.stale && s.binning === light.binning && (light.gain === null || s.gain === light.gain) && (light.offset === null || s.offset === light.offset));
}
