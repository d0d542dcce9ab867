import { describe, expect, it } from 'vitest';
import { frameNightDate, readIntakeFile, type IntakeOutcome } from '@/shared/calibration/intake';
import type { IntakeFrame } from '@/shared/calibration/types';
import { buildFits, cameraFrame, cameraFrameCards, imageCards, type BuildFitsOptions, type CameraFrameSpec, type TestCard } from '@/tests/helpers/fits';

const ok = (out: IntakeOutcome): IntakeFrame => {
  if (!out.ok) throw new Error(`rejected: ${out.kind}: ${out.reason}`);
  return out.frame;
};
const read = (spec: CameraFrameSpec, options: BuildFitsOptions = {}) => readIntakeFile('a.fits', cameraFrame(spec, options));
const rejected = (out: IntakeOutcome) => (out.ok ? null : { kind: out.kind, reason: out.reason });

const LIGHT: CameraFrameSpec = {
  type: 'Light Frame',
  dateObs: '2026-01-15T21:30:00',
  exposureS: 300,
  object: 'NGC 7000',
  filter: 'Ha',
  gain: 100,
  offset: 50,
  binning: 2,
  readoutMode: 'High Gain',
  setTempC: -10,
  sensorTempC: -9.8,
  focuserPositionSteps: 15200,
  rotatorAngleDeg: 123.4,
  pierSide: 'WEST',
  objctRa: '20 58 48',
  objctDec: '+44 19 48',
};

describe('readIntakeFile: valid frames of each type', () => {
  it('reads a light with every camera keyword (checks.md "FITS", camera conventions)', () => {
    const f = ok(read(LIGHT));
    expect(f).toMatchObject({
      fileName: 'a.fits',
      frameType: 'light',
      object: 'NGC 7000',
      takenAt: '2026-01-15T21:30:00.000Z',
      exposureS: 300,
      filter: 'Ha',
      gain: 100,
      offset: 50,
      binning: 2,
      readoutMode: 'High Gain',
      setTempC: -10,
      sensorTempC: -9.8,
      focuserPositionSteps: 15200,
      rotatorAngleDeg: 123.4,
      pierSide: 'west',
      wcsRaDeg: null,
      wcsPositionAngleDeg: null,
      wcsMirrored: null,
    });
    // OBJCTRA 20h58m48s = 314.7°, OBJCTDEC +44°19′48″ = 44.33° (sexagesimal arithmetic)
    expect(f.pointingRaDeg).toBeCloseTo(314.7, 9);
    expect(f.pointingDecDeg).toBeCloseTo(44.33, 9);
    expect(f.fingerprint).toMatch(/^[0-9a-f]{16}$/);
  });

  it('reads darks, flats and a bias without EXPTIME (0 s); absent keywords become null, binning 1', () => {
    const dark = ok(read({ type: 'Dark Frame', dateObs: '2026-01-16T02:00:00', exposureS: 120, sensorTempC: -10.3 }));
    expect(dark).toMatchObject({ frameType: 'dark', exposureS: 120, setTempC: null, sensorTempC: -10.3, binning: 1, filter: null, gain: null, readoutMode: null, object: null, pierSide: null });
    expect(ok(read({ type: 'Flat Field', dateObs: '2026-01-16T07:00:00', exposureS: 1.5, filter: 'L', rotatorAngleDeg: 0 }))).toMatchObject({ frameType: 'flat', exposureS: 1.5, rotatorAngleDeg: 0 });
    expect(ok(read({ type: 'Bias Frame', dateObs: '2026-01-16T07:10:00' }))).toMatchObject({ frameType: 'bias', exposureS: 0 });
    expect(ok(read({ type: 'ZERO', dateObs: '2026-01-16T07:10:00', exposureS: 0 }))).toMatchObject({ frameType: 'bias' });
  });

  it('reads READMODE when READOUTM is absent', () => {
    const spec: CameraFrameSpec = { type: 'Light Frame', dateObs: '2026-01-15T21:30:00', exposureS: 60, extra: [{ key: 'READMODE', value: 'Low Noise' }] };
    expect(ok(read(spec)).readoutMode).toBe('Low Noise');
  });

  it("takes a D exponent (EXPTIME = 3.0D2 → 300 s) and a quoted string with '' for a quote (FITS Standard 4.0 §4.2)", () => {
    const cards = cameraFrameCards({ type: 'Light Frame', dateObs: '2026-01-15T21:30:00', object: "Barnard's Loop", extra: [{ key: 'EXPTIME', raw: '3.0D2'.padStart(20) }] });
    const f = ok(readIntakeFile('d.fits', buildFits(cards)));
    expect(f.exposureS).toBe(300);
    expect(f.object).toBe("Barnard's Loop");
  });

  it('gives the same fingerprint for the same header read twice, and a different one for another exposure', () => {
    const bytes = cameraFrame(LIGHT);
    expect(ok(readIntakeFile('a.fits', bytes)).fingerprint).toBe(ok(readIntakeFile('renamed.fits', bytes.slice())).fingerprint);
    expect(ok(read({ ...LIGHT, dateObs: '2026-01-15T21:35:05' })).fingerprint).not.toBe(ok(read(LIGHT)).fingerprint);
  });
});

describe('readIntakeFile: broken files, each with its kind', () => {
  it('passes on the strict parser’s faults: truncated, missing END, non-ASCII, not FITS', () => {
    expect(rejected(read(LIGHT, { truncateTo: 2000 }))).toMatchObject({ kind: 'truncated', reason: expect.stringContaining('Truncated') });
    expect(rejected(read(LIGHT, { dropEnd: true }))).toMatchObject({ kind: 'missing-end' });
    expect(rejected(read(LIGHT, { nonAscii: { card: 7, column: 15 } }))).toMatchObject({ kind: 'non-ascii' });
    const text = new TextEncoder().encode('Just some text, not a header');
    expect(readIntakeFile('notes.txt', text)).toEqual({ ok: false, name: 'notes.txt', kind: 'not-fits', reason: expect.stringContaining('Not a FITS file') });
  });

  it('refuses a header without IMAGETYP, or with a type it does not know, naming the keyword and the text found', () => {
    const noType = readIntakeFile('x.fits', buildFits(imageCards(16, 8, [{ key: 'DATE-OBS', value: '2026-01-15T21:30:00' }, { key: 'EXPTIME', value: 60 }])));
    expect(rejected(noType)).toEqual({ kind: 'no-frame-type', reason: 'No IMAGETYP card: the frame type (light, dark, flat or bias) is needed' });
    expect(rejected(read({ ...LIGHT, type: 'Snapshot' }))).toEqual({ kind: 'no-frame-type', reason: 'IMAGETYP says "Snapshot", which is not a light, dark, flat or bias frame' });
  });

  it('refuses a header without a readable DATE-OBS', () => {
    const cards: TestCard[] = imageCards(16, 8, [{ key: 'IMAGETYP', value: 'Light Frame' }, { key: 'EXPTIME', value: 60 }]);
    expect(rejected(readIntakeFile('x.fits', buildFits(cards)))).toMatchObject({ kind: 'no-date', reason: expect.stringContaining('No DATE-OBS') });
    expect(rejected(read({ ...LIGHT, dateObs: 'yesterday' }))).toMatchObject({ kind: 'no-date', reason: expect.stringContaining('"yesterday"') });
  });

  it('refuses a light, dark or flat without EXPTIME/EXPOSURE', () => {
    const { exposureS: _e, ...noExposure } = LIGHT;
    expect(rejected(read(noExposure))).toMatchObject({ kind: 'no-exposure', reason: expect.stringContaining('EXPTIME or EXPOSURE') });
    expect(rejected(read({ type: 'Flat Field', dateObs: '2026-01-16T07:00:00' }))).toMatchObject({ kind: 'no-exposure' });
  });

  it('refuses a dark without SET-TEMP and CCD-TEMP (darks match lights by temperature: trade-defaults.md, S17, S44)', () => {
    expect(rejected(read({ type: 'Dark Frame', dateObs: '2026-01-16T02:00:00', exposureS: 120 }))).toEqual({
      kind: 'no-temperature',
      reason: 'A dark needs SET-TEMP or CCD-TEMP: darks match lights by sensor temperature',
    });
    expect(ok(read({ type: 'Dark Frame', dateObs: '2026-01-16T02:00:00', exposureS: 120, setTempC: -10 })).setTempC).toBe(-10);
  });
});

describe('readIntakeFile: the plate solution', () => {
  it('reads centre, position angle and scale as the builder wrote them', () => {
    const f = ok(read({ ...LIGHT, wcs: { raDeg: 314.7, decDeg: 44.33, positionAngleDeg: 35, scaleArcsecPerPx: 1.46331 } }));
    expect(f.wcsRaDeg).toBeCloseTo(314.7, 9);
    expect(f.wcsDecDeg).toBeCloseTo(44.33, 9);
    expect(f.wcsPositionAngleDeg).toBeCloseTo(35, 9);
    expect(f.wcsScaleArcsecPerPx).toBeCloseTo(1.46331, 9);
    expect(f.wcsMirrored).toBe(false);
  });

  it('checks.md worked example (FITS Standard 4.0 / Greisen & Calabretta 2002): CROTA2 = 30°, CDELT ∓1.46331″/px → PA 330.000000°, scale 1.46331″/px', () => {
    const s = 1.46331 / 3600;
    const wcs: TestCard[] = [
      { key: 'CTYPE1', value: 'RA---TAN' },
      { key: 'CTYPE2', value: 'DEC--TAN' },
      { key: 'CRPIX1', value: 8.5 },
      { key: 'CRPIX2', value: 4.5 },
      { key: 'CRVAL1', value: 83.82 },
      { key: 'CRVAL2', value: -5.39 },
      { key: 'CDELT1', value: -s },
      { key: 'CDELT2', value: s },
      { key: 'CROTA2', value: 30 },
    ];
    const f = ok(read({ type: 'Light Frame', dateObs: '2026-01-15T21:30:00', exposureS: 60, extra: wcs }));
    expect(f.wcsPositionAngleDeg).toBeCloseTo(330, 6); // 330.000000°: checks.md, FITS Standard 4.0 / Greisen & Calabretta 2002
    expect(f.wcsScaleArcsecPerPx).toBeCloseTo(1.46331, 9); // 1.46331″/px: checks.md, FITS Standard 4.0 / Greisen & Calabretta 2002
    expect(f.wcsRaDeg).toBeCloseTo(83.82, 9);
    expect(f.wcsMirrored).toBe(false);
  });

  it('after a meridian flip (CD → −CD) the PA turns 180°, scale and mirroring unchanged (checks.md)', () => {
    const spec: CameraFrameSpec = { ...LIGHT, wcs: { raDeg: 314.7, decDeg: 44.33, positionAngleDeg: 35, scaleArcsecPerPx: 1.46331 } };
    const flipped = cameraFrameCards(spec).map((c) => (typeof c !== 'string' && /^CD\d_\d$/.test(c.key) && typeof c.value === 'number' ? { ...c, value: -c.value } : c));
    const before = ok(read(spec));
    const after = ok(readIntakeFile('flip.fits', buildFits(flipped)));
    expect(after.wcsPositionAngleDeg).toBeCloseTo(215, 9);
    expect(after.wcsScaleArcsecPerPx).toBeCloseTo(before.wcsScaleArcsecPerPx!, 12);
    expect(after.wcsMirrored).toBe(before.wcsMirrored);
    expect(after.wcsRaDeg).toBeCloseTo(314.7, 9);
  });
});

describe('frameNightDate: the evening a frame belongs to (Europe/Berlin: CET = UTC+1, CEST = UTC+2, IANA tz database)', () => {
  it.each([
    ['2026-01-15T22:59:59Z', '2026-01-15', 'winter, 23:59:59 local'],
    ['2026-01-15T23:00:00Z', '2026-01-15', 'winter, local midnight: still the evening before'],
    ['2026-01-16T10:59:59Z', '2026-01-15', 'winter, 11:59:59 local'],
    ['2026-01-16T11:00:00Z', '2026-01-16', 'winter, local noon: the next night'],
    ['2026-07-15T21:59:59Z', '2026-07-15', 'summer, 23:59:59 local'],
    ['2026-07-15T22:00:00Z', '2026-07-15', 'summer, local midnight'],
    ['2026-07-16T09:59:59Z', '2026-07-15', 'summer, 11:59:59 local'],
    ['2026-07-16T10:00:00Z', '2026-07-16', 'summer, local noon'],
  ])('%s → %s (%s)', (iso, night) => {
    expect(frameNightDate(iso, 'Europe/Berlin')).toBe(night);
  });

  it('uses the DATE-OBS intake read (UTC)', () => {
    // 11:30 UTC is 12:30 in Berlin (the next night has begun) but still morning in UTC
    const f = ok(read({ ...LIGHT, dateObs: '2026-01-16T11:30:00' }));
    expect(frameNightDate(f.takenAt, 'Europe/Berlin')).toBe('2026-01-16');
    expect(frameNightDate(f.takenAt, 'UTC')).toBe('2026-01-15');
  });
});
