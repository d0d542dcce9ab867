import { describe, expect, it } from 'vitest';
import {
  effectiveMinAltitudeDeg,
  horizonAltitudeAt,
  horizonProfileSchema,
  horizonToCsv,
  parseHorizonCsv,
  type HorizonCsvResult,
  type HorizonProfile,
} from '@/shared/horizon/profile';

function points(result: HorizonCsvResult) {
  if ('errors' in result) throw new Error(`unexpected errors: ${JSON.stringify(result.errors)}`);
  return result.points;
}
function errors(result: HorizonCsvResult) {
  if ('points' in result) throw new Error('expected errors');
  return result.errors;
}

describe('parseHorizonCsv', () => {
  it('reads a header row, comments, blank lines and CRLF, and sorts by azimuth', () => {
    const text = '\uFEFFazimuth,altitude\r\n# trees to the east\r\n\r\n90, 25 # big oak\r\n0,10\r\n180,5.5\r\n';
    expect(points(parseHorizonCsv(text))).toEqual([
      { azDeg: 0, altDeg: 10 },
      { azDeg: 90, altDeg: 25 },
      { azDeg: 180, altDeg: 5.5 },
    ]);
  });

  it('reads semicolons with decimal commas, and tabs', () => {
    expect(points(parseHorizonCsv('Az;Alt\n12,5;20,25\n200;7'))).toEqual([
      { azDeg: 12.5, altDeg: 20.25 },
      { azDeg: 200, altDeg: 7 },
    ]);
    expect(points(parseHorizonCsv('10\t5\n20\t6'))).toEqual([
      { azDeg: 10, altDeg: 5 },
      { azDeg: 20, altDeg: 6 },
    ]);
  });

  it('an empty file is a flat horizon', () => {
    expect(points(parseHorizonCsv(''))).toEqual([]);
    expect(points(parseHorizonCsv('# nothing yet\n'))).toEqual([]);
  });

  it('360° closes the circle when it repeats the altitude of 0°', () => {
    expect(points(parseHorizonCsv('0,10\n180,20\n360,10'))).toEqual([
      { azDeg: 0, altDeg: 10 },
      { azDeg: 180, altDeg: 20 },
    ]);
    expect(errors(parseHorizonCsv('0,10\n360,12'))).toEqual([{ line: 2, message: 'Azimuth 360° is the same direction as 0° on line 1 but has a different altitude' }]);
  });

  it('reports every bad line, with its number, and returns no points', () => {
    const text = ['az,alt', '0,5', 'north,5', '10,high', '370,5', '20,95', '0,6', '30,5,1', '40'].join('\n');
    const result = parseHorizonCsv(text);
    expect('points' in result).toBe(false);
    expect(errors(result)).toEqual([
      { line: 3, message: 'Azimuth "north" is not a number' },
      { line: 4, message: 'Altitude "high" is not a number' },
      { line: 5, message: 'Azimuth 370° is outside 0–360°' },
      { line: 6, message: 'Altitude 95° is outside 0–90°' },
      { line: 7, message: 'Azimuth 0° appears twice (first on line 2)' },
      { line: 8, message: 'Expected two columns (azimuth, altitude), found 3' },
      { line: 9, message: 'Expected two columns (azimuth, altitude), found 1' },
    ]);
  });

  it('a header is only accepted as the first row', () => {
    expect(errors(parseHorizonCsv('0,5\naz,alt'))).toEqual([{ line: 2, message: 'Azimuth "az" is not a number' }]);
  });

  it('at most 720 points', () => {
    const rows = Array.from({ length: 721 }, (_, i) => `${i * 0.499},1`).join('\n');
    expect(errors(parseHorizonCsv(rows))).toEqual([{ line: 721, message: 'A horizon profile holds at most 720 points' }]);
  });

  it('its output passes horizonProfileSchema and round-trips through horizonToCsv', () => {
    const profile = { points: points(parseHorizonCsv('270,15\n90,30\n0,10')) };
    expect(horizonProfileSchema.parse(profile)).toEqual(profile);
    expect(points(parseHorizonCsv(horizonToCsv(profile)))).toEqual(profile.points);
  });
});

describe('horizonAltitudeAt (linear in azimuth, wrapping at 360°)', () => {
  const profile: HorizonProfile = { points: [{ azDeg: 10, altDeg: 20 }, { azDeg: 90, altDeg: 40 }, { azDeg: 350, altDeg: 10 }] };

  it('empty → 0°, one point → constant', () => {
    expect(horizonAltitudeAt({ points: [] }, 123)).toBe(0);
    expect(horizonAltitudeAt({ points: [{ azDeg: 40, altDeg: 12 }] }, 300)).toBe(12);
  });

  it('on a point and between points', () => {
    expect(horizonAltitudeAt(profile, 90)).toBe(40);
    expect(horizonAltitudeAt(profile, 50)).toBeCloseTo(30, 12);
    expect(horizonAltitudeAt(profile, 220)).toBeCloseTo(25, 12);
  });

  it('across north: 350° (10°) → 10° (20°) spans 20° of azimuth', () => {
    expect(horizonAltitudeAt(profile, 0)).toBeCloseTo(15, 12);
    expect(horizonAltitudeAt(profile, 360)).toBeCloseTo(15, 12);
    expect(horizonAltitudeAt(profile, 355)).toBeCloseTo(12.5, 12);
    expect(horizonAltitudeAt(profile, 5)).toBeCloseTo(17.5, 12);
    expect(horizonAltitudeAt(profile, -5)).toBeCloseTo(12.5, 12);
    expect(horizonAltitudeAt(profile, 725)).toBeCloseTo(17.5, 12);
  });

  it('a profile that lists both 0° and 360°', () => {
    const closed: HorizonProfile = { points: [{ azDeg: 0, altDeg: 10 }, { azDeg: 180, altDeg: 30 }, { azDeg: 360, altDeg: 10 }] };
    expect(horizonAltitudeAt(closed, 0)).toBe(10);
    expect(horizonAltitudeAt(closed, 270)).toBeCloseTo(20, 12);
    expect(horizonAltitudeAt(closed, 359.999)).toBeCloseTo(10, 3);
  });

  it('effectiveMinAltitudeDeg is the higher of horizon and imaging minimum', () => {
    expect(effectiveMinAltitudeDeg(profile, 90, 30)).toBe(40);
    expect(effectiveMinAltitudeDeg(profile, 220, 30)).toBe(30);
    expect(effectiveMinAltitudeDeg({ points: [] }, 0, 30)).toBe(30);
  });
});

describe('horizonProfileSchema', () => {
  const msg = (input: unknown) => {
    const r = horizonProfileSchema.safeParse(input);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };

  it('requires increasing, unique azimuths within range', () => {
    expect(msg({ points: [{ azDeg: 20, altDeg: 1 }, { azDeg: 10, altDeg: 1 }] })).toEqual(['points.1.azDeg: Azimuths must increase: 10° comes after 20°']);
    expect(msg({ points: [{ azDeg: 20, altDeg: 1 }, { azDeg: 20, altDeg: 2 }] })).toEqual(['points.1.azDeg: Azimuth 20° appears twice']);
    expect(msg({ points: [{ azDeg: 20, altDeg: 91 }] })).toEqual(['points.0.altDeg: Altitude must be between 0 and 90°']);
    expect(msg({ points: [{ azDeg: -1, altDeg: 1 }] })).toEqual(['points.0.azDeg: Azimuth must be between 0 and 360°']);
  });

  it('at most 720 points', () => {
    const many = Array.from({ length: 721 }, (_, i) => ({ azDeg: i * 0.49, altDeg: 0 }));
    expect(msg({ points: many })).toEqual(['points: A horizon profile holds at most 720 points']);
    expect(msg({ points: many.slice(0, 720) })).toEqual([]);
  });
});
