import type { AltPoint } from '@/components/charts/altitude-geometry';

type Sample = { t: string; altDeg: number };

/** Linear interpolation of the sampled altitude at `ms` (held flat beyond the ends). */
function altitudeAt(points: readonly AltPoint[], ms: number): number {
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last) return 0;
  if (ms <= first.ms) return first.altDeg;
  if (ms >= last.ms) return last.altDeg;
  const i = points.findIndex((p) => p.ms >= ms);
  const a = points[i - 1]!;
  const b = points[i]!;
  return a.altDeg + ((b.altDeg - a.altDeg) * (ms - a.ms)) / (b.ms - a.ms || 1);
}

/**
 * The stretch of a target's altitude curve between two instants (the 10-minute samples inside,
 * and interpolated ends), so a span of exposures can be drawn along the curve itself.
 */
export function curveBetween(samples: readonly Sample[], startMs: number, endMs: number): AltPoint[] {
  const points = samples.map((s) => ({ ms: Date.parse(s.t), altDeg: s.altDeg })).filter((p) => Number.isFinite(p.ms));
  if (points.length === 0 || endMs <= startMs) return [];
  const inside = points.filter((p) => p.ms > startMs && p.ms < endMs);
  return [{ ms: startMs, altDeg: altitudeAt(points, startMs) }, ...inside, { ms: endMs, altDeg: altitudeAt(points, endMs) }];
}
