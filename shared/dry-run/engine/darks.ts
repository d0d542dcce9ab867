import type { DarkMatchKey } from '@/shared/dry-run/engine/record';
import type { Sim } from '@/shared/dry-run/engine/state';
import { n } from '@/shared/dry-run/engine/text';
import type { DarkSet, DarksNeeded } from '@/shared/dry-run/types';

type DarkKey = DarkMatchKey;

/**
 * Darks match on exposure, gain, offset, binning, readout mode and set-point ±1 °C
 * (trade-defaults.md "calibration", S17, S44). A light without a gain (offset) setting takes
 * any set's; a set without one (null) matches only such a light.
 */
function matches(set: Omit<DarkSet, 'frames' | 'takenAt'> | DarkKey, light: DarkKey): boolean {
  return (
    Math.abs(set.exposureS - light.exposureS) < 1e-6 &&
    (light.gain === null || set.gain === light.gain) &&
    (light.offset === null || set.offset === light.offset) &&
    set.binning === light.binning &&
    (!set.readoutMode || !light.readoutMode || set.readoutMode === light.readoutMode) &&
    Math.abs(set.temperatureC - light.temperatureC) <= 1
  );
}

/**
 * The date `months` calendar months before `dateYmd`, as epoch ms (UTC midnight); a day past the
 * month's end rolls over as `Date.UTC` does (31 August − 6 months → 3 March). Dark library
 * staleness uses the same rule (`shared/calibration/darks.ts`).
 */
export function monthsBefore(dateYmd: string, months: number): number {
  const [y, m, d] = dateYmd.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1 - months, d);
}

/**
 * The distinct dark sets the night's light frames need (rule 4), with whether the library (or a
 * darks step tonight) covers them and whether a match is younger than the validity (6 months by
 * default: S22, common practice). Raises `darks-missing` and `darks-stale`.
 */
export function darksCoverage(sim: Sim): DarksNeeded[] {
  const groups = new Map<string, DarksNeeded>();
  for (const use of sim.out.lights) {
    const key = [use.exposureS, use.gain, use.offset, use.binning, use.readoutMode, use.temperatureC].join('|');
    const g = groups.get(key);
    if (g) {
      g.lightFrames += use.frames;
      if (!g.nodeIds.includes(use.nodeId)) g.nodeIds.push(use.nodeId);
    } else {
      const { nodeId, frames, ...rest } = use;
      groups.set(key, { ...rest, lightFrames: frames, covered: false, fresh: false, nodeIds: [nodeId] });
    }
  }
  const cutoff = monthsBefore(sim.input.nightDate, sim.opts.darkValidityMonths);
  const library = sim.input.darkLibrary ?? [];
  for (const need of groups.values()) {
    const tonight = sim.out.darksTaken.some((d) => matches(d, need));
    const found = library.filter((set) => matches(set, need));
    need.covered = tonight || found.length > 0;
    need.fresh = tonight || found.some((set) => Date.parse(set.takenAt) >= cutoff);
    report(sim, need);
  }
  return [...groups.values()];
}

function report(sim: Sim, need: DarksNeeded): void {
  const what = `${n(need.exposureS)} s, gain ${need.gain ?? 'as set'}, offset ${need.offset ?? 'as set'}, bin ${need.binning} at ${n(need.temperatureC)} °C`;
  const nodeId = need.nodeIds[0] ?? null;
  const key = `${need.exposureS}|${need.gain}|${need.offset}|${need.binning}|${need.temperatureC}`;
  if (!need.covered) {
    sim.out.finding({ code: 'darks-missing', severity: 'warn', ms: null, nodeId, key: `darks-missing|${key}`, message: `No darks for ${what} in the library`, fix: 'Take a set of 30 darks at these settings (a darks step at the end of the night, optics covered)' });
  } else if (!need.fresh) {
    sim.out.finding({ code: 'darks-stale', severity: 'warn', ms: null, nodeId, key: `darks-stale|${key}`, message: `The darks for ${what} are older than ${sim.opts.darkValidityMonths} months`, fix: 'Retake these darks; rebuild the library after a firmware change too' });
  }
}
