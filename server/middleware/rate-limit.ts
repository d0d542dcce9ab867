import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import type { RequestHandler } from 'express';
import type { Database } from '@/db/client';

/**
 * A fixed-window request limit per client address for our own public routes, counted in
 * PostgreSQL (better-auth's `rate_limit` table, under keys of our own prefix) so that every
 * server process shares the counts and none keeps state in memory. Over the limit: 429 JSON with
 * Retry-After. The address is Express's `req.ip` (a proxy is trusted only on loopback).
 */
export function rateLimitPerClient(db: Database, opts: { prefix: string; windowS: number; max: number }): RequestHandler {
  const windowMs = opts.windowS * 1000;
  return async (req, res, next) => {
    const key = `nightloom:${opts.prefix}:${req.ip ?? 'unknown'}`;
    const now = Date.now();
    const expired = now - windowMs;
    // `last_request` holds the start of the key's current window.
    const rows = await db.execute<{ count: number; last_request: string }>(sql`
      INSERT INTO rate_limit (id, key, count, last_request) VALUES (${randomUUID()}, ${key}, 1, ${now})
      ON CONFLICT (key) DO UPDATE SET
        count = CASE WHEN rate_limit.last_request < ${expired} THEN 1 ELSE rate_limit.count + 1 END,
        last_request = CASE WHEN rate_limit.last_request < ${expired} THEN ${now} ELSE rate_limit.last_request END
      RETURNING count, last_request`);
    const row = rows.rows[0];
    if (row && row.count > opts.max) {
      const retryS = Math.max(1, Math.ceil((Number(row.last_request) + windowMs - now) / 1000));
      res.set('Retry-After', String(retryS));
      res.status(429).json({ error: { code: 'too-many-requests', message: `Too many requests: try again in ${retryS} s` } });
      return;
    }
    next();
  };
}
