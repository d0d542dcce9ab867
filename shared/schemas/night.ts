import { z } from 'zod';

/** A calendar date (the local evening on which the night begins), YYYY-MM-DD. */
export const nightDateSchema = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD').refine((s) => {
  const d = new Date(`${s}T12:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
}, 'Not a calendar date');

const isoInstant = z.string().nullable();

/**
 * One night at a site, from the local noon of `date` to the next local noon.
 * Every instant is an ISO 8601 UTC string, or null when the event does not happen
 * in that span (polar day or night, a Moon that does not rise).
 */
export const nightSchema = z.object({
  date: nightDateSchema,
  timeZone: z.string(),
  /** Start and end of the span the events are searched in (local noon to local noon). */
  spanStart: z.string(),
  spanEnd: z.string(),
  sunset: isoInstant,
  sunrise: isoInstant,
  civilDusk: isoInstant,
  civilDawn: isoInstant,
  nauticalDusk: isoInstant,
  nauticalDawn: isoInstant,
  astronomicalDusk: isoInstant,
  astronomicalDawn: isoInstant,
  /** Astronomical darkness (Sun below -18°); null start/end when the Sun never gets that low. */
  darkStart: isoInstant,
  darkEnd: isoInstant,
  darkHours: z.number(),
  moonrise: isoInstant,
  moonset: isoInstant,
  /** Illuminated fraction of the Moon's disc, 0..1, at the middle of the night. */
  moonIllumination: z.number(),
  /** Phase angle along the ecliptic, degrees 0..360 (0 new, 180 full), at the middle of the night. */
  moonPhaseDeg: z.number(),
  /** Sun altitude samples for drawing the night band: every 10 minutes across the span. */
  sunAltitudes: z.array(z.object({ t: z.string(), altDeg: z.number() })),
  moonAltitudes: z.array(z.object({ t: z.string(), altDeg: z.number() })),
});
export type Night = z.infer<typeof nightSchema>;

export const tonightQuerySchema = z.object({
  siteId: z.string().uuid('Not a site id').optional(),
  date: nightDateSchema.optional(),
});
