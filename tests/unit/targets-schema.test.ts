import { describe, expect, it } from 'vitest';
import { formatDec, formatRa, parseDec, parseRa } from '@/shared/targets/coordinates';
import { catalogueObjectSchema, decTextSchema, raTextSchema } from '@/shared/targets/schema';

// Reference: 1h of right ascension = 15° (IAU convention; Meeus, Astronomical Algorithms, ch. 1).
// M42's commonly published J2000 position 05h35m17.3s −05°23′28″ is the worked value here.
const M42_RA_DEG = (5 + 35 / 60 + 17.3 / 3600) * 15;
const M42_DEC_DEG = -(5 + 23 / 60 + 28 / 3600);

function ra(text: string): number {
  const r = parseRa(text);
  if (!r.ok) throw new Error(r.error);
  return r.valueDeg;
}
function dec(text: string): number {
  const r = parseDec(text);
  if (!r.ok) throw new Error(r.error);
  return r.valueDeg;
}
const raError = (text: string) => {
  const r = parseRa(text);
  return r.ok ? undefined : r.error;
};
const decError = (text: string) => {
  const r = parseDec(text);
  return r.ok ? undefined : r.error;
};

describe('parseRa', () => {
  it('reads colon, h/m/s, spaced and decimal-minute forms', () => {
    for (const text of ['05:35:17.3', '05h35m17.3s', '5h 35m 17.3s', '05 35 17.3', ' 05:35:17.30 ']) expect(ra(text)).toBeCloseTo(M42_RA_DEG, 9);
    expect(ra('05:35.5')).toBeCloseTo((5 + 35.5 / 60) * 15, 9);
    expect(ra('5.5h')).toBeCloseTo(82.5, 9);
    expect(ra('83.82°')).toBeCloseTo(83.82, 9);
    expect(ra('00:00:00')).toBe(0);
  });

  it('says what is wrong', () => {
    expect(raError('')).toMatch(/Enter a value/);
    expect(raError('24:00:00')).toMatch(/below 24/);
    expect(raError('05:60:00')).toMatch(/minutes must be below 60/);
    expect(raError('05:35:60')).toMatch(/seconds must be below 60/);
    expect(raError('-05:35:17')).toMatch(/no sign/);
    expect(raError('83.82')).toMatch(/add a unit/);
    expect(raError('abc')).toMatch(/not a sexagesimal angle/);
    expect(raError('05.5:35')).toMatch(/Only the last part/);
    expect(raError('1:2:3:4')).toMatch(/not a sexagesimal angle/);
    expect(raError('400°')).toMatch(/below 24h/);
  });
});

describe('parseDec', () => {
  it('reads colon, degree-sign, Unicode minus and bare forms', () => {
    for (const text of ['-05:23:28', '−05°23′28″', "-05°23'28\"", '-05 23 28', '-5d23m28s']) expect(dec(text)).toBeCloseTo(M42_DEC_DEG, 9);
    expect(dec('+41 16 09')).toBeCloseTo(41 + 16 / 60 + 9 / 3600, 9);
    expect(dec('-5.39')).toBeCloseTo(-5.39, 9);
    expect(dec('90')).toBe(90);
  });

  it('keeps the sign of the whole angle when the degrees are zero', () => {
    expect(dec('-00:30:00')).toBeCloseTo(-0.5, 12);
    expect(dec('−00°30′00″')).toBeCloseTo(-0.5, 12);
  });

  it('says what is wrong', () => {
    expect(decError('-91:00:00')).toMatch(/between −90° and \+90°/);
    expect(decError('90:00:01')).toMatch(/between/);
    expect(decError('10:61:00')).toMatch(/minutes/);
    expect(decError('05h10m')).toMatch(/not hours/);
    expect(decError('north')).toMatch(/not a sexagesimal angle/);
  });
});

describe('formatRa / formatDec', () => {
  it('formats the worked value in both styles', () => {
    expect(formatRa(M42_RA_DEG)).toBe('05:35:17.3');
    expect(formatRa(M42_RA_DEG, { style: 'hms' })).toBe('05h35m17.3s');
    expect(formatDec(M42_DEC_DEG)).toBe('-05:23:28');
    expect(formatDec(M42_DEC_DEG, { style: 'dms' })).toBe('−05°23′28″');
    expect(formatDec(41.269)).toBe('+41:16:08');
  });

  it('carries rounded seconds into minutes and hours and wraps 24h to 0h', () => {
    expect(formatRa((5 + 59 / 60 + 59.96 / 3600) * 15)).toBe('06:00:00.0');
    expect(formatRa(359.99999)).toBe('00:00:00.0');
    expect(formatRa(-15)).toBe('23:00:00.0');
    expect(formatDec(-(29 + 59 / 60 + 59.6 / 3600))).toBe('-30:00:00');
    expect(formatDec(-0.00001)).toBe('+00:00:00');
    expect(formatDec(-0.5, { decimals: 1 })).toBe('-00:30:00.0');
  });

  it('round-trips through the parsers', () => {
    for (const [r, d] of [[0.1234, -89.9], [123.456789, 12.3456], [299.99, -0.01]] as const) {
      expect(ra(formatRa(r, { decimals: 3 }))).toBeCloseTo(r, 5); // 0.001 s of RA = 4.2e-6°
      expect(dec(formatDec(d, { style: 'dms', decimals: 2 }))).toBeCloseTo(d, 5); // 0.01″ = 2.8e-6°
    }
  });
});

describe('catalogueObjectSchema', () => {
  const m31 = { designation: 'M31', aliases: ['NGC 224'], name: 'Andromeda Galaxy', type: 'galaxy', raDeg: 10.68, decDeg: 41.27, majorArcmin: 190, minorArcmin: 60, positionAngleDeg: 35, magnitude: 3.4 };

  it('accepts a complete object and fills defaults for the optional parts', () => {
    expect(catalogueObjectSchema.parse(m31)).toEqual(m31);
    const minimal = catalogueObjectSchema.parse({ designation: 'NGC 7000', type: 'emission-nebula', raDeg: 314.8, decDeg: 44.5, majorArcmin: 120 });
    expect(minimal).toMatchObject({ aliases: [], name: '', minorArcmin: null, positionAngleDeg: null, magnitude: null });
  });

  it('rejects out-of-range and inconsistent values with a sentence', () => {
    const messages = (patch: Record<string, unknown>) => {
      const r = catalogueObjectSchema.safeParse({ ...m31, ...patch });
      return r.success ? [] : r.error.issues.map((i) => i.message);
    };
    expect(messages({ raDeg: 360 })).toEqual(['Right ascension must be below 360°']);
    expect(messages({ decDeg: -90.5 })).toEqual(['Declination must be at least -90°']);
    expect(messages({ minorArcmin: 200 })).toEqual(['Minor axis must not exceed the major axis']);
    expect(messages({ positionAngleDeg: 361 })).toEqual(['Position angle must be at most 360°']);
    expect(messages({ type: 'quasar' })[0]).toMatch(/Type must be one of galaxy/);
    expect(messages({ designation: '  ' })).toEqual(['Give a designation']);
    expect(messages({ magnitude: Number.NaN })).toHaveLength(1);
  });

  it('turns form text into degrees, with the parser errors as field messages', () => {
    expect(raTextSchema.parse('05h35m17.3s')).toBeCloseTo(M42_RA_DEG, 9);
    expect(decTextSchema.parse('−05°23′28″')).toBeCloseTo(M42_DEC_DEG, 9);
    const bad = decTextSchema.safeParse('95:00:00');
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.message).toMatch(/between −90° and \+90°/);
  });
});
