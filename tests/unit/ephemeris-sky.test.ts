import { base, coord, globe, julian, moonposition, nutation, precess, sidereal } from 'astronomia';
import { describe, expect, it } from 'vitest';
import {
  greenwichApparentSiderealTimeH,
  greenwichMeanSiderealTimeH,
  localApparentSiderealTimeH,
  SIDEREAL_PER_SOLAR,
  wrapHours12,
  wrapHours24,
} from '@/shared/ephemeris/sidereal';
import {
  altAzOf,
  equatorialToHorizontal,
  hourAngleH,
  moonSeparationDeg,
  precessToDate,
  transitTime,
} from '@/shared/ephemeris/sky';

const RAD = Math.PI / 180;
const ARCSEC_DEG = 1 / 3600;
const hms = (h: number, m: number, s: number) => h + m / 60 + s / 3600;
const dms = (sign: 1 | -1, d: number, m: number, s: number) => sign * (d + m / 60 + s / 3600);
/** Difference of two times of day in seconds, across midnight. */
const diffS = (aH: number, bH: number) => wrapHours12(aH - bH) * 3600;

// Published J2000 coordinates of the transit targets:
// M31 α 00h42m44.3s δ +41°16′09″; M42 α 05h35m17.3s δ −05°23′28″.
const M31 = { raH: hms(0, 42, 44.3), decDeg: dms(1, 41, 16, 9) };
const M42 = { raH: hms(5, 35, 17.3), decDeg: dms(-1, 5, 23, 28) };
const ZURICH = { latitudeDeg: 47.3, longitudeDeg: 8.5, elevationM: 400 };

describe('sidereal time', () => {
  it('Meeus 12.a: 1987-04-10 0h UT', () => {
    const date = new Date('1987-04-10T00:00:00Z');
    // Meeus, Astronomical Algorithms, 2nd ed. (1998), 12.a (p. 88): GMST 13h10m46.3668s
    expect(Math.abs(diffS(greenwichMeanSiderealTimeH(date), hms(13, 10, 46.3668)))).toBeLessThan(0.01);
    // Meeus, Astronomical Algorithms, 2nd ed. (1998), 12.a (p. 88): GAST 13h10m46.1351s
    // (ours is IAU 2006 rotation + IAU 2000B nutation: 7.8 ms off, inside 0.01 s)
    expect(Math.abs(diffS(greenwichApparentSiderealTimeH(date), hms(13, 10, 46.1351)))).toBeLessThan(0.01);
  });

  it('Meeus 12.b: 1987-04-10 19:21:00 UT', () => {
    // Meeus, Astronomical Algorithms, 2nd ed. (1998), 12.b (p. 89): GMST 128.7378734° = 8h34m57.0896s
    const gmstH = greenwichMeanSiderealTimeH(new Date('1987-04-10T19:21:00Z'));
    expect(Math.abs(diffS(gmstH, hms(8, 34, 57.0896)))).toBeLessThan(0.01);
    expect(Math.abs(gmstH * 15 - 128.7378734)).toBeLessThan(0.01 / 240);
  });

  it('agrees with astronomia (independent) to milliseconds over 1990–2050', () => {
    for (let year = 1990; year <= 2050; year += 7) {
      const date = new Date(Date.UTC(year, (year * 5) % 12, 11, 3, 17, 29));
      const jd = julian.DateToJD(date);
      expect(Math.abs(diffS(greenwichMeanSiderealTimeH(date), sidereal.mean(jd) / 3600))).toBeLessThan(0.001);
      expect(Math.abs(diffS(greenwichApparentSiderealTimeH(date), sidereal.apparent(jd) / 3600))).toBeLessThan(0.02);
    }
  });

  it('local sidereal time adds the east longitude', () => {
    const date = new Date('2026-12-01T22:00:00Z');
    expect(localApparentSiderealTimeH(date, 8.5)).toBeCloseTo(wrapHours24(greenwichApparentSiderealTimeH(date) + 8.5 / 15), 12);
    expect(localApparentSiderealTimeH(date, -120)).toBeCloseTo(wrapHours24(greenwichApparentSiderealTimeH(date) - 8), 12);
  });
});

describe('equatorialToHorizontal (Meeus eqs. 13.5–13.6)', () => {
  it('Meeus 13.b: Venus from Washington, 1987-04-10 19:21 UT', () => {
    // Meeus, Astronomical Algorithms, 2nd ed. (1998), 13.b (p. 95): Venus from Washington (38°55′17″N, 77°03′56″W),
    // 1987-04-10 19:21 UT, α 23h09m16.641s, δ −6°43′11.61″
    const latitudeDeg = dms(1, 38, 55, 17);
    const longitudeDeg = dms(-1, 77, 3, 56);
    const raH = hms(23, 9, 16.641);
    const decDeg = dms(-1, 6, 43, 11.61);
    const date = new Date('1987-04-10T19:21:00Z');
    const hourAngle = wrapHours12(localApparentSiderealTimeH(date, longitudeDeg) - raH);
    const ours = equatorialToHorizontal(hourAngle, decDeg, latitudeDeg);
    // Meeus, Astronomical Algorithms, 2nd ed. (1998), 13.b (p. 95): azimuth 68.0337° measured from SOUTH (add 180° for
    // north-based), altitude 15.1249°; tolerance 1″
    expect(Math.abs(ours.azimuthDeg - (68.0337 + 180))).toBeLessThan(ARCSEC_DEG);
    expect(Math.abs(ours.altitudeDeg - 15.1249)).toBeLessThan(ARCSEC_DEG);

    // astronomia coord (independent): west-positive longitude, azimuth from south, apparent sidereal time
    const hz = new coord.Equatorial(raH * 15 * RAD, decDeg * RAD).toHorizontal(
      new globe.Coord(latitudeDeg * RAD, -longitudeDeg * RAD),
      sidereal.apparent(julian.DateToJD(date)),
    );
    expect(Math.abs(ours.azimuthDeg - (hz.az / RAD + 180))).toBeLessThan(ARCSEC_DEG);
    expect(Math.abs(ours.altitudeDeg - hz.alt / RAD)).toBeLessThan(ARCSEC_DEG);
  });

  it('puts a transiting object due south (north of the zenith when δ > φ) and an east-rising one at azimuth < 180°', () => {
    expect(equatorialToHorizontal(0, 0, 47).azimuthDeg).toBeCloseTo(180, 9);
    expect(equatorialToHorizontal(0, 0, 47).altitudeDeg).toBeCloseTo(43, 9);
    expect(equatorialToHorizontal(0, 60, 47).azimuthDeg).toBeCloseTo(0, 9);
    expect(equatorialToHorizontal(-6, 0, 47).azimuthDeg).toBeCloseTo(90, 9);
    expect(equatorialToHorizontal(6, 0, 47).azimuthDeg).toBeCloseTo(270, 9);
  });
});

/** astronomia: J2000 → mean of date (Meeus 21.2–21.4), then nutation (Meeus eq. 23.1) → true of date. */
function astronomiaTrueOfDate(raJ2000H: number, decJ2000Deg: number, date: Date) {
  const jde = julian.DateToJDE(date);
  const j2000 = new coord.Equatorial(raJ2000H * 15 * RAD, decJ2000Deg * RAD);
  const mean = precess.position(j2000, 2000, base.JDEToJulianYear(jde), 0, 0);
  const [dPsi, dEps] = nutation.nutation(jde);
  const eps = nutation.meanObliquity(jde) + dEps;
  const [sa, ca, td] = [Math.sin(mean.ra), Math.cos(mean.ra), Math.tan(mean.dec)];
  const ra = mean.ra + (Math.cos(eps) + Math.sin(eps) * sa * td) * dPsi - ca * td * dEps;
  const dec = mean.dec + Math.sin(eps) * ca * dPsi + sa * dEps;
  return { mean, raH: wrapHours24(ra / RAD / 15), decDeg: dec / RAD };
}

describe('precessToDate and hourAngleH', () => {
  it('match astronomia precession + nutation to about an arcsecond', () => {
    for (const date of [new Date('2024-11-15T21:00:00Z'), new Date('2031-03-01T02:00:00Z')]) {
      for (const target of [M31, M42, { raH: 2.53, decDeg: 89.26 }]) {
        const ours = precessToDate(target.raH, target.decDeg, date);
        const ref = astronomiaTrueOfDate(target.raH, target.decDeg, date);
        const cosDec = Math.cos(ref.decDeg * RAD);
        expect(Math.abs(wrapHours12(ours.raH - ref.raH)) * 15 * cosDec).toBeLessThan(1.5 * ARCSEC_DEG);
        expect(Math.abs(ours.decDeg - ref.decDeg)).toBeLessThan(1.5 * ARCSEC_DEG);
      }
    }
  });

  it('is zero at transit, positive west, and within −12..12', () => {
    const t = transitTime(M31.raH, M31.decDeg, ZURICH, new Date('2024-11-15T12:00:00Z'));
    expect(Math.abs(hourAngleH(M31.raH, M31.decDeg, ZURICH.longitudeDeg, t)) * 3600).toBeLessThan(0.01);
    const later = hourAngleH(M31.raH, M31.decDeg, ZURICH.longitudeDeg, new Date(t.getTime() + 3_600_000));
    expect(later).toBeCloseTo(SIDEREAL_PER_SOLAR, 3);
    for (let k = 0; k < 48; k += 1) {
      const h = hourAngleH(M42.raH, M42.decDeg, ZURICH.longitudeDeg, new Date(t.getTime() + k * 1_800_000));
      expect(h).toBeGreaterThanOrEqual(-12);
      expect(h).toBeLessThan(12);
    }
    const alt = altAzOf(M31.raH, M31.decDeg, ZURICH, t, { refraction: false });
    expect(alt.azimuthDeg).toBeCloseTo(180, 3);
    expect(alt.altitudeDeg).toBeCloseTo(90 - ZURICH.latitudeDeg + precessToDate(M31.raH, M31.decDeg, t).decDeg, 2);
  });
});

/** Transit by astronomia alone: mean α of date (precess) with mean sidereal time (a consistent pair). */
function astronomiaTransit(raJ2000H: number, decJ2000Deg: number, longitudeDeg: number, after: Date): Date {
  const hourAngleAt = (ms: number) => {
    const date = new Date(ms);
    const { mean } = astronomiaTrueOfDate(raJ2000H, decJ2000Deg, date);
    return wrapHours12(sidereal.mean(julian.DateToJD(date)) / 3600 + longitudeDeg / 15 - mean.ra / RAD / 15);
  };
  let ms = after.getTime() + (wrapHours24(-hourAngleAt(after.getTime())) / SIDEREAL_PER_SOLAR) * 3_600_000;
  for (let i = 0; i < 3; i += 1) ms -= (hourAngleAt(ms) / SIDEREAL_PER_SOLAR) * 3_600_000;
  return new Date(ms);
}

/** Transit computed the wrong way: hour angle from the J2000 α without precession. */
function unprecessedTransit(raJ2000H: number, longitudeDeg: number, after: Date): Date {
  const hourAngleAt = (ms: number) => wrapHours12(localApparentSiderealTimeH(new Date(ms), longitudeDeg) - raJ2000H);
  let ms = after.getTime() + (wrapHours24(-hourAngleAt(after.getTime())) / SIDEREAL_PER_SOLAR) * 3_600_000;
  for (let i = 0; i < 2; i += 1) ms -= (hourAngleAt(ms) / SIDEREAL_PER_SOLAR) * 3_600_000;
  return new Date(ms);
}

describe('transitTime', () => {
  const cases = [
    { name: 'M31', target: M31, after: new Date('2024-11-15T12:00:00Z') },
    { name: 'M42', target: M42, after: new Date('2024-12-20T12:00:00Z') },
    {
      name: 'M42 (southern site)',
      target: M42,
      after: new Date('2024-12-20T00:00:00Z'),
      site: { latitudeDeg: -31.27, longitudeDeg: 149.06, elevationM: 1150 },
    },
  ];

  for (const c of cases) {
    it(`${c.name}: agrees with astronomia's precession and sidereal time within 10 s`, () => {
      const site = c.site ?? ZURICH;
      const ours = transitTime(c.target.raH, c.target.decDeg, site, c.after);
      const ref = astronomiaTransit(c.target.raH, c.target.decDeg, site.longitudeDeg, c.after);
      expect(ours.getTime()).toBeGreaterThan(c.after.getTime());
      expect(ours.getTime() - c.after.getTime()).toBeLessThan(86_400_000);
      expect(Math.abs(ours.getTime() - ref.getTime())).toBeLessThan(10_000);
    });
  }

  it('the next transit is one sidereal day later', () => {
    const first = transitTime(M31.raH, M31.decDeg, ZURICH, new Date('2024-11-15T12:00:00Z'));
    const next = transitTime(M31.raH, M31.decDeg, ZURICH, new Date(first.getTime() + 1000));
    expect(Math.abs(next.getTime() - first.getTime() - 86_400_000 / SIDEREAL_PER_SOLAR)).toBeLessThan(1000);
  });

  it('using the unprecessed J2000 α shifts transit by about a minute in 2024', () => {
    // checks.md "Definitions": J2000 RA instead of RA of date shifts transit by about a minute in 2024 (computed)
    for (const { target, after } of cases) {
      const precessed = transitTime(target.raH, target.decDeg, ZURICH, after).getTime();
      const shiftS = (precessed - unprecessedTransit(target.raH, ZURICH.longitudeDeg, after).getTime()) / 1000;
      expect(shiftS).toBeGreaterThan(45);
      expect(shiftS).toBeLessThan(100);
    }
  });
});

describe('moonSeparationDeg', () => {
  it('agrees with astronomia (Meeus ch. 47 Moon, geocentric) to 0.005°', () => {
    for (const iso of ['2024-11-15T21:00:00Z', '2026-12-01T23:00:00Z', '2027-05-20T03:00:00Z']) {
      const date = new Date(iso);
      const jde = julian.DateToJDE(date);
      const [dPsi, dEps] = nutation.nutation(jde);
      const moon = moonposition.position(jde);
      const moonEq = new coord.Ecliptic(moon.lon + dPsi, moon.lat).toEquatorial(nutation.meanObliquity(jde) + dEps);
      for (const target of [M31, M42]) {
        const t = astronomiaTrueOfDate(target.raH, target.decDeg, date);
        const cosSep =
          Math.sin(t.decDeg * RAD) * Math.sin(moonEq.dec) +
          Math.cos(t.decDeg * RAD) * Math.cos(moonEq.dec) * Math.cos(t.raH * 15 * RAD - moonEq.ra);
        const refDeg = Math.acos(cosSep) / RAD;
        expect(Math.abs(moonSeparationDeg(target.raH, target.decDeg, date) - refDeg)).toBeLessThan(0.005);
      }
    }
  });

  it('from a site differs from the geocentric value by at most the lunar parallax (about 1°)', () => {
    const date = new Date('2026-12-01T23:00:00Z');
    const geo = moonSeparationDeg(M42.raH, M42.decDeg, date);
    const topo = moonSeparationDeg(M42.raH, M42.decDeg, date, ZURICH);
    expect(Math.abs(topo - geo)).toBeLessThan(1.03);
    expect(topo).not.toBe(geo);
  });
});
