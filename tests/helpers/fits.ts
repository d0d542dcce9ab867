/*
 * Builds synthetic FITS files for tests: cards → 80-column text → 2880-byte blocks, with
 * switches that break the file in each way the header parser must reject.
 */

export type TestCardValue = string | number | boolean | null;

/** A card by parts, or a raw card text (padded to 80 columns). */
export type TestCard = { key: string; value?: TestCardValue; raw?: string; comment?: string } | string;

export interface BuildFitsOptions {
  /** Bytes of data after the header (a 0..255 ramp, so they are not ASCII). */
  dataBytes?: number;
  /** Leave out the END card. */
  dropEnd?: boolean;
  /** Cut the finished file to this many bytes. */
  truncateTo?: number;
  /** Put a byte (default 0xE9, "é" in Latin-1) at a 1-based card and column. */
  nonAscii?: { card: number; column: number; byte?: number };
  /** Overwrite columns 11–30 of a 1-based card with text that is no FITS value. */
  badValueAt?: number;
}

const BLOCK = 2880;

/** A value in fixed format: strings quoted from column 11 ('' for a quote), others right-aligned to column 30. */
export function formatValue(value: TestCardValue): string {
  if (typeof value === 'string') return `'${value.replace(/'/g, "''").padEnd(8)}'`;
  if (typeof value === 'boolean') return (value ? 'T' : 'F').padStart(20);
  if (value === null) return ''.padStart(20);
  return String(value).toUpperCase().padStart(20);
}

/** One 80-character card. */
export function fitsCard(card: TestCard): string {
  let text: string;
  if (typeof card === 'string') text = card;
  else if (card.value === undefined && card.raw === undefined) text = `${card.key.padEnd(8)}${card.comment ?? ''}`;
  else {
    const value = card.raw ?? formatValue(card.value ?? null);
    text = `${card.key.padEnd(8)}= ${value}${card.comment === undefined ? '' : ` / ${card.comment}`}`;
  }
  if (text.length > 80) throw new Error(`Test card longer than 80 columns: ${text}`);
  return text.padEnd(80);
}

/** SIMPLE, BITPIX, NAXIS, NAXIS1, NAXIS2, then the extra cards. */
export function imageCards(widthPx = 16, heightPx = 8, extra: TestCard[] = []): TestCard[] {
  return [
    { key: 'SIMPLE', value: true, comment: 'conforms to FITS' },
    { key: 'BITPIX', value: 16 },
    { key: 'NAXIS', value: 2 },
    { key: 'NAXIS1', value: widthPx },
    { key: 'NAXIS2', value: heightPx },
    ...extra,
  ];
}

/** A FITS file (header blocks, then optional data) as bytes. */
export function buildFits(cards: TestCard[], options: BuildFitsOptions = {}): Uint8Array {
  const lines = cards.map(fitsCard);
  if (!options.dropEnd) lines.push('END'.padEnd(80));
  while (lines.length % 36 !== 0) lines.push(' '.repeat(80));
  const header = lines.join('');
  const dataBytes = options.dataBytes ?? 0;
  const bytes = new Uint8Array(header.length + dataBytes);
  for (let i = 0; i < header.length; i++) bytes[i] = header.charCodeAt(i);
  for (let i = 0; i < dataBytes; i++) bytes[header.length + i] = i % 256;
  if (options.badValueAt !== undefined) {
    const start = (options.badValueAt - 1) * 80 + 10;
    const bad = 'NOT A VALUE'.padEnd(20);
    for (let i = 0; i < 20; i++) bytes[start + i] = bad.charCodeAt(i);
  }
  if (options.nonAscii) {
    const { card, column, byte = 0xe9 } = options.nonAscii;
    bytes[(card - 1) * 80 + (column - 1)] = byte;
  }
  return options.truncateTo === undefined ? bytes : bytes.slice(0, options.truncateTo);
}

/** Number of bytes in `blocks` whole FITS blocks. */
export function blocks(count: number): number {
  return count * BLOCK;
}

/** What a camera frame says about itself; anything left out is not written. */
export interface CameraFrameSpec {
  type: 'Light Frame' | 'Dark Frame' | 'Flat Field' | 'Bias Frame' | string;
  /** DATE-OBS, UTC, "YYYY-MM-DDThh:mm:ss". */
  dateObs: string;
  exposureS?: number;
  object?: string;
  filter?: string;
  gain?: number;
  offset?: number;
  binning?: number;
  readoutMode?: string;
  setTempC?: number;
  sensorTempC?: number;
  focuserPositionSteps?: number;
  rotatorAngleDeg?: number;
  pierSide?: 'EAST' | 'WEST';
  /** OBJCTRA / OBJCTDEC as sexagesimal text. */
  objctRa?: string;
  objctDec?: string;
  /**
   * A plate solution: centre (CRVAL at the centre pixel), sky PA of +y east of north and scale,
   * written as a CD matrix the normal (unmirrored) way: CD = s·[[−cos ρ, −sin ρ], [−sin ρ, cos ρ]]
   * with ρ = −PA (checks.md: PA = atan2(CD1_2, CD2_2)).
   */
  wcs?: { raDeg: number; decDeg: number; positionAngleDeg: number; scaleArcsecPerPx: number };
  widthPx?: number;
  heightPx?: number;
  /** Extra cards after the camera's. */
  extra?: TestCard[];
}

/**
 * Cards of a camera frame with the keyword conventions of checks.md (IMAGETYP, DATE-OBS,
 * EXPTIME, FILTER, GAIN, OFFSET, XBINNING/YBINNING, READOUTM, SET-TEMP, CCD-TEMP, FOCUSPOS,
 * ROTATANG, PIERSIDE, OBJCTRA/OBJCTDEC) and an optional TAN plate solution.
 */
export function cameraFrameCards(spec: CameraFrameSpec): TestCard[] {
  const w = spec.widthPx ?? 16;
  const h = spec.heightPx ?? 8;
  const cards: TestCard[] = [{ key: 'IMAGETYP', value: spec.type }, { key: 'DATE-OBS', value: spec.dateObs }];
  if (spec.exposureS !== undefined) cards.push({ key: 'EXPTIME', value: spec.exposureS });
  if (spec.object !== undefined) cards.push({ key: 'OBJECT', value: spec.object });
  if (spec.filter !== undefined) cards.push({ key: 'FILTER', value: spec.filter });
  if (spec.gain !== undefined) cards.push({ key: 'GAIN', value: spec.gain });
  if (spec.offset !== undefined) cards.push({ key: 'OFFSET', value: spec.offset });
  if (spec.binning !== undefined) cards.push({ key: 'XBINNING', value: spec.binning }, { key: 'YBINNING', value: spec.binning });
  if (spec.readoutMode !== undefined) cards.push({ key: 'READOUTM', value: spec.readoutMode });
  if (spec.setTempC !== undefined) cards.push({ key: 'SET-TEMP', value: spec.setTempC });
  if (spec.sensorTempC !== undefined) cards.push({ key: 'CCD-TEMP', value: spec.sensorTempC });
  if (spec.focuserPositionSteps !== undefined) cards.push({ key: 'FOCUSPOS', value: spec.focuserPositionSteps });
  if (spec.rotatorAngleDeg !== undefined) cards.push({ key: 'ROTATANG', value: spec.rotatorAngleDeg });
  if (spec.pierSide !== undefined) cards.push({ key: 'PIERSIDE', value: spec.pierSide });
  if (spec.objctRa !== undefined) cards.push({ key: 'OBJCTRA', value: spec.objctRa });
  if (spec.objctDec !== undefined) cards.push({ key: 'OBJCTDEC', value: spec.objctDec });
  if (spec.wcs) {
    const s = spec.wcs.scaleArcsecPerPx / 3600;
    const rho = (-spec.wcs.positionAngleDeg * Math.PI) / 180;
    const round = (v: number) => Number(v.toPrecision(12));
    cards.push(
      { key: 'CTYPE1', value: 'RA---TAN' },
      { key: 'CTYPE2', value: 'DEC--TAN' },
      { key: 'CRPIX1', value: (w + 1) / 2 },
      { key: 'CRPIX2', value: (h + 1) / 2 },
      { key: 'CRVAL1', value: round(spec.wcs.raDeg) },
      { key: 'CRVAL2', value: round(spec.wcs.decDeg) },
      { key: 'CD1_1', value: round(-s * Math.cos(rho)) },
      { key: 'CD1_2', value: round(-s * Math.sin(rho)) },
      { key: 'CD2_1', value: round(-s * Math.sin(rho)) },
      { key: 'CD2_2', value: round(s * Math.cos(rho)) },
    );
  }
  return imageCards(w, h, [...cards, ...(spec.extra ?? [])]);
}

/** A whole camera frame file (header, then `dataBytes` of data). */
export function cameraFrame(spec: CameraFrameSpec, options: BuildFitsOptions = {}): Uint8Array {
  return buildFits(cameraFrameCards(spec), options);
}
