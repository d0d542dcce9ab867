import type { StoredFrame } from '@/shared/calibration/types';
import type { DarkToShoot, DarkLibrarySet } from '@/shared/schemas/calibration-api';
import { monthsBefore } from '@/shared/dry-run/engine/darks';
import type { DarkMatchKey } from '@/shared/dry-run/engine/record';
import type { DarkSet } from '@/shared/dry-run/types';
import { createNode } from '@/shared/recipe/factory';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

/** Most exposures one darks step holds (the recipe schema's limit). */
export const DARKS_STEP_MAX_EXPOSURES = 50;

/** The settings a dark set is told apart by (the dry run's `DarkMatchKey`), plus its night. */
interface DarkGroupKey extends DarkMatchKey {
  nightDate: string;
}

/** One setting in a set key: the number, or `-` when the frames did not record it. */
export const keyPart = (v: number | null) => (v === null ? '-' : String(v));

/** A stable, readable key of a grouped set, e.g. `2026-03-14|300s|g100|o50|b1|-10C|High%20Gain`. */
export function darkGroupKey(k: DarkGroupKey): string {
  return [k.nightDate, `${k.exposureS}s`, `g${keyPart(k.gain)}`, `o${keyPart(k.offset)}`, `b${k.binning}`, `${k.temperatureC}C`, encodeURIComponent(k.readoutMode ?? '')].join('|');
}

/** Set-point of a dark frame rounded to 1 °C: SET-TEMP, else the sensor reading; null without either. */
export function darkFrameTemperatureC(frame: Pick<StoredFrame, 'setTempC' | 'sensorTempC'>): number | null {
  const t = frame.setTempC ?? frame.sensorTempC;
  // Math.round(-9.5) is -9; round half away from zero so −9.5 °C and 9.5 °C behave alike.
  return t === null ? null : Math.sign(t) * Math.round(Math.abs(t)) || 0;
}

/**
 * Dark frames grouped into library sets: one per (exposure, gain, offset, binning, readout mode,
 * temperature rounded to 1 °C, night). Intake refuses darks without SET-TEMP and CCD-TEMP, so
 * every stored dark has a temperature; a frame without one is left out. Sorted by temperature,
 * exposure, then newest night first.
 */
export function groupDarkFrames(frames: readonly StoredFrame[], validityMonths: number, today: string): DarkLibrarySet[] {
  const groups = new Map<string, DarkLibrarySet>();
  for (const f of frames) {
    if (f.frameType !== 'dark') continue;
    const temperatureC = darkFrameTemperatureC(f);
    if (temperatureC === null) continue;
    const key: DarkGroupKey = { exposureS: f.exposureS, gain: f.gain, offset: f.offset, binning: f.binning, readoutMode: f.readoutMode, temperatureC, nightDate: f.nightDate };
    const id = `intake:${darkGroupKey(key)}`;
    const found = groups.get(id);
    if (found) {
      found.frames += 1;
      continue;
    }
    const { nightDate, ...settings } = key;
    groups.set(id, { id, source: 'intake', version: null, ...settings, frames: 1, takenOn: nightDate, stale: isDarkSetStale(nightDate, validityMonths, today), notes: '' });
  }
  return [...groups.values()].sort(compareSets);
}

function compareSets(a: DarkLibrarySet, b: DarkLibrarySet): number {
  const byId = a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
  return a.temperatureC - b.temperatureC || a.exposureS - b.exposureS || (a.takenOn < b.takenOn ? 1 : a.takenOn > b.takenOn ? -1 : 0) || byId;
}

/**
 * True when a set taken on `takenOn` is older than `validityMonths` calendar months on `today`
 * (both YYYY-MM-DD): taken before the date that many months back. The dry run's rule
 * (`monthsBefore`), so the library and the dry run agree; a set exactly 6 months old is fresh.
 */
export function isDarkSetStale(takenOn: string, validityMonths: number, today: string): boolean {
  return Date.parse(`${takenOn}T00:00:00Z`) < monthsBefore(today, validityMonths);
}

/** Library sets as the dry run takes them (taken at noon UTC of `takenOn`, so the dry run's cutoff at midnight gives the same staleness). */
export function darkLibraryForDryRun(sets: readonly DarkLibrarySet[]): DarkSet[] {
  return sets.map((s) => ({
    exposureS: s.exposureS,
    gain: s.gain,
    offset: s.offset,
    binning: s.binning,
    ...(s.readoutMode ? { readoutMode: s.readoutMode } : {}),
    temperatureC: s.temperatureC,
    frames: s.frames,
    takenAt: `${s.takenOn}T12:00:00Z`,
  }));
}

/** Splits a list into pieces of at most `size`. */
function chunks<T>(items: readonly T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

/** The requested sets by temperature (warmest first), then by (gain, offset, binning), each with its distinct exposures ascending. */
export function darkStepsPlan(darks: readonly DarkToShoot[]): { temperatureC: number; steps: { gain: number | null; offset: number | null; binning: number; exposuresS: number[] }[] }[] {
  const byTemp = new Map<number, Map<string, { gain: number | null; offset: number | null; binning: number; exposures: Set<number> }>>();
  for (const d of darks) {
    const temp = byTemp.get(d.temperatureC) ?? new Map();
    byTemp.set(d.temperatureC, temp);
    const key = `${keyPart(d.gain)}|${keyPart(d.offset)}|${d.binning}`;
    const step = temp.get(key) ?? { gain: d.gain, offset: d.offset, binning: d.binning, exposures: new Set<number>() };
    temp.set(key, step);
    step.exposures.add(d.exposureS);
  }
  return [...byTemp.entries()]
    .sort(([a], [b]) => b - a)
    .map(([temperatureC, steps]) => ({
      temperatureC,
      steps: [...steps.values()].map((s) => ({ gain: s.gain, offset: s.offset, binning: s.binning, exposuresS: [...s.exposures].sort((x, y) => x - y) })),
    }));
}

const COVER_NOTE =
  'Cover the optics before these darks: lens cap on or dust cover closed, and no light leaks at the camera. ' +
  'Darks must be taken at the same exposure, gain, offset, binning and sensor temperature as the lights they calibrate.';

/**
 * A recipe for a cloudy night that shoots the given dark sets: a note to cover the optics, then
 * per temperature (warmest first, so the camera only cools further: Nightloom choice) a cool to
 * that set-point and one darks step per (gain, offset, binning) with its distinct exposures
 * (split every 50, the step's limit), and a final warm. `count` frames per exposure.
 */
export function darksRecipeTree(darks: readonly DarkToShoot[], count: number): RecipeTree {
  const children: RecipeNode[] = [createNode('note', { text: COVER_NOTE, label: 'Cover the optics' })];
  for (const { temperatureC, steps } of darkStepsPlan(darks)) {
    children.push(createNode('cool', { setpointC: temperatureC }));
    for (const s of steps) {
      for (const exposuresS of chunks(s.exposuresS, DARKS_STEP_MAX_EXPOSURES)) {
        children.push(createNode('darks', { exposuresS, count, temperatureC, binning: s.binning, ...(s.gain === null ? {} : { gain: s.gain }), ...(s.offset === null ? {} : { offset: s.offset }) }));
      }
    }
  }
  children.push(createNode('warm'));
  return recipeTreeSchema.parse({ children });
}
