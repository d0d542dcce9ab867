import { runWithSky } from '@/shared/dry-run/engine/run';
import { buildNightSky } from '@/shared/dry-run/sky/night-sky';
import type { DryRunInput, DryRunResult } from '@/shared/dry-run/types';

export * from '@/shared/dry-run/types';
export { scanNights, type NightScan } from '@/shared/dry-run/scan';

/**
 * The dry run (dry-run.md): plays a recipe against one night's sky at a site on a rig, pure
 * and without I/O. Returns the timeline (events with pointing, hour angle, pier side, airmass,
 * Moon separation), the findings (the run's and the static checks'), the totals, the night's sky
 * and the darks the lights need. The tree must be parsed (`recipeTreeSchema`: defaults filled).
 * Models and their bases: shared/dry-run/README.md.
 */
export function runDryRun(input: DryRunInput): DryRunResult {
  return runWithSky(input, buildNightSky(input.site, input.nightDate));
}
