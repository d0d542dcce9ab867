import { Body, Equator, type Observer } from 'astronomy-engine';
import { wrapHours12 } from '@/shared/ephemeris/sidereal';
import type { Vec3 } from '@/shared/dry-run/models/slew-path';
import { firstWhere } from '@/shared/dry-run/sky/search';
import type { SkyEnv } from '@/shared/dry-run/sky/target-sky';

const RAD = Math.PI / 180;
const HOUR_MS = 3_600_000;
const SCAN_MS = 10 * 60_000;

interface EqSample {
  ms: number;
  raH: number;
  decDeg: number;
}

/** Topocentric RA/Dec of date of a body (astronomy-engine `Equator`, aberration on). */
function sample(body: Body, ms: number, observer: Observer): EqSample {
  const eq = Equator(body, new Date(ms), observer, true, true);
  return { ms, raH: eq.ra, decDeg: eq.dec };
}

/** Linear interpolation between samples, RA unwrapped across 0h/24h. */
function interpolate(samples: EqSample[], ms: number): { raH: number; decDeg: number } {
  const first = samples[0]!;
  const stepMs = samples.length > 1 ? samples[1]!.ms - first.ms : 1;
  const i = Math.max(0, Math.min(samples.length - 2, Math.floor((ms - first.ms) / stepMs)));
  const a = samples[i]!;
  const b = samples[Math.min(i + 1, samples.length - 1)]!;
  if (a === b) return a;
  const f = (ms - a.ms) / (b.ms - a.ms);
  return { raH: a.raH + wrapHours12(b.raH - a.raH) * f, decDeg: a.decDeg + (b.decDeg - a.decDeg) * f };
}

/** A solar-system body through the night from interpolated samples: geometric alt/az and direction. */
class BodySky {
  constructor(
    protected readonly env: SkyEnv,
    private readonly samples: EqSample[],
  ) {}

  /** Geometric altitude and azimuth of the centre (no refraction), degrees. */
  altAz(ms: number): { altDeg: number; azDeg: number } {
    const { raH, decDeg } = interpolate(this.samples, ms);
    const dec = decDeg * RAD;
    const [altDeg, azDeg] = this.env.horizontal(wrapHours12(this.env.lstH(ms) - raH), Math.sin(dec), Math.cos(dec));
    return { altDeg, azDeg };
  }

  /** Unit vector of date (same frame as `TargetSky.vectorOfDate`). */
  vectorOfDate(ms: number): Vec3 {
    const { raH, decDeg } = interpolate(this.samples, ms);
    const ra = raH * 15 * RAD;
    const dec = decDeg * RAD;
    return [Math.cos(dec) * Math.cos(ra), Math.cos(dec) * Math.sin(ra), Math.sin(dec)];
  }
}

/**
 * The Sun through one night: RA/Dec of date at the two ends of the span, linearly
 * interpolated (the error of a straight line over a day is a fraction of a second of RA),
 * geometric altitude as the twilight definitions use it (USNO: −6°, −12°, −18°).
 */
export class SunSky extends BodySky {
  private readonly crossings = new Map<string, number | null>();
  /** Solar midnight (the Sun's lowest point, hour angle 12 h): before it the evening, after it the morning. */
  readonly lowestMs: number;

  constructor(
    env: SkyEnv,
    observer: Observer,
    private readonly spanStartMs: number,
    private readonly spanEndMs: number,
  ) {
    const first = sample(Body.Sun, spanStartMs, observer);
    super(env, [first, sample(Body.Sun, spanEndMs, observer)]);
    const haStartH = wrapHours12(env.lstH(spanStartMs) - first.raH);
    this.lowestMs = spanStartMs + (12 - haStartH) * HOUR_MS;
  }

  /** The evening crossing (Sun sinking through `altDeg`), or the morning one (rising); null if none. */
  crossing(altDeg: number, rising: boolean): number | null {
    const key = `${altDeg}|${rising}`;
    const known = this.crossings.get(key);
    if (known !== undefined) return known;
    const at = rising
      ? firstWhere(this.lowestMs, this.spanEndMs, SCAN_MS, (ms) => this.altAz(ms).altDeg >= altDeg)
      : firstWhere(this.spanStartMs, this.lowestMs, SCAN_MS, (ms) => this.altAz(ms).altDeg < altDeg);
    const valid = at !== null && at !== (rising ? this.lowestMs : this.spanStartMs) ? at : null;
    this.crossings.set(key, valid);
    return valid;
  }
}

/** The Moon through one night: topocentric RA/Dec of date every hour, linearly interpolated. */
export class MoonSky extends BodySky {
  constructor(env: SkyEnv, observer: Observer, spanStartMs: number, spanEndMs: number) {
    const samples: EqSample[] = [];
    for (let ms = spanStartMs; ms < spanEndMs + HOUR_MS; ms += HOUR_MS) samples.push(sample(Body.Moon, ms, observer));
    super(env, samples);
  }

  /** Angular distance in degrees from a unit vector of date. */
  separationDeg(target: Vec3, ms: number): number {
    const m = this.vectorOfDate(ms);
    const c = target[0] * m[0] + target[1] * m[1] + target[2] * m[2];
    return Math.acos(Math.max(-1, Math.min(1, c))) / RAD;
  }
}
