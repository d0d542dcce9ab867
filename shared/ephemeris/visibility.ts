import type { Night } from '@/shared/schemas/night';
import { effectiveMinAltitudeDeg, type HorizonPoint } from '@/shared/horizon/profile';
import { airmassKastenYoung } from './atmosphere';
import { localApparentSiderealTimeH, wrapHours12 } from './sidereal';
import { altAzOf, moonSeparationDeg, transitTime, type SiteLocation } from './sky';

/** A site as visibility needs it: location, horizon profile and the minimum imaging altitude. */
export interface VisibilitySite extends SiteLocation {
  horizon: HorizonPoint[];
  minAltitudeDeg: number;
}

export interface VisibilitySample {
  t: string;
  altDeg: number;
  azDeg: number;
  /** Kasten & Young airmass, null below the horizon. */
  airmass: number | null;
  /** The altitude the target must clear here: horizon profile or minimum altitude, the higher. */
  limitDeg: number;
  moonSepDeg: number;
}

export interface TargetVisibility {
  samples: VisibilitySample[];
  /** Upper transit inside the night's span (null when it falls outside). */
  transit: string | null;
  transitAltDeg: number;
  /** Minutes of astronomical darkness with the target above its limit (10-minute samples). */
  usableDarkMinutes: number;
  firstUsable: string | null;
  lastUsable: string | null;
  /** True when the target never clears the geometric horizon during the span. */
  neverRises: boolean;
}

const STEP_MS = 10 * 60_000;
const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;

/**
 * Altitude curve of a fixed J2000 position through a night: refracted alt/az every 10 minutes
 * (precessed to date, see `altAzOf`), the limit set by the horizon profile and minimum altitude
 * at each azimuth, airmass (Kasten & Young 1989), topocentric Moon separation, the transit
 * (hour angle 0 in the equator of date) and the usable minutes inside the dark window.
 */
export function targetVisibility(raDeg: number, decDeg: number, site: VisibilitySite, night: Night): TargetVisibility {
  const raH = raDeg / 15;
  const start = Date.parse(night.spanStart);
  const end = Date.parse(night.spanEnd);
  const darkStart = night.darkStart ? Date.parse(night.darkStart) : null;
  const darkEnd = night.darkEnd ? Date.parse(night.darkEnd) : null;
  const profile = { points: site.horizon };
  const samples: VisibilitySample[] = [];
  let usable = 0;
  let firstUsable: number | null = null;
  let lastUsable: number | null = null;
  let rises = false;
  for (let ms = start; ms <= end; ms += STEP_MS) {
    const date = new Date(ms);
    const { altitudeDeg, azimuthDeg } = altAzOf(raH, decDeg, site, date);
    const limitDeg = effectiveMinAltitudeDeg(profile, azimuthDeg, site.minAltitudeDeg);
    if (altitudeDeg > 0) rises = true;
    const dark = darkStart !== null && darkEnd !== null && ms >= darkStart && ms < darkEnd;
    if (dark && altitudeDeg >= limitDeg) {
      usable += 10;
      firstUsable ??= ms;
      lastUsable = ms;
    }
    samples.push({
      t: date.toISOString(),
      altDeg: round(altitudeDeg, 2),
      azDeg: round(azimuthDeg, 2),
      airmass: altitudeDeg > 0 ? round(airmassKastenYoung(altitudeDeg), 3) : null,
      limitDeg: round(limitDeg, 2),
      moonSepDeg: round(moonSeparationDeg(raH, decDeg, date, site), 1),
    });
  }
  const transitMs = transitTime(raH, decDeg, site, new Date(start)).getTime();
  const transitInSpan = transitMs <= end;
  const transitAlt = altAzOf(raH, decDeg, site, new Date(transitMs)).altitudeDeg;
  return {
    samples,
    transit: transitInSpan ? new Date(transitMs).toISOString() : null,
    transitAltDeg: round(transitAlt, 2),
    usableDarkMinutes: usable,
    firstUsable: firstUsable === null ? null : new Date(firstUsable).toISOString(),
    lastUsable: lastUsable === null ? null : new Date(lastUsable).toISOString(),
    neverRises: !rises,
  };
}

/**
 * A fast screen for "well placed tonight" over thousands of objects: geometric altitude from
 * sin h = sin φ sin δ + cos φ cos δ cos H (Meeus eq. 13.6) at precomputed sidereal times,
 * J2000 coordinates as given (precession moves a position by under 0.5° in this century, well
 * inside the screen's 10-minute sampling), no horizon profile. Returns a function giving the
 * minutes of darkness an object spends above `minAltitudeDeg`.
 */
export function darkHoursScreen(site: SiteLocation, night: Night, minAltitudeDeg: number): (raDeg: number, decDeg: number) => number {
  if (!night.darkStart || !night.darkEnd) return () => 0;
  const lst: number[] = [];
  for (let ms = Date.parse(night.darkStart); ms < Date.parse(night.darkEnd); ms += STEP_MS) {
    lst.push(localApparentSiderealTimeH(new Date(ms), site.longitudeDeg));
  }
  const phi = (site.latitudeDeg * Math.PI) / 180;
  const sinPhi = Math.sin(phi);
  const cosPhi = Math.cos(phi);
  const sinMin = Math.sin((minAltitudeDeg * Math.PI) / 180);
  return (raDeg, decDeg) => {
    const dec = (decDeg * Math.PI) / 180;
    const a = sinPhi * Math.sin(dec);
    const b = cosPhi * Math.cos(dec);
    if (a + b < sinMin) return 0; // never reaches the limit, even at transit
    let minutes = 0;
    for (const s of lst) {
      const h = (wrapHours12(s - raDeg / 15) * Math.PI) / 12;
      if (a + b * Math.cos(h) >= sinMin) minutes += 10;
    }
    return minutes;
  };
}
