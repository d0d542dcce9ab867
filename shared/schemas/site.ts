import { z } from 'zod';
import { horizonPointSchema, horizonProfileSchema } from '@/shared/horizon/profile';

/** True when `name` is an IANA time zone this runtime knows (e.g. "Europe/Berlin"). */
export function isIanaTimeZone(name: string): boolean {
  if (!name.includes('/') && name !== 'UTC') return false;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** Fields a user edits; the same schema validates the site form and the API body. */
export const siteInputSchema = z.object({
  name: z.string().trim().min(1, 'Give the site a name').max(80, 'At most 80 characters'),
  latitudeDeg: z.number({ error: 'Latitude must be a number' }).min(-90, 'Latitude is between -90 and 90').max(90, 'Latitude is between -90 and 90'),
  longitudeDeg: z.number({ error: 'Longitude must be a number' }).min(-180, 'Longitude is between -180 and 180').max(180, 'Longitude is between -180 and 180'),
  elevationM: z.number({ error: 'Elevation must be a number' }).min(-500, 'Elevation is at least -500 m').max(9000, 'Elevation is at most 9000 m'),
  timeZone: z.string().trim().refine(isIanaTimeZone, 'Use an IANA time zone such as Europe/Berlin'),
  isDefault: z.boolean().default(false),
  /** Lowest altitude worth imaging at, applied on top of the horizon profile (30° is common practice). */
  minAltitudeDeg: z.number({ error: 'Minimum altitude must be a number' }).min(0, 'Minimum altitude is between 0 and 80°').max(80, 'Minimum altitude is between 0 and 80°').default(30),
  /** Typical temperatures at dusk and dawn: they drive focus drift and cooling in the dry run. */
  duskTempC: z.number({ error: 'Dusk temperature must be a number' }).min(-50, 'Dusk temperature is between -50 and 50 °C').max(50, 'Dusk temperature is between -50 and 50 °C').default(10),
  dawnTempC: z.number({ error: 'Dawn temperature must be a number' }).min(-50, 'Dawn temperature is between -50 and 50 °C').max(50, 'Dawn temperature is between -50 and 50 °C').default(5),
  /** The local horizon (trees, roofs): azimuth → altitude points; empty for a flat horizon. */
  horizon: horizonProfileSchema.shape.points.default([]),
});
export type SiteInput = z.output<typeof siteInputSchema>;
export type SiteInputRaw = z.input<typeof siteInputSchema>;
export { horizonPointSchema };

/** A stored site as the API returns it. `version` guards concurrent edits. */
export const siteSchema = siteInputSchema.extend({
  id: z.string().uuid(),
  version: z.number().int().positive(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Site = z.infer<typeof siteSchema>;

/** Update body: the edited fields plus the version the client last saw. */
export const siteUpdateSchema = siteInputSchema.extend({
  version: z.number().int().positive(),
});
export type SiteUpdate = z.infer<typeof siteUpdateSchema>;
