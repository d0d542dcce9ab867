/** Loads the demo scenario. Idempotent: existing users, the club and sites are kept as they are. */
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { createDatabase } from '@/db/client';
import { framing, member, organization, rig, site, target, user } from '@/db/schema';
import { rigInputSchema } from '@/shared/rig/schema';
import { findBuiltinTarget } from '@/shared/targets/builtin';
import { createAuth } from '@/server/auth';
import { loadEnv } from '@/server/env';
import { DEMO_CLUB, DEMO_RIG, DEMO_SITE, DEMO_TARGETS, DEMO_USERS } from './demo';

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
      await seedRigAndTargets(db, u.id);
    }
    console.log(`[seed] demo scenario ready: ${DEMO_USERS.map((u) => u.email).join(', ')}`);
  } finally {
    await db.$client.end();
  }
}

async function seedRigAndTargets(db: ReturnType<typeof createDatabase>, ownerId: string) {
  const [r] = await db.select({ id: rig.id }).from(rig).where(eq(rig.ownerId, ownerId)).limit(1);
  let rigId = r?.id;
  if (!rigId) {
    const spec = rigInputSchema.parse(DEMO_RIG);
    const [created] = await db.insert(rig).values({ ownerId, name: spec.name, spec }).returning({ id: rig.id });
    rigId = created!.id;
  }
  for (const demo of DEMO_TARGETS) {
    const [existing] = await db.select({ id: target.id }).from(target).where(and(eq(target.ownerId, ownerId), eq(target.designation, demo.designation)));
    if (existing) continue;
    const obj = findBuiltinTarget(demo.designation);
    if (!obj) throw new Error(`demo target ${demo.designation} is not in the built-in list`);
    const [t] = await db.insert(target).values({ ...obj, ownerId }).returning({ id: target.id });
    await db.insert(framing).values({ ...demo.framing, targetId: t!.id, rigId });
  }
}

main().catch((err: unknown) => {
  console.error('[seed] failed:', err);
  process.exit(1);
});
