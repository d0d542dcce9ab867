import { describe, expect, it } from 'vitest';
import { fnv1a64Hex, headerFingerprint, headerFingerprintSource } from '@/shared/fits/fingerprint';
import { dateObsToIso, frameFromHeader, frameTypeFromText } from '@/shared/fits/frame';
import { parseFitsHeader, type FitsLookup, type FitsValue } from '@/shared/fits/header';
import { parseSexagesimalDeg, parseSexagesimalHoursToDeg } from '@/shared/fits/sexagesimal';
import { buildFits, imageCards, type TestCard } from '@/tests/helpers/fits';

const lookup = (values: Record<string, FitsValue>): FitsLookup => ({ get: (k) => values[k] });

const light: TestCard[] = imageCards(6248, 4176, [
  { key: 'IMAGETYP', value: 'Light Frame' },
  { key: 'OBJECT', value: 'NGC 7000  ' },
  { key: 'DATE-OBS', value: '2024-08-03T22:14:05.123' },
  { key: 'EXPTIME', raw: '3.0D2'.padStart(20) },
  { key: 'FILTER', value: 'Ha' },
  { key: 'GAIN', value: 100 },
  { key: 'OFFSET', value: 50 },
  { key: 'XBINNING', value: 1 },
  { key: 'YBINNING', value: 1 },
  { key: 'SET-TEMP', value: -10 },
  { key: 'CCD-TEMP', value: -9.8 },
  { key: 'FOCPOS', value: 12345 },
  { key: 'ROTATANG', value: 87.5 },
  { key: 'PIERSIDE', value: 'WEST' },
  { key: 'XPIXSZ', value: 3.76 },
  { key: 'FOCALLEN', value: 530 },
  { key: 'OBJCTRA', value: '20 59 17.1' },
  { key: 'OBJCTDEC', value: '+44 31 44' },
]);

describe('frameFromHeader (camera conventions, checks.md "FITS")', () => {
  it('reads a typical light frame', () => {
    const f = frameFromHeader(parseFitsHeader(buildFits(light)));
    expect(f).toMatchObject({
      frameType: 'light',
      imageTypeText: 'Light Frame',
      object: 'NGC 7000',
      dateObsUtc: '2024-08-03T22:14:05.123Z',
      exposureS: 300,
      filter: 'Ha',
      gain: 100,
      offset: 50,
      binning: { x: 1, y: 1 },
      setTempC: -10,
      sensorTempC: -9.8,
      focuserPositionSteps: 12345,
      rotatorAngleDeg: 87.5,
      pierSide: 'west',
      pixelSizeUm: 3.76,
      focalLengthMm: 530,
      widthPx: 6248,
      heightPx: 4176,
    });
    expect(f.raDeg).toBeCloseTo((20 + 59 / 60 + 17.1 / 3600) * 15, 10);
    expect(f.decDeg).toBeCloseTo(44 + 31 / 60 + 44 / 3600, 10);
    expect(f.fingerprint).toMatch(/^[0-9a-f]{16}$/);
  });

  it('requires none of the keywords', () => {
    const f = frameFromHeader(parseFitsHeader(buildFits(imageCards(4, 4))));
    expect(f.frameType).toBeNull();
    expect(f.exposureS).toBeUndefined();
    expect(f.binning).toBeUndefined();
    expect(f.raDeg).toBeUndefined();
    expect(frameFromHeader(lookup({})).fingerprint).toBe(fnv1a64Hex(''));
  });

  it('takes EXPOSURE and FOCUSPOS, numbers written as strings, and Y binning from X', () => {
    const f = frameFromHeader(lookup({ EXPOSURE: '120', FOCUSPOS: 800, XBINNING: 2, GAIN: ' 139 ', PIERSIDE: 'Unknown' }));
    expect(f.exposureS).toBe(120);
    expect(f.focuserPositionSteps).toBe(800);
    expect(f.binning).toEqual({ x: 2, y: 2 });
    expect(f.gain).toBe(139);
    expect(f.pierSide).toBeUndefined();
  });

  it('falls back to RA/DEC in degrees and ignores unreadable coordinates', () => {
    expect(frameFromHeader(lookup({ OBJCTRA: 'nonsense', RA: 10.5, DEC: -20 }))).toMatchObject({ raDeg: 10.5, decDeg: -20 });
    expect(frameFromHeader(lookup({ OBJCTRA: '25 00 00', OBJCTDEC: '+10 00 00' })).raDeg).toBeUndefined();
  });
});

describe('frameTypeFromText', () => {
  it.each([
    ['Light Frame', 'light'],
    ['LIGHT', 'light'],
    ['light', 'light'],
    ['Object', 'light'],
    ['Dark Frame', 'dark'],
    ['DARK', 'dark'],
    ['Dark Flat', 'dark'],
    ['FLATDARK', 'dark'],
    ['Flat Field', 'flat'],
    ['Flat Frame', 'flat'],
    ['FLAT', 'flat'],
    ['Bias Frame', 'bias'],
    ['BIAS', 'bias'],
    ['Zero', 'bias'],
    ['Offset', 'bias'],
    ['Tricolor', null],
  ] as const)('%s → %s', (text, type) => {
    expect(frameTypeFromText(text)).toBe(type);
  });
});

describe('DATE-OBS and sexagesimal', () => {
  it('reads DATE-OBS as UTC and rejects other forms', () => {
    expect(dateObsToIso('2024-01-31T23:59:59')).toBe('2024-01-31T23:59:59.000Z');
    expect(dateObsToIso('2024-01-31 01:02:03.5Z')).toBe('2024-01-31T01:02:03.500Z');
    expect(dateObsToIso('2024-02-30T00:00:00')).toBeUndefined();
    expect(dateObsToIso('31/01/24')).toBeUndefined();
  });

  it('reads hours and degrees with spaces, colons or letters; the sign covers "-00"', () => {
    expect(parseSexagesimalHoursToDeg('05:35:17.3')).toBeCloseTo(83.822083, 6);
    expect(parseSexagesimalHoursToDeg('05h35m17.3s')).toBeCloseTo(83.822083, 6);
    expect(parseSexagesimalDeg('-00 30 00')).toBe(-0.5);
    expect(parseSexagesimalDeg('-05 23 28')).toBeCloseTo(-5.391111, 6);
    expect(parseSexagesimalDeg('+91 00 00')).toBeUndefined();
    expect(parseSexagesimalDeg('10 61 00')).toBeUndefined();
  });
});

describe('header fingerprint (FNV-1a 64-bit)', () => {
  it('matches the published FNV-1a 64 test vectors', () => {
    // Test vectors of the FNV reference (Fowler/Noll/Vo), from memory: "" , "a", "foobar".
    expect(fnv1a64Hex('')).toBe('cbf29ce484222325');
    expect(fnv1a64Hex('a')).toBe('af63dc4c8601ec8c');
    expect(fnv1a64Hex('foobar')).toBe('85944171f73967e8');
  });

  it('is stable across formatting and ignores non-identifying cards', () => {
    const a = lookup({ 'DATE-OBS': '2024-08-03T22:14:05', EXPTIME: 300, OBJECT: 'M 31', 'CCD-TEMP': -9.9 });
    const b = lookup({ 'DATE-OBS': ' 2024-08-03T22:14:05', EXPTIME: 3e2, OBJECT: 'M 31 ', 'CCD-TEMP': -10.1, HISTORY: 'x' });
    expect(headerFingerprint(a)).toBe(headerFingerprint(b));
    expect(headerFingerprintSource(a)).toBe('DATE-OBS=2024-08-03T22:14:05\nEXPTIME=300\nOBJECT=M 31');
  });

  it('differs when an identifying card differs', () => {
    const base = { 'DATE-OBS': '2024-08-03T22:14:05', EXPTIME: 300 };
    expect(headerFingerprint(lookup(base))).not.toBe(headerFingerprint(lookup({ ...base, 'DATE-OBS': '2024-08-03T22:19:06' })));
    expect(headerFingerprint(lookup(base))).not.toBe(headerFingerprint(lookup({ ...base, FILTER: 'OIII' })));
  });
});
