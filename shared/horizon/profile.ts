import { z } from 'zod';

/** Most points a horizon profile may hold (one every half degree). */
export const HORIZON_MAX_POINTS = 720;

export const horizonPointSchema = z.object({
  /** Azimuth, degrees from north through east, 0..360. */
  azDeg: z.number({ error: 'Azimuth must be a number' }).min(0, 'Azimuth must be between 0 and 360°').max(360, 'Azimuth must be between 0 and 360°'),
  /** Altitude of the local horizon (trees, buildings) at that azimuth, 0..90. */
  altDeg: z.number({ error: 'Altitude must be a number' }).min(0, 'Altitude must be between 0 and 90°').max(90, 'Altitude must be between 0 and 90°'),
});

/** A site's horizon: points sorted by azimuth, each azimuth once; empty means a flat horizon. */
export const horizonProfileSchema = z.object({
  points: z
    .array(horizonPointSchema)
    .max(HORIZON_MAX_POINTS, `A horizon profile holds at most ${HORIZON_MAX_POINTS} points`)
    .superRefine((points, ctx) => {
      for (let i = 1; i < points.length; i++) {
        const prev = points[i - 1]!.azDeg;
        const az = points[i]!.azDeg;
        if (az === prev) ctx.addIssue({ code: 'custom', path: [i, 'azDeg'], message: `Azimuth ${az}° appears twice` });
        else if (az < prev) ctx.addIssue({ code: 'custom', path: [i, 'azDeg'], message: `Azimuths must increase: ${az}° comes after ${prev}°` });
      }
    }),
});

export type HorizonPoint = z.output<typeof horizonPointSchema>;
export type HorizonProfile = z.output<typeof horizonProfileSchema>;

function wrap360(deg: number): number {
  const d = deg % 360;
  return d < 0 ? d + 360 : d;
}

/** Index of the first point with azDeg ≥ az (points.length when none). */
function lowerBound(points: readonly HorizonPoint[], az: number): number {
  let lo = 0;
  let hi = points.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (points[mid]!.azDeg < az) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Altitude of the horizon at an azimuth, degrees: linear interpolation in azimuth between the
 * neighbouring points, wrapping from the last point through 360° to the first. An empty profile
 * is a flat horizon (0°); a single point is a constant horizon. Expects the sorted, unique
 * points `horizonProfileSchema` guarantees.
 */
export function horizonAltitudeAt(profile: HorizonProfile, azDeg: number): number {
  const pts = profile.points;
  if (pts.length === 0) return 0;
  if (pts.length === 1) return pts[0]!.altDeg;
  const az = wrap360(azDeg);
  const i = lowerBound(pts, az);
  const hit = pts[i];
  if (hit && hit.azDeg === az) return hit.altDeg;
  const inside = i > 0 && i < pts.length;
  const a = inside ? pts[i - 1]! : pts[pts.length - 1]!;
  const b = inside ? pts[i]! : pts[0]!;
  const bAz = inside ? b.azDeg : b.azDeg + 360;
  const x = !inside && az < a.azDeg ? az + 360 : az;
  const span = bAz - a.azDeg;
  if (span <= 0) return a.altDeg;
  return a.altDeg + ((x - a.azDeg) / span) * (b.altDeg - a.altDeg);
}

/** Lowest altitude a target may image at this azimuth: the larger of horizon and minimum. */
export function effectiveMinAltitudeDeg(profile: HorizonProfile, azDeg: number, minImagingAltDeg: number): number {
  return Math.max(horizonAltitudeAt(profile, azDeg), minImagingAltDeg);
}

/** The profile as CSV that `parseHorizonCsv` reads back (header row, comma separated). */
export function horizonToCsv(profile: HorizonProfile): string {
  return ['azDeg,altDeg', ...profile.points.map((p) => `${p.azDeg},${p.altDeg}`)].join('\n') + '\n';
}

export interface HorizonCsvError {
  /** 1-based line number in the text. */
  line: number;
  message: string;
}

export type HorizonCsvResult = { points: HorizonPoint[] } | { errors: HorizonCsvError[] };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Splits a data line into fields. A semicolon or tab separator allows a decimal comma
 * ("12,5;20"), as spreadsheets in many locales write it; otherwise commas separate, and
 * whitespace alone separates as a last resort.
 */
function splitFields(line: string): string[] {
  if (line.includes(';') || line.includes('\t')) {
    return line.split(/[;\t]/).map((f) => f.trim().replace(',', '.'));
  }
  if (line.includes(',')) return line.split(',').map((f) => f.trim());
  return line.trim().split(/\s+/);
}

function readNumber(text: string): number | undefined {
  return NUMBER.test(text) ? Number(text) : undefined;
}

function show(text: string): string {
  return text === '' ? 'an empty field' : `"${text.length > 20 ? `${text.slice(0, 20)}…` : text}"`;
}

/** 0° and 360° name the same direction; listing both with one altitude closes the circle. */
function closesCircle(a: HorizonPoint, b: HorizonPoint): boolean {
  return a.azDeg !== b.azDeg && a.altDeg === b.altDeg;
}

function duplicateMessage(earlier: HorizonPoint & { line: number }, azDeg: number): string {
  if (earlier.azDeg === azDeg) return `Azimuth ${azDeg}° appears twice (first on line ${earlier.line})`;
  return `Azimuth ${azDeg}° is the same direction as ${earlier.azDeg}° on line ${earlier.line} but has a different altitude`;
}

type LineResult = { point: HorizonPoint } | { error: string } | { header: true };

function parseLine(fields: string[], firstDataLine: boolean): LineResult {
  if (fields.length !== 2) return { error: `Expected two columns (azimuth, altitude), found ${fields.length}` };
  const [azText, altText] = fields as [string, string];
  const az = readNumber(azText);
  const alt = readNumber(altText);
  if (firstDataLine && az === undefined && alt === undefined) return { header: true };
  if (az === undefined) return { error: `Azimuth ${show(azText)} is not a number` };
  if (alt === undefined) return { error: `Altitude ${show(altText)} is not a number` };
  if (az < 0 || az > 360) return { error: `Azimuth ${az}° is outside 0–360°` };
  if (alt < 0 || alt > 90) return { error: `Altitude ${alt}° is outside 0–90°` };
  return { point: { azDeg: az, altDeg: alt } };
}

/**
 * Reads a horizon profile from CSV text: two columns, azimuth then altitude, in degrees;
 * an optional header row; `#` starts a comment; commas, semicolons or tabs separate.
 * Azimuth 360 is the same direction as 0: listing both with the same altitude is allowed.
 * On any error, returns every line's error and no points.
 */
export function parseHorizonCsv(text: string): HorizonCsvResult {
  const errors: HorizonCsvError[] = [];
  const seen = new Map<number, HorizonPoint & { line: number }>();
  let firstDataLine = true;
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  lines.forEach((raw, idx) => {
    const line = idx + 1;
    const content = raw.replace(/#.*$/, '').trim();
    if (content === '') return;
    const result = parseLine(splitFields(content), firstDataLine);
    firstDataLine = false;
    if ('header' in result) return;
    if ('error' in result) {
      errors.push({ line, message: result.error });
      return;
    }
    const { azDeg, altDeg } = result.point;
    const key = azDeg === 360 ? 0 : azDeg;
    const earlier = seen.get(key);
    if (earlier) {
      if (!closesCircle(earlier, result.point)) errors.push({ line, message: duplicateMessage(earlier, azDeg) });
      return;
    }
    seen.set(key, { line, azDeg, altDeg });
    if (seen.size === HORIZON_MAX_POINTS + 1) errors.push({ line, message: `A horizon profile holds at most ${HORIZON_MAX_POINTS} points` });
  });
  if (errors.length > 0) return { errors };
  const points = [...seen.entries()].map(([azDeg, p]) => ({ azDeg, altDeg: p.altDeg })).sort((a, b) => a.azDeg - b.azDeg);
  return { points };
}
