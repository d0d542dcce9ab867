import type { StoredFrame } from '@/shared/calibration/types';
import type { FlatCombo } from '@/shared/schemas/calibration-api';
import { addDays } from '@/shared/night-date';
import { createNode } from '@/shared/recipe/factory';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { filterRefSchema } from '@/shared/recipe/steps';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { angleDiffDeg, wrap360 } from '@/shared/calibration/sky-geometry';
import { biasServes } from '@/shared/calibration/bias';
import type { BiasLibrarySet } from '@/shared/schemas/calibration-api';

/*
 * Flats are valid while optical train, focus, filter and rotator angle are unchanged
 * (trade-defaults.md "flats valid while", S18): the lights of a night are grouped by filter,
 * rotator angle and focuser position, and each group needs flats taken at the same three.
 */

/** Flats match a light's rotator angle within this (Nightloom choice: well inside what a flat tolerates for vignetting and dust shadows). */
export const FLAT_ROTATOR_TOLERANCE_DEG = 0.5;
/** …and its focuser position within this many steps (Nightloom choice: a focuser's own repeatability). */
export const FLAT_FOCUS_TOLERANCE_STEPS = 1;
/** Flats count for a night when taken that night or up to this many days later (Nightloom choice: panel flats the next day or two, before the train is touched). */
export const FLAT_VALID_DAYS_AFTER = 3;


/** A rotator angle rounded to 0.1°, in [0, 360). */
export function roundRotatorDeg(deg: number): number {
  const r = Math.round(wrap360(deg) * 10) / 10;
  return r >= 360 ? 0 : r;
}

const sameFilter = (a: string | null, b: string | null) => (a === null || b === null ? a === b : a.trim().toLowerCase() === b.trim().toLowerCase());
const rotatorMatches = (flat: number | null, combo: number | null) => (flat === null || combo === null ? flat === combo : angleDiffDeg(flat, combo) <= FLAT_ROTATOR_TOLERANCE_DEG + 1e-9);
const focusMatches = (flat: number | null, combo: number | null) => (flat === null || combo === null ? flat === combo : Math.abs(flat - combo) <= FLAT_FOCUS_TOLERANCE_STEPS);

/** True when a flat frame on record serves a combination of a night: same filter, rotator within 0.5° and focus within 1 step (null matches only null), taken that night to 3 days later. */
export function flatServes(flat: Pick<StoredFrame, 'filter' | 'rotatorAngleDeg' | 'focuserPositionSteps' | 'nightDate'>, combo: Pick<FlatCombo, 'filter' | 'rotatorAngleDeg' | 'focuserPositionSteps'>, nightDate: string): boolean {
  return (
    flat.nightDate >= nightDate &&
    flat.nightDate <= addDays(nightDate, FLAT_VALID_DAYS_AFTER) &&
    sameFilter(flat.filter, combo.filter) &&
    rotatorMatches(flat.rotatorAngleDeg, combo.rotatorAngleDeg) &&
    focusMatches(flat.focuserPositionSteps, combo.focuserPositionSteps)
  );
}

/** Ascending with nulls last. */
function compareNullable<T extends string | number>(a: T | null, b: T | null): number {
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  return typeof a === 'string' ? a.localeCompare(b as string) : (a as number) - (b as number);
}

/**
 * The night's distinct (filter, rotator angle to 0.1°, focus position) among its lights, with
 * the flats on record for each (`flatServes`) and whether fresh bias on record matches the
 * gain, offset and binning of each of its lights (`biasServes`: flats are taken at the lights'
 * settings and calibrated with bias at the same ones). Sorted by filter, rotator angle, focus; nulls last.
 */
export function flatCombos(lights: readonly StoredFrame[], flats: readonly StoredFrame[], nightDate: string, biasSets: readonly BiasLibrarySet[] = []): FlatCombo[] {
  const combos = new Map<string, { combo: FlatCombo; lights: StoredFrame[] }>();
  for (const l of lights) {
    if (l.frameType !== 'light' || l.nightDate !== nightDate) continue;
    const rotatorAngleDeg = l.rotatorAngleDeg === null ? null : roundRotatorDeg(l.rotatorAngleDeg);
    const key = JSON.stringify([l.filter, rotatorAngleDeg, l.focuserPositionSteps]);
    const found = combos.get(key);
    if (found) {
      found.combo.lightFrames += 1;
      found.lights.push(l);
    } else combos.set(key, { combo: { filter: l.filter, rotatorAngleDeg, focuserPositionSteps: l.focuserPositionSteps, lightFrames: 1, flatFrames: 0, biasOnRecord: false }, lights: [l] });
  }
  const out = [...combos.values()].map(({ combo, lights: its }) => ({
    ...combo,
    flatFrames: flats.filter((f) => f.frameType === 'flat' && flatServes(f, combo, nightDate)).length,
    biasOnRecord: its.every((l) => biasServes(biasSets, l)),
  }));
  return out.sort((a, b) => compareNullable(a.filter, b.filter) || compareNullable(a.rotatorAngleDeg, b.rotatorAngleDeg) || compareNullable(a.focuserPositionSteps, b.focuserPositionSteps));
}

/** Recorded positions for a flats step, or undefined when the lights recorded neither (or values the step cannot hold). */
function positionsOf(c: FlatCombo): { kind: 'positions'; rotatorAngleDeg?: number; focuserPositionSteps?: number } | undefined {
  const rotatorAngleDeg = c.rotatorAngleDeg === null ? undefined : roundRotatorDeg(c.rotatorAngleDeg);
  const focus = c.focuserPositionSteps;
  const focuserPositionSteps = focus !== null && Number.isInteger(focus) && focus >= 0 && focus <= 1_000_000 ? focus : undefined;
  if (rotatorAngleDeg === undefined && focuserPositionSteps === undefined) return undefined;
  return { kind: 'positions', ...(rotatorAngleDeg === undefined ? {} : { rotatorAngleDeg }), ...(focuserPositionSteps === undefined ? {} : { focuserPositionSteps }) };
}

function introNote(source: 'panel' | 'sky', skippedFrames: number): string {
  const lines = ['Before each flats step, return the rotator and the focuser to the positions the lights were taken at (the step names them).'];
  if (source === 'panel') lines.push('The optical train must be unchanged since the lights: same camera orientation, spacing, filters and dust. Flats are valid only while optical train, focus, filter and rotator angle are unchanged.');
  else lines.push('Sky flats need the twilight window: the dry run checks that they fit.');
  if (skippedFrames > 0) lines.push(`${skippedFrames} light frame${skippedFrames === 1 ? '' : 's'} recorded no usable filter name and ${skippedFrames === 1 ? 'has' : 'have'} no flats step here: take their flats by hand.`);
  return lines.join('\n');
}

/**
 * A flats recipe: a note first (return the rotator and focuser to the recorded positions; for a
 * panel, the optical train unchanged since the lights: trade-defaults.md "flats valid while",
 * S18), then one flats step per combination with a filter, `count` flats from `source`, and the
 * recorded positions to return to. Combinations without a filter name (or with one no step can
 * hold) are left out and counted in the note. The dry run checks that sky flats fit their window.
 */
export function flatsRecipeTree(combos: readonly FlatCombo[], source: 'panel' | 'sky', count: number): RecipeTree {
  const steps: RecipeNode[] = [];
  let skippedFrames = 0;
  for (const c of combos) {
    const filter = c.filter === null ? undefined : filterRefSchema.safeParse(c.filter).data;
    if (filter === undefined) {
      skippedFrames += c.lightFrames;
      continue;
    }
    const matchFramingOf = positionsOf(c);
    steps.push(createNode('flats', { filters: [filter], count, source, ...(matchFramingOf ? { matchFramingOf } : {}) }));
  }
  const note = createNode('note', { text: introNote(source, skippedFrames), label: 'Before the flats' });
  return recipeTreeSchema.parse({ children: [note, ...steps] });
}
