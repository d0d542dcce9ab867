/** Loads the demo scenario. Idempotent: existing users, the club and sites are kept as they are. */
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { createDatabase } from '@/db/client';
import { member, organization, site, user } from '@/db/schema';
import { createAuth } from '@/server/auth';
import { loadEnv } from '@/server/env';
import { DEMO_CLUB, DEMO_SITE, DEMO_USERS } from './demo';

const silentMailer = { send: async () => undefined, close: () => undefined };

async function main() {
  const env = loadEnv();
  const db = createDatabase(env.DATABASE_URL, 2);
  const auth = createAuth(env, db, silentMailer);
  try {
    let [club] = await db.select().from(organization).where(eq(organization.slug, DEMO_CLUB.slug));
    if (!club) [club] = await db.insert(organization).values({ id: randomUUID(), ...DEMO_CLUB }).returning();
    for (const demo of DEMO_USERS) {
      let [row] = await db.select().from(user).where(eq(user.email, demo.email));
      if (!row) {
        await auth.api.signUpEmail({ body: { name: demo.name, email: demo.email, password: demo.password } });
        [row] = await db.update(user).set({ role: demo.siteRole, emailVerified: true }).where(eq(user.email, demo.email)).returning();
      }
      const u = row!;
      const [m] = await db.select().from(member).where(and(eq(member.userId, u.id), eq(member.organizationId, club!.id)));
      if (!m) await db.insert(member).values({ id: randomUUID(), organizationId: club!.id, userId: u.id, role: demo.clubRole });
      const [s] = await db.select({ id: site.id }).from(site).where(eq(site.ownerId, u.id)).limit(1);
      if (!s) await db.insert(site).values({ ...DEMO_SITE, ownerId: u.id });
    }
    console.log(`[seed] demo scenario ready: ${DEMO_USERS.map((u) => u.email).join(', ')}`);
  } finally {
    await db.$client.end();
  }
}

main().catch((err: unknown) => {
  console.error('[seed] failed:', err);
  process.exit(1);
});
