/*
 * Sexagesimal right ascension and declination as people type them into a target form or write
 * them into a catalogue file: "05:35:17.3", "05h35m17.3s", "05 35 17.3"; "-05:23:28",
 * "−05°23′28″", "+41 16 09". The sign belongs to the whole angle ("-00 30 00" is −0.5°).
 * Parsers return a result object with a sentence for the form instead of throwing.
 */

export type CoordinateResult = { ok: true; valueDeg: number } | { ok: false; error: string };

const MINUS = /[\u2212\u2012\u2013]/g;
/** Separators and unit marks between the parts: colon, space, h/m/s, d, °, ′ ″ ' " ’ ”. */
const SEPARATORS = /[\s:hdms°'"\u2032\u2033\u2019\u201d]+/i;
const NUMBER = /^\d+(?:\.\d*)?$|^\.\d+$/;

interface Parts {
  negative: boolean;
  explicitSign: boolean;
  values: number[];
  unit: 'hours' | 'degrees' | 'none';
}

function splitParts(text: string): Parts | string {
  const trimmed = text.replace(MINUS, '-').trim();
  if (trimmed === '') return 'Enter a value';
  const sign = trimmed[0] === '-' || trimmed[0] === '+' ? trimmed[0] : '';
  const body = trimmed.slice(sign.length).trim();
  const pieces = body.split(SEPARATORS).filter((p) => p !== '');
  if (pieces.length === 0 || pieces.length > 3) return `"${text}" is not a sexagesimal angle`;
  if (!pieces.every((p) => NUMBER.test(p))) return `"${text}" is not a sexagesimal angle`;
  const values = pieces.map(Number);
  // A decimal fraction is only allowed in the last part ("05:35.3" yes, "05.5:35" no).
  if (pieces.slice(0, -1).some((p) => p.includes('.'))) return `Only the last part of "${text}" may have decimals`;
  const unit = /^[^a-z°]*h/i.test(body) ? 'hours' : /[°d]/i.test(body) ? 'degrees' : 'none';
  return { negative: sign === '-', explicitSign: sign !== '', values, unit };
}

function combine(values: number[], what: string): number | string {
  const [first = 0, minutes = 0, seconds = 0] = values;
  if (values.length >= 2 && minutes >= 60) return `${what} minutes must be below 60`;
  if (values.length >= 3 && seconds >= 60) return `${what} seconds must be below 60`;
  return first + minutes / 60 + seconds / 3600;
}

/**
 * Right ascension text → degrees in [0, 360). Accepts "HH:MM:SS.s", "HHhMMmSS.ss", "HH MM.m",
 * and a single number only with a unit ("5.5877h", "83.82°"), since a bare number is ambiguous.
 * Convention: 1h = 15° (IAU; e.g. Meeus, Astronomical Algorithms, ch. 1).
 */
export function parseRa(text: string): CoordinateResult {
  const parts = splitParts(text);
  if (typeof parts === 'string') return { ok: false, error: parts };
  if (parts.explicitSign) return { ok: false, error: 'Right ascension has no sign' };
  if (parts.values.length === 1) {
    const v = parts.values[0] ?? 0;
    if (parts.unit === 'hours' && v < 24) return { ok: true, valueDeg: v * 15 };
    if (parts.unit === 'degrees' && v < 360) return { ok: true, valueDeg: v };
    if (parts.unit === 'none') return { ok: false, error: 'Give hours, minutes and seconds (05:35:17.3) or add a unit (5.59h, 83.8°)' };
    return { ok: false, error: 'Right ascension must be below 24h (360°)' };
  }
  if (parts.unit === 'degrees') return { ok: false, error: 'Write right ascension in hours, minutes and seconds' };
  const hours = combine(parts.values, 'Right ascension');
  if (typeof hours === 'string') return { ok: false, error: hours };
  if ((parts.values[0] ?? 0) >= 24 || hours >= 24) return { ok: false, error: 'Right ascension hours must be below 24' };
  return { ok: true, valueDeg: hours * 15 };
}

/**
 * Declination text → degrees in [−90, 90]. Accepts "±DD:MM:SS.s", "±DD°MM′SS″" (also with ' and "),
 * "±DD MM.m", a Unicode minus sign, and a bare number of degrees ("-5.39").
 */
export function parseDec(text: string): CoordinateResult {
  const parts = splitParts(text);
  if (typeof parts === 'string') return { ok: false, error: parts };
  if (parts.unit === 'hours') return { ok: false, error: 'Declination is in degrees, not hours' };
  const degrees = combine(parts.values, 'Declination');
  if (typeof degrees === 'string') return { ok: false, error: degrees };
  if (degrees > 90) return { ok: false, error: 'Declination must be between −90° and +90°' };
  return { ok: true, valueDeg: parts.negative ? -degrees : degrees };
}

/** Splits |value| into whole units, minutes and seconds rounded to `decimals`, carrying 60s → 1m. */
function sexagesimal(value: number, decimals: number): [number, number, string] {
  const scale = 10 ** decimals;
  const totalSeconds = Math.round(Math.abs(value) * 3600 * scale) / scale;
  const whole = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor((totalSeconds - whole * 3600) / 60);
  const seconds = totalSeconds - whole * 3600 - minutes * 60;
  const secondsText = seconds.toFixed(decimals).padStart(decimals > 0 ? 3 + decimals : 2, '0');
  return [whole, minutes, secondsText];
}

const two = (n: number) => String(n).padStart(2, '0');

/** Degrees → right ascension text: "05:35:17.3" (`colon`, default) or "05h35m17.3s" (`hms`). */
export function formatRa(raDeg: number, options: { style?: 'colon' | 'hms'; decimals?: number } = {}): string {
  const { style = 'colon', decimals = 1 } = options;
  const wrapped = ((raDeg % 360) + 360) % 360;
  const [h, m, s] = sexagesimal(wrapped / 15, decimals);
  const hours = h % 24;
  return style === 'hms' ? `${two(hours)}h${two(m)}m${s}s` : `${two(hours)}:${two(m)}:${s}`;
}

/** Degrees → declination text: "-05:23:28" (`colon`, default) or "−05°23′28″" (`dms`, Unicode minus). */
export function formatDec(decDeg: number, options: { style?: 'colon' | 'dms'; decimals?: number } = {}): string {
  const { style = 'colon', decimals = 0 } = options;
  const [d, m, s] = sexagesimal(decDeg, decimals);
  const negative = decDeg < 0 && (d > 0 || m > 0 || Number(s) > 0);
  if (style === 'dms') return `${negative ? '\u2212' : '+'}${two(d)}°${two(m)}′${s}″`;
  return `${negative ? '-' : '+'}${two(d)}:${two(m)}:${s}`;
}
