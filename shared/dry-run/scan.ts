import { addDaysYmd } from '@/shared/time';
import { runWithSky, staticFindings } from '@/shared/dry-run/engine/run';
import { buildNightSky } from '@/shared/dry-run/sky/night-sky';
import type { DryRunInput, FindingCode } from '@/shared/dry-run/types';

/** One night of a scan. */
export interface NightScan {
  date: string;
  /** Shutter-open seconds of light frames. */
  integrationS: number;
  /** Of which in blocks with no sky finding (daylight, Moon, altitude, Sun). */
  usableIntegrationS: number;
  nightEnd: string | null;
  findings: { stop: number; warn: number; info: number };
  codes: FindingCode[];
}

/**
 * Dry-runs the same recipe on `nights` consecutive nights from `fromDate` (e.g. to find the
 * best nights of a season). The static checks run once; each night gets its own sky.
 * `onProgress(done, total)` is called after every night.
 */
export function scanNights(input: DryRunInput, fromDate: string, nights: number, onProgress?: (done: number, total: number) => void): NightScan[] {
  const fromStatic = staticFindings(input);
  const out: NightScan[] = [];
  for (let i = 0; i < nights; i += 1) {
    const date = addDaysYmd(fromDate, i);
    const night = { ...input, nightDate: date, startTime: undefined };
    const result = runWithSky(night, buildNightSky(input.site, date), fromStatic);
    const counts = { stop: 0, warn: 0, info: 0 };
    for (const f of result.findings) counts[f.severity] += 1;
    out.push({ date, integrationS: result.totals.shutterOpenS, usableIntegrationS: result.totals.usableShutterS, nightEnd: result.totals.nightEnd, findings: counts, codes: [...new Set(result.findings.map((f) => f.code))] });
    onProgress?.(i + 1, nights);
  }
  return out;
}
