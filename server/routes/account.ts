import { eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { userSettings } from '@/db/schema';
import { accountSettingsSchema, type AccountSettings } from '@/shared/schemas/club-api';
import { parseBody } from './validate';

const DEFAULTS: AccountSettings = { notifyTemplateVersions: true };

/** /api/account/settings: the user's preferences (defaults until first changed). */
export function accountRouter(db: Database): Router {
  const r = Router();

  r.get('/settings', async (_req, res) => {
    const [row] = await db.select().from(userSettings).where(eq(userSettings.userId, res.locals.user.id));
    const settings: AccountSettings = row ? { notifyTemplateVersions: row.notifyTemplateVersions } : DEFAULTS;
    res.json({ settings });
  });

  r.put('/settings', async (req, res) => {
    const body = parseBody(accountSettingsSchema, req);
    const values = { notifyTemplateVersions: body.notifyTemplateVersions, updatedAt: new Date() };
    const [row] = await db
      .insert(userSettings)
      .values({ userId: res.locals.user.id, ...values })
      .onConflictDoUpdate({ target: userSettings.userId, set: values })
      .returning();
    res.json({ settings: { notifyTemplateVersions: row!.notifyTemplateVersions } satisfies AccountSettings });
  });

  return r;
}
