import { base, coord, julian, nutation, precess, sidereal } from 'astronomia';
import { describe, expect, it } from 'vitest';
import { computeNight } from '@/shared/ephemeris/night';
import { wrapHours12, wrapHours24 } from '@/shared/ephemeris/sidereal';
import { altAzOf, hourAngleH, moonAltitudeDeg, moonSeparationDeg, sunAltitudeDeg, transitTime } from '@/shared/ephemeris/sky';
import { REFERENCE_SITE } from '@/tests/helpers/dry-run-reference';
import { buildNightSky } from '@/shared/dry-run/sky/night-sky';
import { firstWhere } from '@/shared/dry-run/sky/search';

const RAD = Math.PI / 180;
const site = REFERENCE_SITE;
const DATE = '2026-10-20';
const night = computeNight(site, DATE);
const sky = buildNightSky(site, DATE, night);
const span = [Date.parse(night.spanStart), Date.parse(night.spanEnd)] as const;
// Published J2000 positions: M31 α 00h42m44.3s δ +41°16′09″; M42 α 05h35m17.3s δ −05°23′28″; IC 1805 rounded catalogue values.
const TARGETS = [
  { name: 'M31', raDeg: (0 + 42 / 60 + 44.3 / 3600) * 15, decDeg: 41 + 16 / 60 + 9 / 3600 },
  { name: 'M42', raDeg: (5 + 35 / 60 + 17.3 / 3600) * 15, decDeg: -(5 + 23 / 60 + 28 / 3600) },
  { name: 'IC 1805', raDeg: 38.2, decDeg: 61.45 },
];

describe('engine ephemeris agrees with the ephemeris primitives (shared/ephemeris)', () => {
  it('refracted alt/az within 5″ and hour angle within 0.05 s over the whole night', () => {
    for (const t of TARGETS) {
      const ts = sky.target(t.raDeg, t.decDeg);
      for (let ms = span[0]; ms <= span[1]; ms += 47 * 60_000) {
        const ref = altAzOf(t.raDeg / 15, t.decDeg, site, new Date(ms));
        const ours = ts.altAz(ms);
        expect(Math.abs(ours.altDeg - ref.altitudeDeg) * 3600).toBeLessThan(5);
        if (ref.altitudeDeg < 89) expect(Math.abs(wrapHours12((ours.azDeg - ref.azimuthDeg) / 15)) * 15 * Math.cos(ref.altitudeDeg * RAD) * 3600).toBeLessThan(5);
        expect(Math.abs(ts.hourAngleH(ms) - hourAngleH(t.raDeg / 15, t.decDeg, site.longitudeDeg, new Date(ms))) * 3600).toBeLessThan(0.05);
      }
    }
  });

  it('transit within 1 s of transitTime', () => {
    for (const t of TARGETS) {
      const ref = transitTime(t.raDeg / 15, t.decDeg, site, new Date(span[0])).getTime();
      expect(Math.abs(sky.target(t.raDeg, t.decDeg).transitNear(ref + 3_600_000) - ref)).toBeLessThan(1000);
    }
  });

  it('Sun altitude within 0.01° of sunAltitudeDeg; its twilight crossings within 5 s of computeNight', () => {
    for (let ms = span[0]; ms <= span[1]; ms += 53 * 60_000) expect(Math.abs(sky.sun.altAz(ms).altDeg - sunAltitudeDeg(site, new Date(ms)))).toBeLessThan(0.01);
    const pairs: [number, boolean, string | null][] = [
      [-6, false, night.civilDusk],
      [-12, false, night.nauticalDusk],
      [-18, false, night.astronomicalDusk],
      [-18, true, night.astronomicalDawn],
      [-12, true, night.nauticalDawn],
      [-6, true, night.civilDawn],
    ];
    for (const [alt, rising, iso] of pairs) expect(Math.abs(sky.sun.crossing(alt, rising)! - Date.parse(iso!))).toBeLessThan(5000);
  });

  it('Moon altitude within 0.1° and separation within 0.05° of the primitives', () => {
    const m31 = sky.target(TARGETS[0]!.raDeg, TARGETS[0]!.decDeg);
    for (let ms = span[0]; ms <= span[1]; ms += 37 * 60_000) {
      expect(Math.abs(sky.moon.altAz(ms).altDeg - moonAltitudeDeg(site, new Date(ms)))).toBeLessThan(0.1);
      expect(Math.abs(sky.moon.separationDeg(m31.vectorOfDate(), ms) - moonSeparationDeg(TARGETS[0]!.raDeg / 15, TARGETS[0]!.decDeg, new Date(ms), site))).toBeLessThan(0.05);
    }
  });

  it('finds the sinking below a limit (with the horizon profile) as brute force does, to a second', () => {
    const m42 = sky.target(TARGETS[1]!.raDeg, TARGETS[1]!.decDeg);
    const rise = m42.firstAbove(30, true, span[0], span[1])!;
    const sink = m42.firstBelow(30, true, rise)!;
    let brute = rise;
    while (m42.marginDeg(brute, 30, true) >= 0) brute += 1000;
    expect(Math.abs(sink - brute)).toBeLessThanOrEqual(1000);
    expect(m42.firstBelow(30, true, rise + 600_000)).toBe(sink);
    expect(firstWhere(0, 10, 1, () => false)).toBeNull();
  });
});

/** astronomia alone (independent library): J2000 → mean of date (Meeus 21.2–21.4), nutation (Meeus 23) and apparent sidereal time. */
function astronomiaHourAngleH(raDeg: number, decDeg: number, longitudeDeg: number, date: Date): number {
  const jde = julian.DateToJDE(date);
  const mean = precess.position(new coord.Equatorial(raDeg * RAD, decDeg * RAD), 2000, base.JDEToJulianYear(jde), 0, 0);
  const [dPsi, dEps] = nutation.nutation(jde);
  const eps = nutation.meanObliquity(jde) + dEps;
  const ra = mean.ra + (Math.cos(eps) + Math.sin(eps) * Math.sin(mean.ra) * Math.tan(mean.dec)) * dPsi - Math.cos(mean.ra) * Math.tan(mean.dec) * dEps;
  const last = sidereal.apparent(julian.DateToJD(date)) / 3600 + longitudeDeg / 15;
  return wrapHours12(last - wrapHours24(ra / RAD / 15));
}

describe('hour angle and transit against astronomia (independent second opinion)', () => {
  it('M31: hour angle within 0.5 s of time through the night, transit within 2 s', () => {
    const m31 = TARGETS[0]!;
    const ts = sky.target(m31.raDeg, m31.decDeg);
    for (let ms = span[0]; ms <= span[1]; ms += 61 * 60_000) {
      expect(Math.abs(ts.hourAngleH(ms) - astronomiaHourAngleH(m31.raDeg, m31.decDeg, site.longitudeDeg, new Date(ms))) * 3600).toBeLessThan(0.5);
    }
    const transit = ts.transitNear(span[0] + 11 * 3_600_000);
    expect(Math.abs(astronomiaHourAngleH(m31.raDeg, m31.decDeg, site.longitudeDeg, new Date(transit))) * 3600).toBeLessThan(2);
  });
});
