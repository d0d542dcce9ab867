import { z } from 'zod';

const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d{1,9})?(Z|[+-]([01]\d|2[0-3]):[0-5]\d)$/;
const MESSAGE = 'Use ISO 8601 with an offset, e.g. 2026-12-01T21:30:00+01:00';

/** An instant as ISO 8601 with seconds and an offset (the site's, on export). */
export const isoInstantSchema = z
  .string({ error: MESSAGE })
  .regex(ISO_INSTANT, { message: MESSAGE, abort: true })
  .refine((text) => {
    const ymd = text.slice(0, 10);
    const d = new Date(`${ymd}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === ymd;
  }, 'Not a calendar date');
