/**
 * Builds the real Express app against the run's PostgreSQL database, with the SMTP fake on a
 * free loopback port, and signs users up through better-auth's own routes.
 */
import { randomUUID } from 'node:crypto';
import { desc, eq, sql } from 'drizzle-orm';
import request from 'supertest';
import { createDatabase, type Database } from '@/db/client';
import { devMail, user } from '@/db/schema';
import { createApp } from '@/server/app';
import { createAuth } from '@/server/auth';
import { loadEnv } from '@/server/env';
import { startFakeSmtp, type FakeSmtp } from '@/server/mail/fake-smtp';
import { createMailer, type Mailer } from '@/server/mail/mailer';

export const ORIGIN = 'http://127.0.0.1:8080';

export interface Harness {
  app: ReturnType<typeof createApp>;
  db: Database;
  close(): Promise<void>;
}

export async function startHarness(envOverrides: Record<string, string> = {}): Promise<Harness> {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set');
  const db = createDatabase(url, 5);
  const smtp: FakeSmtp = await startFakeSmtp(db, 0);
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: url,
    BASE_URL: ORIGIN,
    BETTER_AUTH_SECRET: 'api-test-secret-0123456789abcdef0123',
    SMTP_PORT: String(smtp.port),
    WEB_DIST: '/nonexistent',
    AUTH_RATE_LIMIT: '10000',
    AUTH_STRICT_RATE_LIMIT: '10000',
    ...envOverrides,
  });
  const mailer: Mailer = createMailer({ host: env.SMTP_HOST, port: smtp.port, from: env.MAIL_FROM });
  const app = createApp({ env, db, auth: createAuth(env, db, mailer) });
  return {
    app,
    db,
    async close() {
      mailer.close();
      await smtp.close();
      await db.$client.end();
    },
  };
}

export interface TestUser {
  id: string;
  email: string;
  password: string;
  agent: ReturnType<typeof request.agent>;
}

export const uniqueEmail = (prefix = 'user') => `${prefix}-${randomUUID().slice(0, 8)}@test.example`;

/** Signs up a new user and returns a cookie-carrying agent (every request sends our Origin). */
export async function signUp(h: Harness, opts: { siteAdmin?: boolean; name?: string } = {}): Promise<TestUser> {
  const email = uniqueEmail();
  const password = 'correct-horse-42';
  const agent = request.agent(h.app);
  const res = await agent.post('/api/auth/sign-up/email').set('Origin', ORIGIN).send({ name: opts.name ?? 'Test Imager', email, password });
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  const id = res.body.user.id as string;
  if (opts.siteAdmin) await h.db.update(user).set({ role: 'admin' }).where(eq(user.id, id));
  return { id, email, password, agent };
}

/** Waits for mail to `to` to arrive in the fake's mailbox (the send runs in the request). */
export async function mailTo(h: Harness, to: string, timeoutMs = 5_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const rows = await h.db
      .select()
      .from(devMail)
      .where(sql`${devMail.to} @> ${JSON.stringify([to])}::jsonb`)
      .orderBy(desc(devMail.receivedAt))
      .limit(1);
    if (rows[0]) return rows[0];
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}

export const validSite = {
  name: 'Test Meadow',
  latitudeDeg: 46.93,
  longitudeDeg: 7.62,
  elevationM: 870,
  timeZone: 'Europe/Zurich',
};
