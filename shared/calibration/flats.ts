import type { StoredFrame } from '@/shared/calibration/types';
import type { FlatCombo } from '@/shared/schemas/calibration-api';
import type { RecipeTree } from '@/shared/recipe/types';

/** The night's distinct (filter, rotator angle, focus position) among its lights, with the flats on record for each. */
export function flatCombos(lights: readonly StoredFrame[], flats: readonly StoredFrame[], nightDate: string): FlatCombo[] {
  void lights;
  void flats;
  void nightDate;
  throw new Error('not implemented');
}

/** A flats recipe: per combination a flats step returning the rotator and focuser to the recorded positions. */
export function flatsRecipeTree(combos: readonly FlatCombo[], source: 'panel' | 'sky', count: number): RecipeTree {
  void combos;
  void source;
  void count;
  throw new Error('not implemented');
}
