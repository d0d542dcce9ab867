import type { Night } from '@/shared/schemas/night';
import { localHourMinute } from '@/lib/format';

/** Sky states by the Sun's altitude; the thresholds are the usual twilight definitions. */
export type SkyKind = 'day' | 'civil' | 'nautical' | 'astronomical' | 'dark';

/** Sun altitude at sunrise/sunset (upper limb, standard refraction), and the twilight limits, in degrees. */
export const SUNSET_ALT_DEG = -0.833;
const SKY_LIMITS_DEG = [SUNSET_ALT_DEG, -6, -12, -18];

export function skyKindAt(altDeg: number): SkyKind {
  if (altDeg > SUNSET_ALT_DEG) return 'day';
  if (altDeg > -6) return 'civil';
  if (altDeg > -12) return 'nautical';
  if (altDeg > -18) return 'astronomical';
  return 'dark';
}

type Point = { ms: number; alt: number };
export type Stretch<K> = { kind: K; startMs: number; endMs: number };

function toPoints(samples: Night['sunAltitudes']): Point[] {
  return samples.map((s) => ({ ms: Date.parse(s.t), alt: s.altDeg })).filter((p) => Number.isFinite(p.ms)).sort((a, b) => a.ms - b.ms);
}

/** Linear interpolation of the sampled altitude at `ms`, held flat beyond the ends. */
function altitudeAt(points: Point[], ms: number): number {
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last) return 0;
  if (ms <= first.ms) return first.alt;
  if (ms >= last.ms) return last.alt;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (ms <= b.ms) return a.alt + ((b.alt - a.alt) * (ms - a.ms)) / (b.ms - a.ms || 1);
  }
  return last.alt;
}

/**
 * Splits [startMs, endMs] into stretches of one kind, placing each boundary where the linearly
 * interpolated altitude crosses a limit, so the band agrees with the event times in the table.
 */
function stretches<K>(points: Point[], startMs: number, endMs: number, limits: number[], classify: (alt: number) => K): Stretch<K>[] {
  if (points.length === 0 || endMs <= startMs) return [];
  const inside = points.filter((p) => p.ms > startMs && p.ms < endMs);
  const path: Point[] = [{ ms: startMs, alt: altitudeAt(points, startMs) }, ...inside, { ms: endMs, alt: altitudeAt(points, endMs) }];
  const out: Stretch<K>[] = [];
  const push = (kind: K, from: number, to: number) => {
    if (to <= from) return;
    const prev = out[out.length - 1];
    if (prev && prev.kind === kind) prev.endMs = to;
    else out.push({ kind, startMs: from, endMs: to });
  };
  for (let i = 1; i < path.length; i++) {
    const a = path[i - 1]!;
    const b = path[i]!;
    const cuts = limits
      .filter((lim) => (a.alt - lim) * (b.alt - lim) < 0)
      .map((lim) => a.ms + ((lim - a.alt) / (b.alt - a.alt)) * (b.ms - a.ms))
      .sort((x, y) => x - y);
    let from = a.ms;
    for (const to of [...cuts, b.ms]) {
      const mid = (from + to) / 2;
      push(classify(altitudeAt([a, b], mid)), from, to);
      from = to;
    }
  }
  return out;
}

/** The drawn span: sunset−1 h to sunrise+1 h when both happen, else the whole noon-to-noon span. */
export function bandSpan(night: Night): { startMs: number; endMs: number } {
  const spanStart = Date.parse(night.spanStart);
  const spanEnd = Date.parse(night.spanEnd);
  const hourMs = 3_600_000;
  if (night.sunset && night.sunrise) {
    const start = Math.max(spanStart, Date.parse(night.sunset) - hourMs);
    const end = Math.min(spanEnd, Date.parse(night.sunrise) + hourMs);
    if (end > start) return { startMs: start, endMs: end };
  }
  return { startMs: spanStart, endMs: spanEnd };
}

export function skyStretches(night: Night, startMs: number, endMs: number): Stretch<SkyKind>[] {
  return stretches(toPoints(night.sunAltitudes), startMs, endMs, SKY_LIMITS_DEG, skyKindAt);
}

/** Stretches with the Moon's centre above the horizon. */
export function moonUpStretches(night: Night, startMs: number, endMs: number): Stretch<'up'>[] {
  const all = stretches(toPoints(night.moonAltitudes), startMs, endMs, [0], (alt) => (alt > 0 ? 'up' : 'down'));
  return all.filter((s): s is Stretch<'up'> => s.kind === 'up');
}

/** Instants on whole local hours divisible by `everyHours`, with "HH:00" labels in the site's zone. */
export function hourTicks(startMs: number, endMs: number, timeZone: string, everyHours: number): { ms: number; label: string }[] {
  const quarterMs = 900_000;
  const ticks: { ms: number; label: string }[] = [];
  // Quarter-hour steps also catch zones offset by :30 or :45 from UTC.
  for (let ms = Math.ceil(startMs / quarterMs) * quarterMs; ms <= endMs; ms += quarterMs) {
    const { hour, minute } = localHourMinute(ms, timeZone);
    if (minute === 0 && hour % everyHours === 0) ticks.push({ ms, label: `${String(hour).padStart(2, '0')}:00` });
  }
  return ticks;
}

/** Whether the Sun sets and rises in this span, or stays up or down throughout. */
export function sunCourse(night: Night): 'sets-and-rises' | 'stays-up' | 'stays-down' | 'partial' {
  if (night.sunset || night.sunrise) return night.sunset && night.sunrise ? 'sets-and-rises' : 'partial';
  const maxAlt = Math.max(...night.sunAltitudes.map((s) => s.altDeg));
  return maxAlt > SUNSET_ALT_DEG ? 'stays-up' : 'stays-down';
}

/** Name of the Moon's phase from its phase angle (0 new, 180 full), in eight equal sectors. */
export function moonPhaseName(phaseDeg: number): string {
  const names = ['New moon', 'Waxing crescent', 'First quarter', 'Waxing gibbous', 'Full moon', 'Waning gibbous', 'Last quarter', 'Waning crescent'];
  const index = Math.round((((phaseDeg % 360) + 360) % 360) / 45) % 8;
  return names[index] ?? 'Moon';
}
