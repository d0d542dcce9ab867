import {
  Body,
  Equator,
  EquatorFromVector,
  GeoMoon,
  Horizon,
  MakeTime,
  Observer,
  RotateVector,
  Rotation_EQJ_EQD,
  Vector,
} from 'astronomy-engine';
import { localApparentSiderealTimeH, SIDEREAL_PER_SOLAR, wrapHours12, wrapHours24 } from '@/shared/ephemeris/sidereal';

const RAD = Math.PI / 180;
const HOUR_MS = 3_600_000;

/** Where the observer stands: geodetic latitude (north +), longitude (east +), height above sea level. */
export interface SiteLocation {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
}

/** Right ascension and declination referred to the true equator and equinox of date. */
export interface EquatorialOfDate {
  raH: number;
  decDeg: number;
}

/** Azimuth from north through east, 0..360; altitude above the horizon. */
export interface AltAz {
  altitudeDeg: number;
  azimuthDeg: number;
}

/** The astronomy-engine observer for a site. */
export function observerAt(site: SiteLocation): Observer {
  return new Observer(site.latitudeDeg, site.longitudeDeg, site.elevationM);
}

function unitVector(raH: number, decDeg: number): [number, number, number] {
  const ra = raH * 15 * RAD;
  const dec = decDeg * RAD;
  return [Math.cos(dec) * Math.cos(ra), Math.cos(dec) * Math.sin(ra), Math.sin(dec)];
}

/** Angle between two directions, atan2(|a×b|, a·b): stable at small and large angles. */
function angleBetweenDeg(a: [number, number, number], b: [number, number, number]): number {
  const cx = a[1] * b[2] - a[2] * b[1];
  const cy = a[2] * b[0] - a[0] * b[2];
  const cz = a[0] * b[1] - a[1] * b[0];
  const dot = a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  return Math.atan2(Math.hypot(cx, cy, cz), dot) / RAD;
}

/**
 * Mean J2000 right ascension and declination carried to the true equator and equinox of
 * `date` (precession IAU 2006 and nutation IAU 2000B: astronomy-engine `Rotation_EQJ_EQD`).
 * Proper motion and annual aberration (≤ 20.5″) are not applied.
 */
export function precessToDate(raJ2000H: number, decJ2000Deg: number, date: Date): EquatorialOfDate {
  const time = MakeTime(date);
  const [x, y, z] = unitVector(raJ2000H, decJ2000Deg);
  const ofDate = EquatorFromVector(RotateVector(Rotation_EQJ_EQD(time), new Vector(x, y, z, time)));
  return { raH: ofDate.ra, decDeg: ofDate.dec };
}

/**
 * Local hour angle in hours, −12..12, positive west of the meridian: H = LST − α with the
 * apparent sidereal time and α of date (Meeus, Astronomical Algorithms, ch. 13), so the
 * J2000 position is precessed first. Zero at upper transit.
 */
export function hourAngleH(raJ2000H: number, decJ2000Deg: number, longitudeDeg: number, date: Date): number {
  const { raH } = precessToDate(raJ2000H, decJ2000Deg, date);
  return wrapHours12(localApparentSiderealTimeH(date, longitudeDeg) - raH);
}

/**
 * Horizontal coordinates from hour angle and declination on a spherical Earth,
 * Meeus, Astronomical Algorithms 2nd ed., eqs. 13.5–13.6:
 * tan A = sin H / (cos H sin φ − tan δ cos φ) (A from south), sin h = sin φ sin δ + cos φ cos δ cos H.
 * The azimuth returned is turned to north-based, east positive (A + 180°). No refraction.
 */
export function equatorialToHorizontal(hourAngleHours: number, decDeg: number, latitudeDeg: number): AltAz {
  const hA = hourAngleHours * 15 * RAD;
  const dec = decDeg * RAD;
  const lat = latitudeDeg * RAD;
  const azFromSouth = Math.atan2(
    Math.sin(hA) * Math.cos(dec),
    Math.cos(hA) * Math.cos(dec) * Math.sin(lat) - Math.sin(dec) * Math.cos(lat),
  );
  const altitude = Math.asin(Math.sin(lat) * Math.sin(dec) + Math.cos(lat) * Math.cos(dec) * Math.cos(hA));
  return { altitudeDeg: altitude / RAD, azimuthDeg: (((azFromSouth / RAD + 180) % 360) + 360) % 360 };
}

/**
 * Altitude and azimuth of a fixed J2000 position at a site: precessed and nutated to date,
 * then astronomy-engine `Horizon` (geodetic site, apparent sidereal time). With
 * `refraction: true` the altitude includes standard refraction (Saemundsson 1986, Meeus
 * eq. 16.4, held below −1° and tapered to the nadir); otherwise it is geometric.
 */
export function altAzOf(
  raJ2000H: number,
  decJ2000Deg: number,
  site: SiteLocation,
  date: Date,
  opts: { refraction: boolean } = { refraction: true },
): AltAz {
  const { raH, decDeg } = precessToDate(raJ2000H, decJ2000Deg, date);
  const hor = Horizon(date, observerAt(site), raH, decDeg, opts.refraction ? 'normal' : undefined);
  return { altitudeDeg: hor.altitude, azimuthDeg: hor.azimuth };
}

/**
 * The first upper transit (hour angle 0, equator of date) of a fixed J2000 position after
 * `after`. One sidereal-rate step from the current hour angle, then two Newton corrections
 * for the slow change of α of date (Meeus, Astronomical Algorithms, ch. 15, in iterative form).
 */
export function transitTime(raJ2000H: number, decJ2000Deg: number, site: SiteLocation, after: Date): Date {
  const hourAngleAt = (ms: number) => hourAngleH(raJ2000H, decJ2000Deg, site.longitudeDeg, new Date(ms));
  let ms = after.getTime() + (wrapHours24(-hourAngleAt(after.getTime())) / SIDEREAL_PER_SOLAR) * HOUR_MS;
  for (let i = 0; i < 2; i += 1) {
    ms -= (hourAngleAt(ms) / SIDEREAL_PER_SOLAR) * HOUR_MS;
  }
  return new Date(Math.round(ms));
}

/**
 * Angular distance in degrees between a J2000 position and the Moon, both in the J2000 frame.
 * With a site the Moon is topocentric (astronomy-engine `Equator`; the Moon's parallax is up
 * to about 1°), otherwise geocentric (`GeoMoon`).
 */
export function moonSeparationDeg(raJ2000H: number, decJ2000Deg: number, date: Date, site?: SiteLocation): number {
  const moon = site ? Equator(Body.Moon, date, observerAt(site), false, true) : EquatorFromVector(GeoMoon(date));
  return angleBetweenDeg(unitVector(raJ2000H, decJ2000Deg), unitVector(moon.ra, moon.dec));
}

/** Geometric (airless) topocentric altitude in degrees of a solar-system body of date. */
function bodyAltitudeDeg(body: Body, site: SiteLocation, date: Date): number {
  const observer = observerAt(site);
  const eq = Equator(body, date, observer, true, true);
  return Horizon(date, observer, eq.ra, eq.dec).altitude;
}

/**
 * Geometric altitude of the Sun's centre in degrees (topocentric, apparent place of date,
 * no refraction): the quantity the USNO twilight definitions use (−6°, −12°, −18°).
 */
export function sunAltitudeDeg(site: SiteLocation, date: Date): number {
  return bodyAltitudeDeg(Body.Sun, site, date);
}

/** Geometric altitude of the Moon's centre in degrees (topocentric, no refraction). */
export function moonAltitudeDeg(site: SiteLocation, date: Date): number {
  return bodyAltitudeDeg(Body.Moon, site, date);
}
