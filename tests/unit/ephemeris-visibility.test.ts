import { describe, expect, it } from 'vitest';
import { computeNight } from '@/shared/ephemeris/night';
import { precessToDate } from '@/shared/ephemeris/sky';
import { darkHoursScreen, targetVisibility, type VisibilitySite } from '@/shared/ephemeris/visibility';

const site: VisibilitySite & { timeZone: string; elevationM: number } = {
  latitudeDeg: 46.93,
  longitudeDeg: 7.62,
  elevationM: 870,
  timeZone: 'Europe/Zurich',
  horizon: [],
  minAltitudeDeg: 30,
};
const night = computeNight(site, '2026-12-01');
// Published J2000 positions (e.g. the SIMBAD basic data of each object).
const M31 = { raDeg: 10.6847, decDeg: 41.2689 };
const M42 = { raDeg: 83.8221, decDeg: -5.3911 };

describe('targetVisibility', () => {
  it('peaks at the transit with the meridian altitude 90° − |φ − δ| (plus refraction)', () => {
    const v = targetVisibility(M31.raDeg, M31.decDeg, site, night);
    // Meridian altitude (computed) with the declination of date: precession moves M31 ~0.15° north
    // between J2000 and 2026 (precessToDate is checked against astronomia in ephemeris-sky).
    const decOfDate = precessToDate(M31.raDeg / 15, M31.decDeg, new Date(v.transit!)).decDeg;
    const expected = 90 - Math.abs(site.latitudeDeg - decOfDate);
    // Refraction at ~84° is about 0.1′ (Saemundsson, checks.md): within 0.05°.
    expect(v.transitAltDeg).toBeGreaterThan(expected - 0.05);
    expect(v.transitAltDeg).toBeLessThan(expected + 0.05);
    const best = v.samples.reduce((a, b) => (b.altDeg > a.altDeg ? b : a));
    expect(Math.abs(Date.parse(best.t) - Date.parse(v.transit!))).toBeLessThanOrEqual(5 * 60_000);
    // Computed by hand: GMST at 0h UT on 2026-12-01 is about 4.68 h (Meeus eq. 12.3), so local
    // sidereal time at 7.62° E reaches α = 0.71 h after about 19.5 solar hours: ~19:28 UT.
    const minutesUt = (Date.parse(v.transit!) - Date.parse('2026-12-01T00:00:00Z')) / 60_000;
    expect(Math.abs(minutesUt - (19 * 60 + 28))).toBeLessThan(5);
  });

  it('counts usable dark minutes only above the limit, and a horizon profile takes them away', () => {
    const open = targetVisibility(M42.raDeg, M42.decDeg, site, night);
    expect(open.usableDarkMinutes).toBeGreaterThan(120);
    for (const s of open.samples) expect(s.limitDeg).toBe(30);
    // A 40° wall all around the south: M42 (transit altitude ~38°) never clears it.
    const walled = targetVisibility(M42.raDeg, M42.decDeg, { ...site, horizon: [{ azDeg: 90, altDeg: 40 }, { azDeg: 270, altDeg: 40 }] }, night);
    expect(walled.usableDarkMinutes).toBe(0);
    expect(walled.firstUsable).toBeNull();
  });

  it('knows a far-southern object never rises at 47° N', () => {
    const v = targetVisibility(0, -80, site, night);
    expect(v.neverRises).toBe(true);
    expect(v.usableDarkMinutes).toBe(0);
    expect(v.samples.every((s) => s.airmass === null)).toBe(true);
  });

  it('gives airmass 1/cos z near the zenith (Kasten & Young within 0.2 %)', () => {
    const v = targetVisibility(M31.raDeg, M31.decDeg, site, night);
    for (const s of v.samples.filter((x) => x.altDeg > 60)) {
      const secz = 1 / Math.cos(((90 - s.altDeg) * Math.PI) / 180);
      expect(Math.abs(s.airmass! - secz) / secz).toBeLessThan(0.002);
    }
  });
});

describe('darkHoursScreen', () => {
  it('agrees with the full computation within two samples on a flat horizon', () => {
    const screen = darkHoursScreen(site, night, 30);
    for (const t of [M31, M42, { raDeg: 201.365, decDeg: -43.019 }, { raDeg: 148.888, decDeg: 69.065 }]) {
      const full = targetVisibility(t.raDeg, t.decDeg, site, night).usableDarkMinutes;
      expect(Math.abs(screen(t.raDeg, t.decDeg) - full)).toBeLessThanOrEqual(20);
    }
  });

  it('returns 0 on a night without darkness', () => {
    const tromso = { latitudeDeg: 69.65, longitudeDeg: 18.96, elevationM: 0, timeZone: 'Europe/Oslo' };
    const summer = computeNight(tromso, '2026-06-21');
    expect(darkHoursScreen(tromso, summer, 30)(M31.raDeg, M31.decDeg)).toBe(0);
  });
});
