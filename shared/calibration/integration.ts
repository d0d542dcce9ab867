import type { StoredFrame } from '@/shared/calibration/types';
import type { FilterIntegration } from '@/shared/schemas/calibration-api';

/*
 * Integration totals of light frames: frames and seconds, per filter and per night.
 */

type Light = Pick<StoredFrame, 'filter' | 'exposureS'>;

/** Frames and seconds per filter, sorted by filter name with frames without a filter last. */
export function integrationByFilter(frames: readonly Light[]): FilterIntegration[] {
  const by = new Map<string | null, FilterIntegration>();
  for (const f of frames) {
    const row = by.get(f.filter) ?? { filter: f.filter, frames: 0, seconds: 0 };
    row.frames += 1;
    row.seconds += f.exposureS;
    by.set(f.filter, row);
  }
  return [...by.values()].sort((a, b) => compareFilterNames(a.filter, b.filter));
}

/** Filter names in alphabetical order, no filter last. */
export function compareFilterNames(a: string | null, b: string | null): number {
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  return a.localeCompare(b);
}

/** Sum of exposure times, seconds. */
export function totalSeconds(frames: readonly Light[]): number {
  return frames.reduce((s, f) => s + f.exposureS, 0);
}

/** Distinct night dates, oldest first. */
export function nightsOf(frames: readonly Pick<StoredFrame, 'nightDate'>[]): string[] {
  return [...new Set(frames.map((f) => f.nightDate))].sort();
}
