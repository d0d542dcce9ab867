import { isSunEvent } from '@/shared/recipe/fields';
import { formatNumber } from '@/shared/recipe/format';
import { formatInZone } from '@/shared/time';
import type { Sim } from '@/shared/dry-run/engine/state';

/** Local wall-clock time at the site, "21:42". */
export function hhmm(sim: Sim, ms: number): string {
  return formatInZone(new Date(ms), sim.site.timeZone);
}

/** A number as people write it (two decimals at most, a true minus sign). */
export const n = formatNumber;

/** "3 min" / "45 s" for a duration. */
export function minutes(seconds: number): string {
  return seconds >= 120 ? `${Math.round(seconds / 60)} min` : `${Math.round(seconds)} s`;
}

/** A fixed time as people say it: "astronomical dusk (20:29)" or "23:30". */
export function whenText(sim: Sim, text: string, ms: number): string {
  return isSunEvent(text) ? `${text.replace('-', ' ')} (${hhmm(sim, ms)})` : hhmm(sim, ms);
}
