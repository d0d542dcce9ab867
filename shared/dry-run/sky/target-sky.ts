import { refractionSaemundssonArcmin } from '@/shared/ephemeris/atmosphere';
import { localApparentSiderealTimeH, SIDEREAL_PER_SOLAR, wrapHours12, wrapHours24 } from '@/shared/ephemeris/sidereal';
import { precessToDate } from '@/shared/ephemeris/sky';
import { effectiveMinAltitudeDeg, type HorizonProfile } from '@/shared/horizon/profile';
import { firstWhere } from '@/shared/dry-run/sky/search';

const RAD = Math.PI / 180;
const HOUR_MS = 3_600_000;
/** Scan step of the altitude searches: short against any horizon-profile notch a target crosses. */
const SCAN_MS = 2 * 60_000;

/**
 * What every position of one night shares: the site and one sidereal-time anchor. Local
 * apparent sidereal time is taken once (astronomy-engine via `localApparentSiderealTimeH`) and
 * carried at the sidereal rate (Meeus ch. 12); nutation moves it by well under a millisecond in
 * a night.
 */
export class SkyEnv {
  readonly sinLat: number;
  readonly cosLat: number;
  private readonly lst0H: number;

  constructor(
    readonly latitudeDeg: number,
    readonly longitudeDeg: number,
    readonly refMs: number,
    readonly spanEndMs: number,
    readonly horizon: HorizonProfile,
  ) {
    this.sinLat = Math.sin(latitudeDeg * RAD);
    this.cosLat = Math.cos(latitudeDeg * RAD);
    this.lst0H = localApparentSiderealTimeH(new Date(refMs), longitudeDeg);
  }

  /** Local apparent sidereal time, hours [0, 24). */
  lstH(ms: number): number {
    return wrapHours24(this.lst0H + ((ms - this.refMs) / HOUR_MS) * SIDEREAL_PER_SOLAR);
  }

  /**
   * Geometric altitude and azimuth (north through east) from hour angle and declination of
   * date, Meeus eqs. 13.5–13.6.
   */
  horizontal(haH: number, sinDec: number, cosDec: number): [number, number] {
    const h = haH * 15 * RAD;
    const sinAlt = this.sinLat * sinDec + this.cosLat * cosDec * Math.cos(h);
    const az = Math.atan2(-cosDec * Math.sin(h), sinDec * this.cosLat - cosDec * Math.cos(h) * this.sinLat);
    return [Math.asin(Math.max(-1, Math.min(1, sinAlt))) / RAD, (((az / RAD) % 360) + 360) % 360];
  }
}

/**
 * Apparent altitude from a geometric one: Saemundsson 1986 (Meeus eq. 16.4), tapered toward the
 * nadir below −1° as astronomy-engine's "normal" refraction does, so it matches `altAzOf`.
 */
export function refractedAltitudeDeg(geometricDeg: number): number {
  const taper = geometricDeg < -1 ? (geometricDeg + 90) / 89 : 1;
  return geometricDeg + (refractionSaemundssonArcmin(geometricDeg) / 60) * taper;
}

/**
 * One fixed J2000 position through one night: precessed and nutated to the equator of date once
 * (`precessToDate`, at the reference instant; it moves ~0.1″ in a night), then hour angle,
 * refracted alt/az and altitude-crossing searches, all cached per target per night.
 */
export class TargetSky {
  readonly raDateH: number;
  readonly decDateDeg: number;
  private readonly sinDec: number;
  private readonly cosDec: number;
  private readonly sinkMemo = new Map<string, { from: number; at: number | null }>();

  constructor(
    readonly raDeg: number,
    readonly decDeg: number,
    readonly env: SkyEnv,
  ) {
    const ofDate = precessToDate(raDeg / 15, decDeg, new Date(env.refMs));
    this.raDateH = ofDate.raH;
    this.decDateDeg = ofDate.decDeg;
    this.sinDec = Math.sin(ofDate.decDeg * RAD);
    this.cosDec = Math.cos(ofDate.decDeg * RAD);
  }

  /** Hour angle, hours −12..12, positive west (H = LAST − α of date). */
  hourAngleH(ms: number): number {
    return wrapHours12(this.env.lstH(ms) - this.raDateH);
  }

  /** Apparent (refracted) altitude and azimuth in degrees. */
  altAz(ms: number): { altDeg: number; azDeg: number } {
    const [alt, az] = this.env.horizontal(this.hourAngleH(ms), this.sinDec, this.cosDec);
    return { altDeg: refractedAltitudeDeg(alt), azDeg: az };
  }

  /** Degrees above the limit: altitude − max(horizon profile at the azimuth, limit), or − limit alone. */
  marginDeg(ms: number, limitDeg: number, withHorizon: boolean): number {
    const { altDeg, azDeg } = this.altAz(ms);
    return altDeg - (withHorizon ? effectiveMinAltitudeDeg(this.env.horizon, azDeg, limitDeg) : limitDeg);
  }

  /**
   * The first instant at or after `fromMs` (up to the end of the night's span) when the target
   * is below the limit; null if it stays above. Memoised: the answer holds for any later start
   * before it.
   */
  firstBelow(limitDeg: number, withHorizon: boolean, fromMs: number): number | null {
    const key = `${limitDeg}|${withHorizon}`;
    const memo = this.sinkMemo.get(key);
    if (memo && fromMs >= memo.from && (memo.at === null || fromMs < memo.at)) return memo.at;
    const at = firstWhere(fromMs, this.env.spanEndMs, SCAN_MS, (ms) => this.marginDeg(ms, limitDeg, withHorizon) < 0);
    this.sinkMemo.set(key, { from: fromMs, at });
    return at;
  }

  /** The first instant in [fromMs, toMs] when the target is at or above the limit; null if never. */
  firstAbove(limitDeg: number, withHorizon: boolean, fromMs: number, toMs: number): number | null {
    return firstWhere(fromMs, toMs, SCAN_MS, (ms) => this.marginDeg(ms, limitDeg, withHorizon) >= 0);
  }

  /** The upper transit belonging to the hour angle at `ms` (H in −12..12): ms − H / sidereal rate. */
  transitNear(ms: number): number {
    return ms - (this.hourAngleH(ms) / SIDEREAL_PER_SOLAR) * HOUR_MS;
  }

  /** Unit vector of the position of date (x to the equinox of date, z to the pole). */
  vectorOfDate(): [number, number, number] {
    const ra = this.raDateH * 15 * RAD;
    return [this.cosDec * Math.cos(ra), this.cosDec * Math.sin(ra), this.sinDec];
  }
}
