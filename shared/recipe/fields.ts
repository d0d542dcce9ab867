import { z } from 'zod';

export { between, whole } from '@/shared/rig/fields';

/*
 * Building blocks of the recipe schemas. No transforms or preprocessing anywhere, so the same
 * schemas can be turned into the plan's JSON Schema (plan-format.md).
 */

/** A node, rule or reference id: a uuid as `crypto.randomUUID()` makes them. */
export const idSchema = z.uuid({ error: 'Not a valid id (expected a uuid)' });

/** Optional display name of a node. */
export const labelSchema = z.string({ error: 'Label must be text' }).trim().max(80, 'A label has at most 80 characters');

/** Sun events a window, a wait or a repeat can refer to, in the order of a night. */
export const SUN_EVENTS = [
  'sunset',
  'civil-dusk',
  'nautical-dusk',
  'astronomical-dusk',
  'astronomical-dawn',
  'nautical-dawn',
  'civil-dawn',
  'sunrise',
] as const;
export type SunEvent = (typeof SUN_EVENTS)[number];
export const sunEventSchema = z.enum(SUN_EVENTS, { error: `Sun event is one of ${SUN_EVENTS.join(', ')}` });

const HHMM = '([01]\\d|2[0-3]):[0-5]\\d';
const ISO_WITH_OFFSET = `\\d{4}-\\d{2}-\\d{2}T${HHMM}(:[0-5]\\d(\\.\\d{1,9})?)?(Z|[+-]([01]\\d|2[0-3]):[0-5]\\d)`;
const CLOCK_TIME = new RegExp(`^(${HHMM}|${ISO_WITH_OFFSET})$`);
const TIME_OR_SUN_EVENT = new RegExp(`^(${SUN_EVENTS.join('|')}|${HHMM}|${ISO_WITH_OFFSET})$`);

/** True for "HH:MM" (local at the site) or an ISO 8601 date-time with an offset on a real date. */
export function isClockTime(text: string): boolean {
  if (!CLOCK_TIME.test(text)) return false;
  if (text.length === 5) return true;
  const ymd = text.slice(0, 10);
  const d = new Date(`${ymd}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === ymd;
}

/** True for a named sun event. */
export function isSunEvent(text: string): text is SunEvent {
  return (SUN_EVENTS as readonly string[]).includes(text);
}

const CLOCK_MESSAGE = 'Use a time as HH:MM (local at the site) or ISO 8601 with an offset, e.g. 2025-03-01T21:30:00+01:00';
const TIME_OR_EVENT_MESSAGE = `Use a sun event (${SUN_EVENTS.join(', ')}) or a time as HH:MM or ISO 8601 with an offset`;

/** A clock time: "HH:MM" local at the site, or ISO 8601 with offset. */
export const clockTimeSchema = z
  .string({ error: CLOCK_MESSAGE })
  .regex(CLOCK_TIME, { message: CLOCK_MESSAGE, abort: true })
  .refine(isClockTime, 'Not a calendar date');

/** A point in the night: a named sun event or a clock time. */
export const timeOrSunEventSchema = z
  .string({ error: TIME_OR_EVENT_MESSAGE })
  .regex(TIME_OR_SUN_EVENT, { message: TIME_OR_EVENT_MESSAGE, abort: true })
  .refine((v) => isSunEvent(v) || isClockTime(v), 'Not a calendar date');

/** An angle of position, degrees east of north, 0 ≤ PA < 360. */
export const positionAngleSchema = z
  .number({ error: 'Position angle must be a number' })
  .min(0, 'Position angle must be between 0 and 360°')
  .lt(360, 'Position angle must be below 360°');

/** Right ascension in degrees, 0 ≤ RA < 360. */
export const raDegSchema = z.number({ error: 'Right ascension must be a number' }).min(0, 'Right ascension must be at least 0°').lt(360, 'Right ascension must be below 360°');

/** Declination in degrees. */
export const decDegSchema = z.number({ error: 'Declination must be a number' }).min(-90, 'Declination must be between -90 and 90°').max(90, 'Declination must be between -90 and 90°');

type Shapes = Record<string, z.ZodType>;

/**
 * Exactly one of several keys, e.g. `{count}` or `{clock}`: a union of objects in which every
 * other key is forbidden. The TypeScript type narrows with `x.count !== undefined`.
 * A present key with a bad value reports that key's own message and path (zod picks the only
 * option that failed on a value rather than on shape).
 */
export function exactlyOne<S extends Shapes>(what: string, shapes: S) {
  const keys = Object.keys(shapes) as (keyof S & string)[];
  const options = keys.map((key) => {
    const shape: Record<string, z.ZodType> = {};
    for (const other of keys) shape[other] = other === key ? (shapes[key] as z.ZodType) : z.never().optional();
    return z.object(shape);
  });
  const list = keys.join(', ');
  return z.union(options as unknown as [OneOf<S>, ...OneOf<S>[]], {
    error: (issue) => {
      const input = issue.input;
      if (typeof input !== 'object' || input === null || Array.isArray(input)) return `${what}: give an object with one of ${list}`;
      const given = keys.filter((k) => (input as Record<string, unknown>)[k] !== undefined);
      if (given.length === 0) return `${what}: give one of ${list}`;
      if (given.length > 1) return `${what}: give only one of ${list} (found ${given.join(' and ')})`;
      const branches = (issue as { errors?: { message: string }[][] }).errors;
      const first = branches?.[keys.indexOf(given[0] as keyof S & string)]?.[0]?.message;
      return `${what}: ${given[0]} ${first ? `is not valid (${first})` : 'is not valid'}`;
    },
  });
}

/** One option of `exactlyOne`: the chosen key and every other key absent. */
type OneOf<S extends Shapes> = {
  [K in keyof S]: z.ZodObject<{ [P in keyof S]: P extends K ? S[P] : z.ZodOptional<z.ZodNever> }>;
}[keyof S];
