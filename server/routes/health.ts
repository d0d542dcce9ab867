import { sql } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';

/** GET /api/health: answers without a session; 503 when the database does not answer. */
export function healthRouter(db: Database): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    try {
      await db.execute(sql`select 1`);
      res.json({ ok: true, db: 'up' });
    } catch {
      res.status(503).json({ ok: false, db: 'down', error: { code: 'db-down', message: 'The database does not answer' } });
    }
  });
  return r;
}
