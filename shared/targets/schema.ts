import { z } from 'zod';
import { parseDec, parseRa } from '@/shared/targets/coordinates';

export { formatDec, formatRa, parseDec, parseRa, type CoordinateResult } from '@/shared/targets/coordinates';

/*
 * A catalogue object: one deep-sky object as the target list, the built-in catalogue and an
 * imported CSV know it. Positions are J2000 (ICRS for practical purposes) in decimal degrees;
 * sizes are the apparent major and minor axes in arcminutes.
 *
 * Designation convention (also for aliases): the form `normaliseDesignation` produces —
 * Messier without a space ("M31"), NGC and IC with one space and no leading zeros ("NGC 224",
 * "IC 434", "NGC 1530A"). Aliases hold other designations of the same object and further
 * common names; `name` holds the first common name or ''.
 */

export const TARGET_KINDS = [
  'galaxy',
  'emission-nebula',
  'reflection-nebula',
  'planetary-nebula',
  'supernova-remnant',
  'dark-nebula',
  'open-cluster',
  'globular-cluster',
  'cluster-with-nebula',
  'galaxy-group',
  'star-cloud',
  'asterism',
  'double-star',
  'other',
] as const;

export type TargetKind = (typeof TARGET_KINDS)[number];

export const targetKindSchema = z.enum(TARGET_KINDS, { error: `Type must be one of ${TARGET_KINDS.join(', ')}` });

const designation = z.string({ error: 'Designation must be text' }).trim().min(1, 'Give a designation').max(60, 'At most 60 characters');

function rangeNumber(label: string, unit: string, min: number, max: number, opts: { maxExclusive?: boolean } = {}) {
  // zod 4 numbers already reject NaN and ±Infinity.
  const base = z.number({ error: `${label} must be a number` });
  const upper = opts.maxExclusive ? base.lt(max, `${label} must be below ${max}${unit}`) : base.max(max, `${label} must be at most ${max}${unit}`);
  return upper.min(min, `${label} must be at least ${min}${unit}`);
}

export const catalogueObjectSchema = z
  .object({
    designation,
    aliases: z.array(designation).max(40, 'At most 40 aliases').default([]),
    name: z.string({ error: 'Name must be text' }).trim().max(120, 'At most 120 characters').default(''),
    type: targetKindSchema,
    /** J2000 right ascension, degrees. */
    raDeg: rangeNumber('Right ascension', '°', 0, 360, { maxExclusive: true }),
    /** J2000 declination, degrees. */
    decDeg: rangeNumber('Declination', '°', -90, 90),
    /** Apparent major axis, arcminutes (0 when the catalogue gives none, e.g. a double star). */
    majorArcmin: rangeNumber('Major axis', '′', 0, 1200),
    minorArcmin: rangeNumber('Minor axis', '′', 0, 1200).nullable().default(null),
    /** Position angle of the major axis, degrees east of north. */
    positionAngleDeg: rangeNumber('Position angle', '°', 0, 360).nullable().default(null),
    /** Visual magnitude, or blue (B) magnitude where V is unknown. */
    magnitude: rangeNumber('Magnitude', '', -30, 30).nullable().default(null),
  })
  .refine((o) => o.minorArcmin === null || o.minorArcmin <= o.majorArcmin, { path: ['minorArcmin'], message: 'Minor axis must not exceed the major axis' });

export type CatalogueObject = z.infer<typeof catalogueObjectSchema>;
export type CatalogueObjectInput = z.input<typeof catalogueObjectSchema>;

function coordinateText(parse: typeof parseRa) {
  return z.string({ error: 'Enter a coordinate' }).transform((text, ctx) => {
    const result = parse(text);
    if (result.ok) return result.valueDeg;
    ctx.addIssue({ code: 'custom', message: result.error });
    return z.NEVER;
  });
}

/** Form field: right ascension text ("05:35:17.3", "05h35m17.3s") → degrees. */
export const raTextSchema = coordinateText(parseRa);
/** Form field: declination text ("-05:23:28", "−05°23′28″") → degrees. */
export const decTextSchema = coordinateText(parseDec);
