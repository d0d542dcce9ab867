import type { FitsLookup } from '@/shared/fits/header';

/*
 * Celestial WCS of an image from its header (Greisen & Calabretta 2002, A&A 395, 1061;
 * Calabretta & Greisen 2002, A&A 395, 1077), as far as framing needs it: the linear CD matrix,
 * pixel scale, position angle, mirroring and the sky position of the image centre.
 */

/** [[CD1_1, CD1_2], [CD2_1, CD2_2]], degrees per pixel. */
export type CdMatrix = [[number, number], [number, number]];
/** Which keywords gave the matrix: CDi_j, PCi_j × CDELTi, or CDELTi with CROTA2. */
export type CdSource = 'cd' | 'pc' | 'crota';

export interface ImageCentre {
  raDeg: number;
  decDeg: number;
  /** `tan`: the centre pixel deprojected; `crval`: CRVAL1/2 taken as is (no TAN projection). */
  method: 'tan' | 'crval';
}

export interface ImageWcs {
  cd: CdMatrix;
  source: CdSource;
  pixelScaleArcsecPerPx: number;
  /** Position angle of the image's +y axis, degrees east of north, 0..360. */
  positionAngleDeg: number;
  /** True when det CD > 0: mirror-reversed against the normal sky orientation (north up, east left). */
  mirrored: boolean;
  centre: ImageCentre | null;
}

const DEG = Math.PI / 180;

function num(h: FitsLookup, key: string): number | undefined {
  const v = h.get(key);
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

function wrap360(deg: number): number {
  return ((deg % 360) + 360) % 360;
}

/**
 * The CD matrix from CDi_j (missing elements 0); else from PCi_j (missing: identity) scaled by
 * CDELTi; else from CDELTi and CROTA2 = ρ (default 0): CD1_1 = CDELT1 cos ρ,
 * CD1_2 = −CDELT2 sin ρ, CD2_1 = CDELT1 sin ρ, CD2_2 = CDELT2 cos ρ (checks.md, after
 * Calabretta & Greisen 2002). Null when the header has no scale.
 */
export function cdMatrixFromHeader(h: FitsLookup): { cd: CdMatrix; source: CdSource } | null {
  const cd = ['CD1_1', 'CD1_2', 'CD2_1', 'CD2_2'].map((k) => num(h, k));
  if (cd.some((v) => v !== undefined)) {
    const [a = 0, b = 0, c = 0, d = 0] = cd;
    return { cd: [[a, b], [c, d]], source: 'cd' };
  }
  const cdelt1 = num(h, 'CDELT1');
  const cdelt2 = num(h, 'CDELT2');
  if (cdelt1 === undefined || cdelt2 === undefined) return null;
  const pc = ['PC1_1', 'PC1_2', 'PC2_1', 'PC2_2'].map((k) => num(h, k));
  if (pc.some((v) => v !== undefined)) {
    const [a = 1, b = 0, c = 0, d = 1] = pc;
    return { cd: [[cdelt1 * a, cdelt1 * b], [cdelt2 * c, cdelt2 * d]], source: 'pc' };
  }
  const rho = (num(h, 'CROTA2') ?? 0) * DEG;
  const cos = Math.cos(rho);
  const sin = Math.sin(rho);
  return { cd: [[cdelt1 * cos, -cdelt2 * sin], [cdelt1 * sin, cdelt2 * cos]], source: 'crota' };
}

/** det CD = CD1_1·CD2_2 − CD1_2·CD2_1 (deg² per px²); negative is the normal orientation. */
export function cdDeterminant(cd: CdMatrix): number {
  return cd[0][0] * cd[1][1] - cd[0][1] * cd[1][0];
}

/** Pixel scale = 3600·√|det CD| arcsec per pixel (checks.md, FITS). */
export function pixelScaleFromCd(cd: CdMatrix): number {
  return 3600 * Math.sqrt(Math.abs(cdDeterminant(cd)));
}

/**
 * Position angle of the image's +y axis, east of north: atan2(CD1_2, CD2_2), normalised to
 * 0..360 (checks.md, FITS). Worked check: CROTA2 = 30° (unmirrored) → 330°.
 */
export function positionAngleFromCd(cd: CdMatrix): number {
  return wrap360(Math.atan2(cd[0][1], cd[1][1]) / DEG);
}

/**
 * Sky position of the image's centre pixel ((NAXISi + 1) / 2, 1-based) by the inverse gnomonic
 * (TAN) projection with the default LONPOLE = 180° (Calabretta & Greisen 2002, TAN):
 * x, y = CD · (p − CRPIX) as ξ, η; α = α0 + atan2(ξ, cos δ0 − η sin δ0),
 * δ = atan2(η cos δ0 + sin δ0, √(ξ² + (cos δ0 − η sin δ0)²)). SIP distortion is ignored.
 * Without RA---TAN/DEC--TAN axes or image size, CRVAL1/2 is returned as is.
 */
export function imageCentreFromHeader(h: FitsLookup, cd: CdMatrix | null): ImageCentre | null {
  const ra0 = num(h, 'CRVAL1');
  const dec0 = num(h, 'CRVAL2');
  if (ra0 === undefined || dec0 === undefined) return null;
  const fallback: ImageCentre = { raDeg: wrap360(ra0), decDeg: dec0, method: 'crval' };
  const ctype1 = String(h.get('CTYPE1') ?? '');
  const ctype2 = String(h.get('CTYPE2') ?? '');
  if (!cd || !ctype1.startsWith('RA---TAN') || !ctype2.startsWith('DEC--TAN')) return fallback;
  const [naxis1, naxis2, crpix1, crpix2] = ['NAXIS1', 'NAXIS2', 'CRPIX1', 'CRPIX2'].map((k) => num(h, k));
  if (naxis1 === undefined || naxis2 === undefined || crpix1 === undefined || crpix2 === undefined) return fallback;
  const dx = (naxis1 + 1) / 2 - crpix1;
  const dy = (naxis2 + 1) / 2 - crpix2;
  const xi = (cd[0][0] * dx + cd[0][1] * dy) * DEG;
  const eta = (cd[1][0] * dx + cd[1][1] * dy) * DEG;
  const d0 = dec0 * DEG;
  const denom = Math.cos(d0) - eta * Math.sin(d0);
  const ra = ra0 + Math.atan2(xi, denom) / DEG;
  const dec = Math.atan2(eta * Math.cos(d0) + Math.sin(d0), Math.hypot(xi, denom)) / DEG;
  return { raDeg: wrap360(ra), decDeg: dec, method: 'tan' };
}

/**
 * Framing of an image from its header: CD matrix, scale, position angle, mirroring and centre.
 * Null when the header carries no celestial scale (no CDi_j, PCi_j or CDELTi) or a singular CD.
 */
export function wcsFromHeader(h: FitsLookup): ImageWcs | null {
  const found = cdMatrixFromHeader(h);
  if (!found || cdDeterminant(found.cd) === 0) return null;
  const { cd, source } = found;
  return {
    cd,
    source,
    pixelScaleArcsecPerPx: pixelScaleFromCd(cd),
    positionAngleDeg: positionAngleFromCd(cd),
    mirrored: cdDeterminant(cd) > 0,
    centre: imageCentreFromHeader(h, cd),
  };
}
