import type { Request } from 'express';
import { z, type ZodType } from 'zod';
import { HttpError } from '@/server/errors';

/** Parses the JSON body with a shared zod schema; a ZodError becomes a 400 with field errors. */
export function parseBody<T>(schema: ZodType<T>, req: Request): T {
  if (req.body === undefined || req.body === null || typeof req.body !== 'object') {
    throw new HttpError(400, 'invalid-input', 'Send a JSON object as the request body');
  }
  return schema.parse(req.body);
}

export function parseQuery<T>(schema: ZodType<T>, req: Request): T {
  return schema.parse(req.query);
}

const uuid = z.string().uuid();
/** A route id that is not a uuid cannot exist: answer 404 rather than asking the database. */
export function parseId(value: unknown, what: string): string {
  const r = uuid.safeParse(value);
  if (!r.success) throw new HttpError(404, 'not-found', `No such ${what}`);
  return r.data;
}
