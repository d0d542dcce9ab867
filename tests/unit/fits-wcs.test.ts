import { describe, expect, it } from 'vitest';
import { parseFitsHeader, type FitsLookup, type FitsValue } from '@/shared/fits/header';
import { pixelScaleArcsecPerPx } from '@/shared/rig/optics';
import { cdMatrixFromHeader, imageCentreFromHeader, wcsFromHeader, type CdMatrix } from '@/shared/fits/wcs';
import { buildFits, imageCards, type TestCard } from '@/tests/helpers/fits';

const lookup = (values: Record<string, FitsValue>): FitsLookup => ({ get: (k) => values[k] });

// checks.md "FITS", worked check (computed, agrees with WCSLIB to 9 decimals). Its CD follows
// from the unrounded scale of 3.76 µm at 530 mm (1.4633126″/px, checks.md "Definitions"),
// printed there as 1.46331″/px: with 1.46331 exactly, CD would differ in the 7th significant digit.
const SCALE_ARCSEC = pixelScaleArcsecPerPx(3.76, 530);
const S = SCALE_ARCSEC / 3600;
const WORKED_CD: CdMatrix = [
  [-3.520182981e-4, -2.032378592e-4],
  [-2.032378592e-4, 3.520182981e-4],
];

function expectCd(actual: CdMatrix, expected: CdMatrix, digits = 12): void {
  for (const i of [0, 1] as const) for (const j of [0, 1] as const) expect(actual[i][j]).toBeCloseTo(expected[i][j], digits);
}

describe('wcsFromHeader — checks.md worked check (Greisen & Calabretta 2002)', () => {
  it('CDELT + CROTA2 = 30° gives the published CD, PA 330.000000°, 1.46331″/px', () => {
    const cards: TestCard[] = imageCards(6248, 4176, [
      { key: 'CDELT1', value: -S },
      { key: 'CDELT2', value: S },
      { key: 'CROTA2', value: 30 },
    ]);
    const wcs = wcsFromHeader(parseFitsHeader(buildFits(cards)))!;
    expect(wcs.source).toBe('crota');
    expectCd(wcs.cd, WORKED_CD);
    expect(wcs.positionAngleDeg).toBeCloseTo(330, 6);
    expect(wcs.pixelScaleArcsecPerPx).toBeCloseTo(1.46331, 5);
    expect(wcs.mirrored).toBe(false);
  });

  it('the same CD given directly (with D exponents) gives the same framing', () => {
    const cards: TestCard[] = imageCards(6248, 4176, [
      { key: 'CD1_1', raw: '-3.520182981D-04'.padStart(20) },
      { key: 'CD1_2', raw: '-2.032378592D-04'.padStart(20) },
      { key: 'CD2_1', raw: '-2.032378592D-04'.padStart(20) },
      { key: 'CD2_2', raw: '3.520182981D-04'.padStart(20) },
    ]);
    const wcs = wcsFromHeader(parseFitsHeader(buildFits(cards)))!;
    expect(wcs.source).toBe('cd');
    expect(wcs.positionAngleDeg).toBeCloseTo(330, 6);
    expect(wcs.pixelScaleArcsecPerPx).toBeCloseTo(1.46331, 5);
    expect(wcs.mirrored).toBe(false);
  });

  it('after a meridian flip (CD → −CD): PA + 180°, same scale and mirroring (checks.md)', () => {
    const flipped = WORKED_CD.map((row) => row.map((v) => -v));
    const wcs = wcsFromHeader(lookup({ CD1_1: flipped[0]![0]!, CD1_2: flipped[0]![1]!, CD2_1: flipped[1]![0]!, CD2_2: flipped[1]![1]! }))!;
    expect(wcs.positionAngleDeg).toBeCloseTo(150, 6);
    expect(wcs.pixelScaleArcsecPerPx).toBeCloseTo(1.46331, 5);
    expect(wcs.mirrored).toBe(false);
  });

  it('a mirrored image has det CD > 0', () => {
    const wcs = wcsFromHeader(lookup({ CDELT1: S, CDELT2: S }))!;
    expect(wcs.mirrored).toBe(true);
    expect(wcs.positionAngleDeg).toBe(0);
  });

  it('PC × CDELT equals the CD form (missing PC elements from the identity)', () => {
    const c = Math.cos(Math.PI / 6);
    const found = cdMatrixFromHeader(lookup({ CDELT1: -S, CDELT2: S, PC1_1: c, PC1_2: 0.5, PC2_1: -0.5, PC2_2: c }))!;
    expect(found.source).toBe('pc');
    expectCd(found.cd, WORKED_CD, 11);
    expectCd(cdMatrixFromHeader(lookup({ CDELT1: -S, CDELT2: S, PC1_2: 0 }))!.cd, [[-S, 0], [0, S]]);
  });

  it('no scale → null; missing CD elements count as 0', () => {
    expect(wcsFromHeader(lookup({ CRVAL1: 10, CRVAL2: 20 }))).toBeNull();
    expect(cdMatrixFromHeader(lookup({ CD1_1: -S, CD2_2: S }))!.cd).toEqual([[-S, 0], [0, S]]);
  });
});

/** Forward gnomonic projection (standard coordinates ξ, η in degrees), independent of the code under test. */
function project(raDeg: number, decDeg: number, ra0Deg: number, dec0Deg: number): [number, number] {
  const r = Math.PI / 180;
  const [a, d, a0, d0] = [raDeg * r, decDeg * r, ra0Deg * r, dec0Deg * r];
  const cosc = Math.sin(d0) * Math.sin(d) + Math.cos(d0) * Math.cos(d) * Math.cos(a - a0);
  const xi = (Math.cos(d) * Math.sin(a - a0)) / cosc;
  const eta = (Math.cos(d0) * Math.sin(d) - Math.sin(d0) * Math.cos(d) * Math.cos(a - a0)) / cosc;
  return [xi / r, eta / r];
}

describe('image centre (TAN, Calabretta & Greisen 2002)', () => {
  const tan = { CTYPE1: 'RA---TAN', CTYPE2: 'DEC--TAN', NAXIS1: 6248, NAXIS2: 4176, CD1_1: WORKED_CD[0][0], CD1_2: WORKED_CD[0][1], CD2_1: WORKED_CD[1][0], CD2_2: WORKED_CD[1][1] };

  it('CRPIX at the centre pixel → CRVAL', () => {
    const c = wcsFromHeader(lookup({ ...tan, CRPIX1: 3124.5, CRPIX2: 2088.5, CRVAL1: 83.8, CRVAL2: -5.4 }))!.centre!;
    expect(c.method).toBe('tan');
    expect(c.raDeg).toBeCloseTo(83.8, 12);
    expect(c.decDeg).toBeCloseTo(-5.4, 12);
  });

  it('CRPIX at a corner: the centre projects back to the centre pixel offset', () => {
    for (const dec0 of [0, 41.27, -62, 88.5]) {
      const h = lookup({ ...tan, CRPIX1: 1, CRPIX2: 1, CRVAL1: 359.9, CRVAL2: dec0 });
      const c = imageCentreFromHeader(h, cdMatrixFromHeader(h)!.cd)!;
      const [xi, eta] = project(c.raDeg, c.decDeg, 359.9, dec0);
      const dx = 3124.5 - 1;
      const dy = 2088.5 - 1;
      expect(xi).toBeCloseTo(WORKED_CD[0][0] * dx + WORKED_CD[0][1] * dy, 9);
      expect(eta).toBeCloseTo(WORKED_CD[1][0] * dx + WORKED_CD[1][1] * dy, 9);
      expect(c.raDeg).toBeGreaterThanOrEqual(0);
      expect(c.raDeg).toBeLessThan(360);
    }
  });

  it('on the equator a pure x offset of 1° moves RA by exactly 1°', () => {
    const h = lookup({ CTYPE1: 'RA---TAN-SIP', CTYPE2: 'DEC--TAN-SIP', NAXIS1: 3, NAXIS2: 1, CRPIX1: 1, CRPIX2: 1, CRVAL1: 10, CRVAL2: 0, CD1_1: Math.tan(Math.PI / 180) * (180 / Math.PI), CD2_2: 1 });
    const c = wcsFromHeader(h)!.centre!;
    expect(c.raDeg).toBeCloseTo(11, 12);
    expect(c.decDeg).toBeCloseTo(0, 12);
  });

  it('without TAN axes, CRVAL is used as is; without CRVAL, no centre', () => {
    const c = wcsFromHeader(lookup({ CDELT1: -S, CDELT2: S, CRVAL1: -10, CRVAL2: 20, CRPIX1: 1, CRPIX2: 1, NAXIS1: 100, NAXIS2: 100 }))!.centre!;
    expect(c).toEqual({ raDeg: 350, decDeg: 20, method: 'crval' });
    expect(wcsFromHeader(lookup({ CDELT1: -S, CDELT2: S }))!.centre).toBeNull();
  });
});
