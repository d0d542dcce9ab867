/**
 * Display formatting for times, dates, durations and coordinates. Times are always shown in
 * the site's zone, 24-hour, so they line up in tables (with tabular figures in the styles).
 */
import { formatInZone } from '@/shared/time';

const formatterCache = new Map<string, Intl.DateTimeFormat>();

function formatter(key: string, make: () => Intl.DateTimeFormat): Intl.DateTimeFormat {
  let f = formatterCache.get(key);
  if (!f) {
    f = make();
    formatterCache.set(key, f);
  }
  return f;
}

function clockFormatter(timeZone: string) {
  return formatter(`clock|${timeZone}`, () =>
    new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }),
  );
}

/** "21:47" in the given zone, rounded to the nearest minute as the shared helper (and the server) does. */
export function formatClock(instant: string | number | Date, timeZone: string): string {
  return formatInZone(new Date(instant), timeZone);
}

/** Local hour and minute of an instant in a zone. */
export function localHourMinute(instantMs: number, timeZone: string): { hour: number; minute: number } {
  const parts = clockFormatter(timeZone).formatToParts(new Date(instantMs));
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value ?? 0);
  return { hour: get('hour') % 24, minute: get('minute') };
}

/** "Wed 3 Dec 2025" for a YYYY-MM-DD calendar date (no zone shift: it is a date, not an instant). */
export function formatNightDate(dateYmd: string, opts: { year?: boolean } = {}): string {
  const withYear = opts.year ?? true;
  const f = formatter(`date|${withYear}`, () =>
    new Intl.DateTimeFormat('en-GB', {
      timeZone: 'UTC',
      weekday: 'short',
      day: 'numeric',
      month: 'short',
      ...(withYear ? { year: 'numeric' as const } : {}),
    }),
  );
  // Joined from parts so every engine gives the same "Wed 3 Dec 2025", without stray commas.
  return f
    .formatToParts(new Date(`${dateYmd}T12:00:00Z`))
    .filter((p) => p.type !== 'literal')
    .map((p) => p.value)
    .join(' ');
}

/** "3 Dec, 21:04" in the viewer's own zone, for log entries such as sent mail. */
export function formatLogTime(instant: string): string {
  const date = new Date(instant);
  if (Number.isNaN(date.getTime())) return instant;
  const f = formatter('log', () =>
    new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }),
  );
  return f.format(date);
}

/** "6 h 05 min" from hours. */
export function formatDurationHours(hours: number): string {
  const totalMin = Math.max(0, Math.round(hours * 60));
  const h = Math.floor(totalMin / 60);
  const m = totalMin % 60;
  if (h === 0) return `${m} min`;
  return `${h} h ${String(m).padStart(2, '0')} min`;
}

function formatAngle(deg: number, positive: string, negative: string): string {
  const hemisphere = deg >= 0 ? positive : negative;
  return `${Math.abs(deg).toFixed(4)}° ${hemisphere}`;
}

/** "47.1200° N" */
export function formatLatitude(deg: number): string {
  return formatAngle(deg, 'N', 'S');
}

/** "8.2000° E" */
export function formatLongitude(deg: number): string {
  return formatAngle(deg, 'E', 'W');
}

/** "1 250 m" with a thin space as thousands separator. */
export function formatElevation(m: number): string {
  const rounded = Math.round(m);
  const digits = String(Math.abs(rounded)).replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f');
  return `${rounded < 0 ? '−' : ''}${digits} m`;
}

/** "63 %" from a 0..1 fraction. */
export function formatPercent(fraction: number): string {
  return `${Math.round(fraction * 100)} %`;
}

/** The viewer's own IANA zone, used to prefill a new site. */
export function deviceTimeZone(): string {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  } catch {
    return 'UTC';
  }
}
