/**
 * Capture history in words and series: integration by filter, and the cumulative integration
 * per filter over the nights (what the chart draws). Pure, so unit tests read it directly.
 */
import { formatHm, formatSpanS } from '@/components/dry-run/run-format';
import type { FilterIntegration } from '@/shared/schemas/calibration-api';

/** A filter's name as shown; frames without a FILTER card are "No filter". */
export function filterName(filter: string | null): string {
  return filter ?? 'No filter';
}

/** "2 h 05 min" of integration. */
export function integrationText(seconds: number): string {
  return seconds <= 0 ? '0 min' : formatSpanS(seconds);
}

/** "Ha 3:20 · OIII 2:05": h:mm per filter, most integration first. */
export function byFilterText(byFilter: readonly FilterIntegration[]): string {
  return sortByIntegration(byFilter)
    .map((f) => `${filterName(f.filter)} ${formatHm(f.seconds)}`)
    .join(' · ');
}

export function sortByIntegration(byFilter: readonly FilterIntegration[]): FilterIntegration[] {
  return [...byFilter].sort((a, b) => b.seconds - a.seconds || filterName(a.filter).localeCompare(filterName(b.filter)));
}

/** The PA 180° from `deg`, in 0…360 (the other side of a meridian flip). */
export function flippedAngle(deg: number): number {
  return (((deg + 180) % 360) + 360) % 360;
}

/** A night of history as the chart needs it. */
export type NightIntegration = { nightDate: string; byFilter: readonly FilterIntegration[] };

/** One filter's running total: after each night, the integration so far (seconds). */
export type CumulativeSeries = { filter: string | null; points: { nightDate: string; ms: number; seconds: number }[] };

const dayMs = (ymd: string) => Date.parse(`${ymd}T12:00:00Z`);

/**
 * Cumulative integration per filter over the nights (oldest first): every filter gets a point on
 * every night from its first one, so its line steps up on the nights it was shot and stays flat
 * between them. Filters are ordered by total integration, most first.
 */
export function cumulativeSeries(nights: readonly NightIntegration[]): CumulativeSeries[] {
  const sorted = [...nights].sort((a, b) => a.nightDate.localeCompare(b.nightDate));
  const totals = new Map<string | null, number>();
  for (const n of sorted) for (const f of n.byFilter) totals.set(f.filter, (totals.get(f.filter) ?? 0) + f.seconds);
  const filters = [...totals.keys()].sort((a, b) => (totals.get(b) ?? 0) - (totals.get(a) ?? 0) || filterName(a).localeCompare(filterName(b)));
  return filters.map((filter) => {
    let sum = 0;
    let started = false;
    const points: CumulativeSeries['points'] = [];
    for (const n of sorted) {
      const s = n.byFilter.filter((f) => f.filter === filter).reduce((acc, f) => acc + f.seconds, 0);
      if (s > 0) started = true;
      sum += s;
      if (started) points.push({ nightDate: n.nightDate, ms: dayMs(n.nightDate), seconds: sum });
    }
    return { filter, points };
  });
}

/** A "nice" upper bound for the hours axis and its grid step (0.5, 1, 2, 5, 10 … hours). */
export function hoursAxis(maxSeconds: number): { maxHours: number; stepHours: number } {
  const hours = Math.max(maxSeconds / 3600, 0.5);
  const steps = [0.25, 0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500];
  const stepHours = steps.find((s) => hours / s <= 4) ?? 1000;
  return { maxHours: Math.ceil(hours / stepHours) * stepHours, stepHours };
}
