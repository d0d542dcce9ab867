import type { TargetVisibility } from '@/shared/ephemeris/visibility';
import type { Night } from '@/shared/schemas/night';

/** The plotting area in px and the time span it shows; altitude runs 0° (bottom) to 90° (top). */
export type Plot = { left: number; right: number; top: number; bottom: number; startMs: number; endMs: number };

export const MAX_ALT_DEG = 90;

export function xOf(plot: Plot, ms: number): number {
  return plot.left + ((ms - plot.startMs) / (plot.endMs - plot.startMs)) * (plot.right - plot.left);
}

/** Below 0° the curve keeps going down (and is clipped), so it leaves the chart at the right place. */
export function yOf(plot: Plot, altDeg: number): number {
  return plot.bottom - (altDeg / MAX_ALT_DEG) * (plot.bottom - plot.top);
}

export type AltPoint = { ms: number; altDeg: number };

export function pathOf(plot: Plot, points: AltPoint[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${xOf(plot, p.ms).toFixed(1)} ${yOf(plot, p.altDeg).toFixed(1)}`).join(' ');
}

/** Samples inside the drawn span (with one either side, so lines reach the edges). */
function inSpan<T extends { t: string }>(samples: T[], startMs: number, endMs: number): (T & { ms: number })[] {
  const all = samples.map((s) => ({ ...s, ms: Date.parse(s.t) })).filter((s) => Number.isFinite(s.ms));
  return all.filter((s, i) => {
    if (s.ms >= startMs && s.ms <= endMs) return true;
    const next = all[i + 1];
    const prev = all[i - 1];
    return (s.ms < startMs && !!next && next.ms > startMs) || (s.ms > endMs && !!prev && prev.ms < endMs);
  });
}

export type CurveRun = { usable: boolean; points: AltPoint[] };

/**
 * The target's altitude split into runs that are usable (astronomical darkness and at or above
 * the limit, the rule behind `usableDarkMinutes`) or not; consecutive runs share their joining
 * sample so the curve is unbroken.
 */
export function curveRuns(visibility: TargetVisibility, night: Night, startMs: number, endMs: number): CurveRun[] {
  const darkStart = night.darkStart ? Date.parse(night.darkStart) : null;
  const darkEnd = night.darkEnd ? Date.parse(night.darkEnd) : null;
  const runs: CurveRun[] = [];
  for (const s of inSpan(visibility.samples, startMs, endMs)) {
    const dark = darkStart !== null && darkEnd !== null && s.ms >= darkStart && s.ms < darkEnd;
    const usable = dark && s.altDeg >= s.limitDeg;
    const point = { ms: s.ms, altDeg: s.altDeg };
    const current = runs[runs.length - 1];
    if (current && current.usable === usable) current.points.push(point);
    else {
      const joint = current?.points[current.points.length - 1];
      runs.push({ usable, points: joint ? [joint, point] : [point] });
    }
  }
  return runs;
}

/** The horizon/minimum-altitude limit along the target's path, as a line and as the area below it. */
export function limitPaths(plot: Plot, visibility: TargetVisibility): { line: string; area: string } {
  const points = inSpan(visibility.samples, plot.startMs, plot.endMs).map((s) => ({ ms: s.ms, altDeg: s.limitDeg }));
  if (points.length === 0) return { line: '', area: '' };
  const line = pathOf(plot, points);
  const first = points[0]!;
  const last = points[points.length - 1]!;
  const area = `${line} L${xOf(plot, last.ms).toFixed(1)} ${plot.bottom} L${xOf(plot, first.ms).toFixed(1)} ${plot.bottom} Z`;
  return { line, area };
}

export function moonPath(plot: Plot, night: Night): string {
  return pathOf(plot, inSpan(night.moonAltitudes, plot.startMs, plot.endMs));
}
