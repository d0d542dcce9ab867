import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';

/** An error with an HTTP status and a stable code that the client can act on. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const notFound = (what = 'Not found') => new HttpError(404, 'not-found', what);
export const forbidden = (what = 'You are not allowed to do that') => new HttpError(403, 'forbidden', what);
export const conflict = (message: string, extra: Record<string, unknown> = {}) => new HttpError(409, 'version-conflict', message, extra);

/** Field errors keyed by the dotted path of each issue, the shape the client's forms show. */
export function fieldErrors(err: ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export const apiNotFound: RequestHandler = (req, _res, next) => next(notFound(`No API route ${req.method} ${req.path}`));

/** The last middleware: every error becomes JSON `{ error: { code, message, ... } }`. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof ZodError) {
    res.status(400).json({ error: { code: 'invalid-input', message: 'Some fields need attention', fields: fieldErrors(err) } });
    return;
  }
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, ...err.extra } });
    return;
  }
  const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status === 500) console.error('[api] unexpected error:', err);
  const code = err?.type === 'entity.parse.failed' ? 'invalid-json' : err?.type === 'entity.too.large' ? 'too-large' : status === 500 ? 'internal' : 'bad-request';
  const message = status === 500 ? 'Something went wrong on the server' : code === 'invalid-json' ? 'The request body is not valid JSON' : code === 'too-large' ? 'The request body is too large' : String(err?.message ?? 'Bad request');
  res.status(status).json({ error: { code, message } });
};
