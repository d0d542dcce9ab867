import type { DarksNeeded } from '@/shared/dry-run/types';
import type { DarkToShoot } from '@/shared/schemas/calibration-api';

export type DarkStatus = 'fresh' | 'stale' | 'missing';

/** On record (fresh in the library or shot tonight), stale (only older sets), or missing. */
export function darkStatus(d: Pick<DarksNeeded, 'covered' | 'fresh'>): DarkStatus {
  if (!d.covered) return 'missing';
  return d.fresh ? 'fresh' : 'stale';
}

/**
 * The sets to shoot on a cloudy night: every missing or stale one, as the darks-recipe request
 * takes them (once each: sets that differ only by readout mode are shot as one).
 */
export function darksToShoot(needed: readonly DarksNeeded[]): DarkToShoot[] {
  const sets = new Map<string, DarkToShoot>();
  for (const d of needed) {
    if (darkStatus(d) === 'fresh') continue;
    const set = { exposureS: d.exposureS, gain: d.gain, offset: d.offset, binning: d.binning, temperatureC: d.temperatureC };
    sets.set(JSON.stringify(set), set);
  }
  return [...sets.values()];
}
