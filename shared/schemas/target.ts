import { z } from 'zod';
import { CATALOGUE_FIELDS } from '@/shared/targets/csv/mapping';
import { catalogueObjectSchema, TARGET_KINDS, targetKindSchema } from '@/shared/targets/schema';

/** A target on the user's list: a catalogue object (or custom coordinates) plus notes. */
export const targetInputSchema = catalogueObjectSchema.and(
  z.object({ notes: z.string({ error: 'Notes must be text' }).max(2000, 'At most 2000 characters').default('') }),
);
export type TargetInput = z.output<typeof targetInputSchema>;

export const targetUpdateSchema = targetInputSchema.and(z.object({ version: z.number().int().positive() }));

const num = (label: string, min: number, max: number) =>
  z.number({ error: `${label} must be a number` }).min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`);

/**
 * A repeatable framing: the field's centre (J2000), the sky position angle of the image's +y
 * axis (degrees east of north), an optional mosaic of cols × rows panels with overlap, and the
 * rig whose field it was drawn for.
 */
export const framingInputSchema = z.object({
  name: z.string({ error: 'Name must be text' }).trim().min(1, 'Give the framing a name').max(80, 'At most 80 characters'),
  raDeg: z.number({ error: 'Right ascension must be a number' }).min(0, 'Right ascension must be at least 0').lt(360, 'Right ascension must be below 360°'),
  decDeg: num('Declination', -90, 90),
  positionAngleDeg: z.number({ error: 'Position angle must be a number' }).min(0, 'Position angle must be at least 0').lt(360, 'Position angle must be below 360°').default(0),
  mosaicCols: z.number().int('Panels are whole numbers').min(1, 'At least 1 panel').max(10, 'At most 10 panels across').default(1),
  mosaicRows: z.number().int('Panels are whole numbers').min(1, 'At least 1 panel').max(10, 'At most 10 panels down').default(1),
  overlapPct: num('Overlap', 0, 50).default(10),
  rigId: z.string().uuid('Not a rig id').nullable().default(null),
  source: z.enum(['manual', 'fits']).default('manual'),
  /** What the FITS header said (scale, mirrored, file name), kept for the record. */
  sourceDetail: z.record(z.string(), z.union([z.string(), z.number(), z.boolean(), z.null()])).default({}),
});
export type FramingInput = z.output<typeof framingInputSchema>;
export const framingUpdateSchema = framingInputSchema.extend({ version: z.number().int().positive() });

export const framingSchema = framingInputSchema.extend({
  id: z.string().uuid(),
  targetId: z.string().uuid(),
  version: z.number().int().positive(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Framing = z.output<typeof framingSchema>;

export type Target = TargetInput & {
  id: string;
  version: number;
  createdAt: string;
  updatedAt: string;
  framings: Framing[];
};

const optionalNumber = z.preprocess((v) => (v === '' || v === undefined ? undefined : v), z.coerce.number().optional());

/** Query of GET /api/catalogue/search. */
export const catalogueSearchQuerySchema = z.object({
  q: z.string().max(100, 'At most 100 characters').optional(),
  kind: z.preprocess((v) => (typeof v === 'string' ? v.split(',').filter(Boolean) : v), z.array(targetKindSchema).optional()),
  minSizeArcmin: optionalNumber,
  maxSizeArcmin: optionalNumber,
  faintestMag: optionalNumber,
  /** "1": keep only objects with at least `minDarkMinutes` of darkness above the site's minimum altitude. */
  wellPlaced: z.enum(['0', '1']).optional(),
  minDarkMinutes: optionalNumber,
  siteId: z.string().uuid('Not a site id').optional(),
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD').optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export interface CatalogueSearchResult {
  source: 'builtin' | 'catalogue';
  catalogueId: string | null;
  catalogueName: string | null;
  designation: string;
  aliases: string[];
  name: string;
  type: (typeof TARGET_KINDS)[number];
  raDeg: number;
  decDeg: number;
  majorArcmin: number;
  minorArcmin: number | null;
  positionAngleDeg: number | null;
  magnitude: number | null;
  /** Minutes of darkness above the site's minimum altitude, when a night was asked for. */
  darkMinutes: number | null;
}

export interface CatalogueSummary {
  id: string;
  name: string;
  objectCount: number;
  clubId: string | null;
  clubName: string | null;
  ownedByMe: boolean;
  createdAt: string;
}

/** Query of POST /api/catalogues and /api/catalogues/preview (the CSV text is the body). */
export const catalogueImportQuerySchema = z.object({
  name: z.string().trim().min(1, 'Give the catalogue a name').max(80, 'At most 80 characters').optional(),
  clubId: z.string().min(1).max(100).optional(),
  /** JSON of a CsvMapping; absent: the detected layout. */
  mapping: z.string().max(4000).optional(),
  /** "1": store the good rows even though some rows had errors (the user confirmed). */
  acceptErrors: z.enum(['0', '1']).default('0'),
});

/** A CSV column mapping as the import form edits it and the API receives it (JSON in `mapping`). */
export const csvMappingSchema = z.object({
  layout: z.enum(['openngc', 'generic']),
  delimiter: z.enum([',', ';', '\t']),
  columns: z.partialRecord(z.enum(CATALOGUE_FIELDS), z.string().max(200)),
  bareRaUnit: z.enum(['degrees', 'hours']).default('hours'),
});
