import { coord, globe, julian, sidereal, solar } from 'astronomia';
import { describe, expect, it } from 'vitest';
import { computeNight, darknessWindow, type NightSite } from '@/shared/ephemeris/night';
import { sunAltitudeDeg } from '@/shared/ephemeris/sky';
import { nightSchema } from '@/shared/schemas/night';

const RAD = Math.PI / 180;
const MINUTE_MS = 60_000;
const ms = (iso: string | null): number => {
  if (iso === null) throw new Error('expected an instant, got null');
  return new Date(iso).getTime();
};

const ZURICH: NightSite = { latitudeDeg: 47.3, longitudeDeg: 8.5, elevationM: 400, timeZone: 'Europe/Zurich' };
const SIDING_SPRING: NightSite = { latitudeDeg: -31.27, longitudeDeg: 149.06, elevationM: 1150, timeZone: 'Australia/Sydney' };
const TROMSO: NightSite = { latitudeDeg: 69.65, longitudeDeg: 18.96, elevationM: 0, timeZone: 'Europe/Oslo' };

/** Geocentric apparent altitude of the Sun by astronomia alone (Meeus ch. 25 Sun, ch. 12 sidereal time, ch. 13). */
function astronomiaSunAltitudeDeg(site: NightSite, date: Date): number {
  const sun = solar.apparentEquatorial(julian.DateToJDE(date));
  const hz = new coord.Equatorial(sun.ra, sun.dec).toHorizontal(
    new globe.Coord(site.latitudeDeg * RAD, -site.longitudeDeg * RAD),
    sidereal.apparent(julian.DateToJD(date)),
  );
  return hz.alt / RAD;
}

/** When astronomia's Sun crosses `targetDeg` near `guess`: secant iterations on its altitude. */
function astronomiaCrossing(site: NightSite, targetDeg: number, guess: Date): Date {
  let t = guess.getTime();
  for (let i = 0; i < 6; i += 1) {
    const f = (x: number) => astronomiaSunAltitudeDeg(site, new Date(x)) - targetDeg;
    const slopePerMs = (f(t + 30_000) - f(t - 30_000)) / 60_000;
    t -= f(t) / slopePerMs;
  }
  return new Date(t);
}

describe('twilight definitions (USNO: Sun centre at −6°, −12°, −18°, geometric)', () => {
  const nights = [
    { name: 'Zurich 2026-12-01', site: ZURICH, date: '2026-12-01' },
    { name: 'Siding Spring 2026-06-15', site: SIDING_SPRING, date: '2026-06-15' },
    { name: 'Tromsø 2026-12-21', site: TROMSO, date: '2026-12-21' },
    { name: 'Zurich 2026-04-20', site: ZURICH, date: '2026-04-20' },
  ];
  const limits = [
    ['civilDusk', -6],
    ['civilDawn', -6],
    ['nauticalDusk', -12],
    ['nauticalDawn', -12],
    ['astronomicalDusk', -18],
    ['astronomicalDawn', -18],
  ] as const;

  for (const { name, site, date } of nights) {
    it(`${name}: the Sun's geometric altitude is at the limit within 0.01°, and astronomia agrees within a minute`, () => {
      const night = computeNight(site, date);
      for (const [key, altDeg] of limits) {
        const at = new Date(ms(night[key]));
        // USNO "Rise, Set, and Twilight Definitions" (checks.md): −6° civil, −12° nautical, −18° astronomical
        expect(Math.abs(sunAltitudeDeg(site, at) - altDeg)).toBeLessThan(0.01);
        const ref = astronomiaCrossing(site, altDeg, at);
        expect(Math.abs(ref.getTime() - at.getTime())).toBeLessThan(MINUTE_MS);
      }
    });
  }

  it('sunset and sunrise are the Sun centre at about −0.8333° (34′ refraction + 16′ semidiameter)', () => {
    for (const { site, date } of nights.slice(0, 2)) {
      const seaLevel = { ...site, elevationM: 0 };
      const night = computeNight(seaLevel, date);
      const elevated = computeNight(site, date);
      for (const key of ['sunset', 'sunrise'] as const) {
        // USNO definitions (checks.md): centre at −0.8333°; the semidiameter varies ±0.3′ over the year
        expect(Math.abs(sunAltitudeDeg(seaLevel, new Date(ms(night[key]))) + 0.8333)).toBeLessThan(0.01);
        // At altitude the 34′ is scaled by the thinner air (astronomy-engine): under a minute at 400–1150 m
        expect(Math.abs(ms(elevated[key]) - ms(night[key]))).toBeLessThan(MINUTE_MS);
      }
    }
  });
});

describe('computeNight at mid-latitude', () => {
  it('Zurich, 2026-12-01: events in order, darkness from astronomical dusk to dawn, valid Night', () => {
    const night = nightSchema.parse(computeNight(ZURICH, '2026-12-01'));
    expect(night.spanStart).toBe('2026-12-01T11:00:00.000Z');
    expect(night.spanEnd).toBe('2026-12-02T11:00:00.000Z');
    const order = [
      night.spanStart,
      night.sunset,
      night.civilDusk,
      night.nauticalDusk,
      night.astronomicalDusk,
      night.astronomicalDawn,
      night.nauticalDawn,
      night.civilDawn,
      night.sunrise,
      night.spanEnd,
    ].map(ms);
    for (let i = 1; i < order.length; i += 1) expect(order[i]).toBeGreaterThan(order[i - 1] ?? Infinity);
    expect(night.darkStart).toBe(night.astronomicalDusk);
    expect(night.darkEnd).toBe(night.astronomicalDawn);
    expect(night.darkHours).toBeCloseTo((ms(night.darkEnd) - ms(night.darkStart)) / 3_600_000, 9);
    expect(night.darkHours).toBeGreaterThan(11);
    expect(night.darkHours).toBeLessThan(12.5);
  });

  it('samples Sun and Moon every 10 minutes across the span, rounded to 0.1°', () => {
    const night = computeNight(ZURICH, '2026-12-01');
    for (const samples of [night.sunAltitudes, night.moonAltitudes]) {
      expect(samples).toHaveLength(145);
      expect(samples[0]?.t).toBe(night.spanStart);
      expect(samples.at(-1)?.t).toBe(night.spanEnd);
      samples.forEach((s, i) => {
        expect(ms(s.t) - ms(night.spanStart)).toBe(i * 10 * MINUTE_MS);
        expect(Math.round(s.altDeg * 10) / 10).toBe(s.altDeg);
      });
    }
    const darkSamples = night.sunAltitudes.filter((s) => ms(s.t) > ms(night.darkStart) && ms(s.t) < ms(night.darkEnd));
    expect(darkSamples.every((s) => s.altDeg <= -18)).toBe(true);
  });

  it('reports the Moon between 0 and 1 illuminated with a phase angle in [0, 360)', () => {
    for (const date of ['2026-12-01', '2026-12-09', '2026-12-24']) {
      const night = computeNight(ZURICH, date);
      expect(night.moonIllumination).toBeGreaterThanOrEqual(0);
      expect(night.moonIllumination).toBeLessThanOrEqual(1);
      expect(night.moonPhaseDeg).toBeGreaterThanOrEqual(0);
      expect(night.moonPhaseDeg).toBeLessThan(360);
      // Illuminated fraction ≈ (1 − cos phase) / 2 (phase angle ≈ 180° − elongation)
      expect(night.moonIllumination).toBeCloseTo((1 - Math.cos(night.moonPhaseDeg * RAD)) / 2, 1);
      if (night.moonrise) expect(ms(night.moonrise)).toBeGreaterThanOrEqual(ms(night.spanStart));
      if (night.moonset) expect(ms(night.moonset)).toBeLessThanOrEqual(ms(night.spanEnd));
    }
  });

  it('spans 23 and 25 hours on DST-change nights', () => {
    const spring = computeNight(ZURICH, '2026-03-28');
    expect(ms(spring.spanEnd) - ms(spring.spanStart)).toBe(23 * 3_600_000);
    expect(spring.sunAltitudes).toHaveLength(139);
    const autumn = computeNight(ZURICH, '2026-10-24');
    expect(ms(autumn.spanEnd) - ms(autumn.spanStart)).toBe(25 * 3_600_000);
    expect(autumn.sunAltitudes).toHaveLength(151);
    expect(() => nightSchema.parse(autumn)).not.toThrow();
  });

  it('rejects an invalid date or time zone', () => {
    expect(() => computeNight(ZURICH, '2026-02-30')).toThrow(RangeError);
    expect(() => computeNight({ ...ZURICH, timeZone: 'Mars/Olympus' }, '2026-02-03')).toThrow(RangeError);
  });
});

describe('computeNight in polar day and night', () => {
  it('Tromsø, 2026-06-21: midnight Sun, no sunset, no twilight, no darkness', () => {
    const night = nightSchema.parse(computeNight(TROMSO, '2026-06-21'));
    const events = ['sunset', 'sunrise', 'civilDusk', 'civilDawn', 'nauticalDusk', 'nauticalDawn'] as const;
    for (const key of [...events, 'astronomicalDusk', 'astronomicalDawn', 'darkStart', 'darkEnd'] as const) {
      expect(night[key]).toBeNull();
    }
    expect(night.darkHours).toBe(0);
    expect(Math.min(...night.sunAltitudes.map((s) => s.altDeg))).toBeGreaterThan(0);
  });

  it('Tromsø, 2026-12-21: polar night, no sunrise or sunset, but twilight and darkness', () => {
    const night = nightSchema.parse(computeNight(TROMSO, '2026-12-21'));
    expect(night.sunrise).toBeNull();
    expect(night.sunset).toBeNull();
    expect(Math.max(...night.sunAltitudes.map((s) => s.altDeg))).toBeLessThan(0);
    expect(night.darkHours).toBeGreaterThan(12);
  });

  it('near the pole in winter the whole span is dark; in summer none of it', () => {
    const pole = { latitudeDeg: 89, longitudeDeg: 0, elevationM: 0, timeZone: 'UTC' };
    const winter = nightSchema.parse(computeNight(pole, '2026-12-21'));
    expect(winter.astronomicalDusk).toBeNull();
    expect(winter.darkStart).toBe(winter.spanStart);
    expect(winter.darkEnd).toBe(winter.spanEnd);
    expect(winter.darkHours).toBe(24);
    const summer = nightSchema.parse(computeNight({ ...pole, latitudeDeg: -89, timeZone: 'Antarctica/McMurdo' }, '2026-12-21'));
    expect(summer.darkStart).toBeNull();
    expect(summer.darkHours).toBe(0);
  });
});

describe('darknessWindow', () => {
  it('takes dusk to dawn, runs to the span edges when dark there, and keeps the longer of two stretches', () => {
    expect(darknessWindow(0, 100, 20, 80, false)).toEqual([20, 80]);
    expect(darknessWindow(0, 100, null, 30, true)).toEqual([0, 30]);
    expect(darknessWindow(0, 100, 70, null, false)).toEqual([70, 100]);
    expect(darknessWindow(0, 100, null, null, true)).toEqual([0, 100]);
    expect(darknessWindow(0, 100, null, null, false)).toBeNull();
    expect(darknessWindow(0, 100, 60, 10, true)).toEqual([60, 100]);
  });
});
