import type { StoredFrame } from '@/shared/calibration/types';
import type { DarkToShoot, DarkLibrarySet } from '@/shared/schemas/calibration-api';
import type { DarkSet } from '@/shared/dry-run/types';
import type { RecipeTree } from '@/shared/recipe/types';

/** Dark frames grouped into library sets: one per (exposure, gain, offset, binning, readout mode, temperature rounded to 1 °C, night). */
export function groupDarkFrames(frames: readonly StoredFrame[], validityMonths: number, today: string): DarkLibrarySet[] {
  void frames;
  void validityMonths;
  void today;
  throw new Error('not implemented');
}

/** True when a set taken on `takenOn` is older than `validityMonths` calendar months on `today` (both YYYY-MM-DD). */
export function isDarkSetStale(takenOn: string, validityMonths: number, today: string): boolean {
  void takenOn;
  void validityMonths;
  void today;
  throw new Error('not implemented');
}

/** Library sets as the dry run takes them. */
export function darkLibraryForDryRun(sets: readonly DarkLibrarySet[]): DarkSet[] {
  void sets;
  throw new Error('not implemented');
}

/** A recipe for a cloudy night that shoots the given dark sets: per temperature a cool, a note to cover the optics, darks grouped by gain/offset/binning, a final warm. */
export function darksRecipeTree(darks: readonly DarkToShoot[], count: number): RecipeTree {
  void darks;
  void count;
  throw new Error('not implemented');
}
