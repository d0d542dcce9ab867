import { headerFingerprint } from '@/shared/fits/fingerprint';
import type { FitsLookup } from '@/shared/fits/header';
import { parseSexagesimalDeg, parseSexagesimalHoursToDeg } from '@/shared/fits/sexagesimal';

/*
 * Camera keywords are conventions, not the standard (checks.md, FITS): read them tolerantly,
 * require none of them. A field is undefined when its keyword is absent or unreadable.
 */

export type FrameType = 'light' | 'dark' | 'flat' | 'bias';

export interface FrameRecord {
  /** From IMAGETYP; null when absent or not recognised (see `imageTypeText`). */
  frameType: FrameType | null;
  imageTypeText?: string;
  object?: string;
  /** DATE-OBS as an ISO 8601 UTC instant (the standard's DATE-OBS is UTC). */
  dateObsUtc?: string;
  exposureS?: number;
  filter?: string;
  /** The camera's own gain setting (often unitless, not e−/ADU). */
  gain?: number;
  offset?: number;
  binning?: { x: number; y: number };
  /** READOUTM, else READMODE: the camera's named readout mode (darks match on it). */
  readoutMode?: string;
  setTempC?: number;
  sensorTempC?: number;
  focuserPositionSteps?: number;
  rotatorAngleDeg?: number;
  pierSide?: 'east' | 'west';
  /** XPIXSZ as written; some software writes the binned pixel size. */
  pixelSizeUm?: number;
  focalLengthMm?: number;
  widthPx?: number;
  heightPx?: number;
  /** Pointing from OBJCTRA / OBJCTDEC (sexagesimal), else RA / DEC in degrees. */
  raDeg?: number;
  decDeg?: number;
  /** See `headerFingerprint`: equal for the same exposure read twice. */
  fingerprint: string;
}

function text(h: FitsLookup, ...keys: string[]): string | undefined {
  for (const key of keys) {
    const v = h.get(key);
    if (typeof v === 'string' && v.trim() !== '') return v.trim();
  }
  return undefined;
}

/** A number, or a string holding one (some software quotes numbers). */
function num(h: FitsLookup, ...keys: string[]): number | undefined {
  for (const key of keys) {
    const v = h.get(key);
    if (typeof v === 'number' && Number.isFinite(v)) return v;
    if (typeof v === 'string' && /^\s*[+-]?(\d+\.?\d*|\.\d+)([EeDd][+-]?\d+)?\s*$/.test(v)) return Number(v.trim().replace(/[Dd]/, 'E'));
  }
  return undefined;
}

/**
 * Frame type from IMAGETYP in its common spellings: "Light Frame", "LIGHT", "Object",
 * "Dark Frame", "Flat Field", "FLAT", "Bias Frame", "ZERO", "Offset"; a dark for flats counts
 * as a dark. Null when the text is none of these.
 */
export function frameTypeFromText(value: string): FrameType | null {
  const t = value.toLowerCase().replace(/[^a-z]/g, '');
  if (t.includes('dark')) return 'dark';
  if (t.includes('flat')) return 'flat';
  if (t.includes('bias') || t === 'zero' || t.startsWith('offset')) return 'bias';
  if (t.includes('light') || t === 'object' || t === 'science') return 'light';
  return null;
}

/** DATE-OBS "YYYY-MM-DDThh:mm:ss[.s…]" (UTC) → ISO 8601 with Z; undefined for other forms. */
export function dateObsToIso(value: string): string | undefined {
  const m = /^(\d{4}-\d{2}-\d{2})[T ](\d{2}:\d{2}:\d{2}(?:\.\d+)?)Z?$/.exec(value.trim());
  if (!m) return undefined;
  const ms = Date.parse(`${m[1]}T${m[2]}Z`);
  if (Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== m[1]) return undefined;
  return new Date(ms).toISOString();
}

function pierSideFrom(value: string | undefined): 'east' | 'west' | undefined {
  const v = value?.toLowerCase();
  return v === 'east' || v === 'west' ? v : undefined;
}

function binningFrom(h: FitsLookup): { x: number; y: number } | undefined {
  const x = num(h, 'XBINNING');
  const y = num(h, 'YBINNING') ?? x;
  if (x === undefined || y === undefined || !Number.isInteger(x) || !Number.isInteger(y) || x < 1 || y < 1) return undefined;
  return { x, y };
}

function pointingFrom(h: FitsLookup): { raDeg?: number; decDeg?: number } {
  const raText = text(h, 'OBJCTRA');
  const decText = text(h, 'OBJCTDEC');
  let raDeg = raText === undefined ? undefined : parseSexagesimalHoursToDeg(raText);
  let decDeg = decText === undefined ? undefined : parseSexagesimalDeg(decText);
  if (raDeg === undefined || decDeg === undefined) {
    const ra = h.get('RA');
    const dec = h.get('DEC');
    if (typeof ra === 'number' && typeof dec === 'number' && ra >= 0 && ra < 360 && Math.abs(dec) <= 90) {
      raDeg = ra;
      decDeg = dec;
    }
  }
  return raDeg === undefined || decDeg === undefined ? {} : { raDeg, decDeg };
}

/**
 * Reads the camera conventions of checks.md (IMAGETYP, OBJECT, DATE-OBS, EXPTIME/EXPOSURE,
 * FILTER, GAIN, OFFSET, XBINNING/YBINNING, READOUTM/READMODE, SET-TEMP, CCD-TEMP, FOCUSPOS/FOCPOS, ROTATANG,
 * PIERSIDE, XPIXSZ, FOCALLEN, OBJCTRA/OBJCTDEC) into a frame record. Never throws for a
 * missing or odd keyword.
 */
export function frameFromHeader(h: FitsLookup): FrameRecord {
  const imageTypeText = text(h, 'IMAGETYP');
  const dateObs = text(h, 'DATE-OBS');
  return {
    frameType: imageTypeText === undefined ? null : frameTypeFromText(imageTypeText),
    imageTypeText,
    object: text(h, 'OBJECT'),
    dateObsUtc: dateObs === undefined ? undefined : dateObsToIso(dateObs),
    exposureS: num(h, 'EXPTIME', 'EXPOSURE'),
    filter: text(h, 'FILTER'),
    gain: num(h, 'GAIN'),
    offset: num(h, 'OFFSET'),
    binning: binningFrom(h),
    readoutMode: text(h, 'READOUTM', 'READMODE'),
    setTempC: num(h, 'SET-TEMP'),
    sensorTempC: num(h, 'CCD-TEMP'),
    focuserPositionSteps: num(h, 'FOCUSPOS', 'FOCPOS'),
    rotatorAngleDeg: num(h, 'ROTATANG'),
    pierSide: pierSideFrom(text(h, 'PIERSIDE')),
    pixelSizeUm: num(h, 'XPIXSZ'),
    focalLengthMm: num(h, 'FOCALLEN'),
    widthPx: num(h, 'NAXIS1'),
    heightPx: num(h, 'NAXIS2'),
    ...pointingFrom(h),
    fingerprint: headerFingerprint(h),
  };
}
