/**
 * Time-zone helpers built on `Intl` alone (the runtime's IANA database), so server and
 * client agree without a date library.
 */

const YMD = /^(\d{4})-(\d{2})-(\d{2})$/;
const MINUTE_MS = 60_000;
const DAY_MS = 86_400_000;

const partsFormatters = new Map<string, Intl.DateTimeFormat>();

/** One cached formatter per zone: constructing `Intl.DateTimeFormat` is the slow part. */
function partsFormatter(timeZone: string): Intl.DateTimeFormat {
  let formatter = partsFormatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    partsFormatters.set(timeZone, formatter);
  }
  return formatter;
}

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

function toDate(instant: string | Date): Date {
  const date = typeof instant === 'string' ? new Date(instant) : instant;
  if (Number.isNaN(date.getTime())) throw new RangeError(`Not a valid instant: ${String(instant)}`);
  return date;
}

function wallClock(date: Date, timeZone: string): WallClock {
  const fields: Record<string, number> = {};
  for (const part of partsFormatter(timeZone).formatToParts(date)) {
    if (part.type !== 'literal') fields[part.type] = Number(part.value);
  }
  return {
    year: fields.year ?? NaN,
    month: fields.month ?? NaN,
    day: fields.day ?? NaN,
    hour: fields.hour ?? NaN,
    minute: fields.minute ?? NaN,
    second: fields.second ?? NaN,
  };
}

/** Offset of the zone's wall clock from UTC at `epochMs`, in milliseconds (east positive). */
function offsetMs(epochMs: number, timeZone: string): number {
  const wholeSecondMs = Math.floor(epochMs / 1000) * 1000;
  const w = wallClock(new Date(wholeSecondMs), timeZone);
  return Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second) - wholeSecondMs;
}

function parseYmd(dateYmd: string): [number, number, number] {
  const m = YMD.exec(dateYmd);
  const y = Number(m?.[1]);
  const mo = Number(m?.[2]);
  const d = Number(m?.[3]);
  const check = new Date(Date.UTC(y, mo - 1, d));
  if (!m || check.getUTCMonth() !== mo - 1 || check.getUTCDate() !== d) {
    throw new RangeError(`Not a calendar date (YYYY-MM-DD): ${dateYmd}`);
  }
  return [y, mo, d];
}

const pad2 = (n: number): string => String(n).padStart(2, '0');

/**
 * Offset of the zone's local time from UTC at `date`, in minutes, east positive
 * (Europe/Berlin in winter: 60; America/New_York in summer: -240).
 */
export function utcOffsetMinutes(date: string | Date, timeZone: string): number {
  return Math.round(offsetMs(toDate(date).getTime(), timeZone) / MINUTE_MS);
}

/**
 * The UTC instant at which the wall clock in `timeZone` shows `dateYmd hh:mm`.
 * Across DST changes this follows the "compatible" rule of the TC39 Temporal proposal:
 * a time that does not exist (clocks jump forward) is moved forward by the gap, e.g. 02:30
 * on a spring-forward night becomes 03:30; a time that happens twice (clocks fall back) is
 * its first, earlier occurrence.
 */
export function zonedWallTimeToUtc(dateYmd: string, hh: number, mm: number, timeZone: string): Date {
  const [y, mo, d] = parseYmd(dateYmd);
  if (!Number.isInteger(hh) || hh < 0 || hh > 23 || !Number.isInteger(mm) || mm < 0 || mm > 59) {
    throw new RangeError(`Not a wall-clock time: ${hh}:${mm}`);
  }
  const wallAsUtcMs = Date.UTC(y, mo - 1, d, hh, mm);
  // Offsets a day either side bracket at most one transition (zones change at most twice a year).
  const offsetBefore = offsetMs(wallAsUtcMs - DAY_MS, timeZone);
  const offsetAfter = offsetMs(wallAsUtcMs + DAY_MS, timeZone);
  const matches = [wallAsUtcMs - offsetBefore, wallAsUtcMs - offsetAfter].filter(
    (candidate) => offsetMs(candidate, timeZone) === wallAsUtcMs - candidate,
  );
  if (matches.length > 0) return new Date(Math.min(...matches));
  return new Date(wallAsUtcMs - offsetBefore);
}

export interface FormatInZoneOptions {
  /** Show seconds ("18:42:07"); otherwise the time is rounded to the nearest minute. */
  seconds?: boolean;
  /** Prefix the local date ("2026-12-01 18:42"). */
  date?: boolean;
}

/**
 * Local wall-clock time of an instant in `timeZone`, 24-hour and locale-independent:
 * "18:42" by default, "18:42:07" with `seconds`, "2026-12-01 18:42" with `date`.
 * Without seconds the time is rounded to the nearest minute, as almanacs round.
 */
export function formatInZone(instant: string | Date, timeZone: string, opts: FormatInZoneOptions = {}): string {
  const ms = toDate(instant).getTime();
  const roundedMs = opts.seconds ? Math.round(ms / 1000) * 1000 : Math.round(ms / MINUTE_MS) * MINUTE_MS;
  const w = wallClock(new Date(roundedMs), timeZone);
  const time = opts.seconds ? `${pad2(w.hour)}:${pad2(w.minute)}:${pad2(w.second)}` : `${pad2(w.hour)}:${pad2(w.minute)}`;
  return opts.date ? `${w.year}-${pad2(w.month)}-${pad2(w.day)} ${time}` : time;
}

/**
 * ISO 8601 local time with the zone's offset, to the second (milliseconds dropped):
 * "2026-12-01T18:42:00+01:00". UTC is written "+00:00".
 */
export function isoWithOffset(date: string | Date, timeZone: string): string {
  const ms = toDate(date).getTime();
  const w = wallClock(new Date(ms), timeZone);
  const offsetMin = Math.round(offsetMs(ms, timeZone) / MINUTE_MS);
  const sign = offsetMin < 0 ? '-' : '+';
  const abs = Math.abs(offsetMin);
  const local = `${w.year}-${pad2(w.month)}-${pad2(w.day)}T${pad2(w.hour)}:${pad2(w.minute)}:${pad2(w.second)}`;
  return `${local}${sign}${pad2(Math.floor(abs / 60))}:${pad2(abs % 60)}`;
}

/** The local calendar date (YYYY-MM-DD) of an instant in `timeZone`. */
export function localDateYmd(date: string | Date, timeZone: string): string {
  const w = wallClock(toDate(date), timeZone);
  return `${w.year}-${pad2(w.month)}-${pad2(w.day)}`;
}

/** Calendar arithmetic on a YYYY-MM-DD date (no time zone involved): `addDaysYmd('2026-12-31', 1)` → "2027-01-01". */
export function addDaysYmd(dateYmd: string, days: number): string {
  const [y, mo, d] = parseYmd(dateYmd);
  return new Date(Date.UTC(y, mo - 1, d + days)).toISOString().slice(0, 10);
}
