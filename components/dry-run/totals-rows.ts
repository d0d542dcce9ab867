import type { DryRunFinding, DryRunTotals, OverheadKind } from '@/shared/dry-run/types';

export type Severity = DryRunFinding['severity'];

export const OVERHEAD_LABEL: Record<OverheadKind, string> = {
  cool: 'Cooling',
  warm: 'Warming',
  slew: 'Slews',
  centre: 'Centring',
  rotate: 'Rotation',
  focus: 'Focus runs',
  guide: 'Guider starts',
  flip: 'Meridian flips',
  download: 'Downloads',
  dither: 'Dither and settle',
  'filter-change': 'Filter changes',
  lost: 'Frames cut by a flip',
  flats: 'Flats',
  darks: 'Darks',
  park: 'Park',
};

export type FilterTotal = { filter: string; frames: number; seconds: number };
export type TargetTotal = { targetId: string; label: string; frames: number; seconds: number; filters: FilterTotal[] };

/** Position in a preferred order; unknown keys go last, in their own order. */
const rank = (order: readonly string[], key: string) => {
  const i = order.indexOf(key);
  return i === -1 ? order.length : i;
};

/**
 * Integration per target and per filter, with each target's sum, in the night's order (targets
 * as first reached, filters as first exposed): stored totals do not keep their key order.
 */
export function integrationRows(totals: DryRunTotals, targetLabel: (targetId: string) => string, order: { targets: readonly string[]; filters: readonly string[] } = { targets: [], filters: [] }): TargetTotal[] {
  const entries = Object.entries(totals.integrationByTargetAndFilter).sort(([a], [b]) => rank(order.targets, a) - rank(order.targets, b));
  return entries.map(([targetId, byFilter]) => {
    const filters = Object.entries(byFilter)
      .map(([filter, t]) => ({ filter, frames: t.frames, seconds: t.seconds }))
      .sort((a, b) => rank(order.filters, a.filter) - rank(order.filters, b.filter));
    return {
      targetId,
      label: targetId === '' ? 'Outside stages' : targetLabel(targetId),
      frames: filters.reduce((sum, f) => sum + f.frames, 0),
      seconds: filters.reduce((sum, f) => sum + f.seconds, 0),
      filters,
    };
  });
}

/** Overheads that took any time, largest first. */
export function overheadRows(totals: DryRunTotals): { kind: string; label: string; seconds: number }[] {
  return Object.entries(totals.overheadByKind)
    .filter(([, seconds]) => seconds >= 0.5)
    .map(([kind, seconds]) => ({ kind, label: OVERHEAD_LABEL[kind as OverheadKind] ?? kind, seconds }))
    .sort((a, b) => b.seconds - a.seconds);
}

export function overheadTotalS(totals: DryRunTotals): number {
  return Object.values(totals.overheadByKind).reduce((sum, s) => sum + s, 0);
}

export type SeverityCounts = Record<Severity, number>;

export function findingCounts(findings: readonly DryRunFinding[]): SeverityCounts {
  const counts: SeverityCounts = { stop: 0, warn: 0, info: 0 };
  for (const f of findings) counts[f.severity] += 1;
  return counts;
}

export const SEVERITIES: Severity[] = ['stop', 'warn', 'info'];

/** Findings by severity, stop first; inside a group by time (untimed last), then as reported. */
export function findingGroups(findings: readonly DryRunFinding[]): { severity: Severity; findings: DryRunFinding[] }[] {
  const timeOf = (f: DryRunFinding) => (f.time ? Date.parse(f.time) : Number.POSITIVE_INFINITY);
  return SEVERITIES.map((severity) => ({
    severity,
    findings: findings
      .map((f, i) => ({ f, i }))
      .filter(({ f }) => f.severity === severity)
      .sort((a, b) => timeOf(a.f) - timeOf(b.f) || a.i - b.i)
      .map(({ f }) => f),
  })).filter((g) => g.findings.length > 0);
}
