/*
 * Sexagesimal angles as camera software writes them in OBJCTRA / OBJCTDEC: "05 35 17.3",
 * "05:35:17.3", "05h35m17.3s", "-05 23 28", "-00 30 00" (the sign belongs to the whole angle).
 */

const PARTS = /^([+-])?\s*(\d+(?:\.\d*)?)(?:[\s:hd°]+(\d+(?:\.\d*)?))?(?:[\s:m']+(\d+(?:\.\d*)?))?\s*(?:s|"|'')?$/i;

function parse(text: string, maxFirst: number): number | undefined {
  const m = PARTS.exec(text.trim());
  if (!m) return undefined;
  const [, sign, a, b, c] = m;
  const first = Number(a);
  const minutes = b === undefined ? 0 : Number(b);
  const seconds = c === undefined ? 0 : Number(c);
  if (first > maxFirst || minutes >= 60 || seconds >= 60) return undefined;
  const value = first + minutes / 60 + seconds / 3600;
  return sign === '-' ? -value : value;
}

/** Right ascension "HH MM SS.s" (hours) → degrees 0..360 (× 15); undefined when unreadable. */
export function parseSexagesimalHoursToDeg(text: string): number | undefined {
  const hours = parse(text, 24);
  if (hours === undefined || hours < 0 || hours > 24) return undefined;
  return (hours * 15) % 360;
}

/** Declination "±DD MM SS.s" → degrees −90..90; undefined when unreadable or out of range. */
export function parseSexagesimalDeg(text: string): number | undefined {
  const deg = parse(text, 90);
  if (deg === undefined || Math.abs(deg) > 90) return undefined;
  return deg;
}
