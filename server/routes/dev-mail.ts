import { desc } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { devMail } from '@/db/schema';

/** GET /api/dev/mail: mail captured by the local SMTP fake, newest first (site admins only). */
export function devMailRouter(db: Database): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    const rows = await db.select().from(devMail).orderBy(desc(devMail.receivedAt)).limit(100);
    res.json({ messages: rows.map((m) => ({ ...m, receivedAt: m.receivedAt.toISOString() })) });
  });
  return r;
}
