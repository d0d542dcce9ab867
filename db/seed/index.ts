/** Loads the demo scenario. Idempotent: existing users, the club and sites are kept as they are. */
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { createDatabase } from '@/db/client';
import { framing, member, organization, recipe, recipeRevision, rig, site, target, user } from '@/db/schema';
import { starterRecipe } from '@/shared/recipe/starters';
import { countNodes } from '@/shared/recipe/tree';
import { targetIds as treeTargetIds, totals } from '@/shared/recipe/summary';
import { rigInputSchema } from '@/shared/rig/schema';
import { findBuiltinTarget } from '@/shared/targets/builtin';
import { createAuth } from '@/server/auth';
import { loadEnv } from '@/server/env';
import { seedCaptures } from './captures';
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
      if (demo.clubRole === 'owner') await seedCaptures(db, u.id, club!.id);
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
  const targetRows: { id: string; name: string }[] = [];
  for (const demo of DEMO_TARGETS) {
    const [existing] = await db.select({ id: target.id }).from(target).where(and(eq(target.ownerId, ownerId), eq(target.designation, demo.designation)));
    if (existing) {
      targetRows.push({ id: existing.id, name: demo.designation });
      continue;
    }
    const obj = findBuiltinTarget(demo.designation);
    if (!obj) throw new Error(`demo target ${demo.designation} is not in the built-in list`);
    const [t] = await db.insert(target).values({ ...obj, ownerId }).returning({ id: target.id });
    await db.insert(framing).values({ ...demo.framing, targetId: t!.id, rigId });
    targetRows.push({ id: t!.id, name: demo.designation });
  }
  // A starter recipe over the first two targets, so the composer and the dry run have something to show.
  const [r2] = await db.select({ id: recipe.id }).from(recipe).where(eq(recipe.ownerId, ownerId)).limit(1);
  if (!r2) {
    const [s2] = await db.select({ id: site.id }).from(site).where(eq(site.ownerId, ownerId)).limit(1);
    const spec = (await db.select({ spec: rig.spec }).from(rig).where(eq(rig.id, rigId)))[0]!.spec;
    const made = starterRecipe({ rig: spec, targets: targetRows.slice(0, 2), name: 'Autumn pair: Andromeda and the Wall' });
    const tree = made.tree;
    const [row] = await db
      .insert(recipe)
      .values({ ownerId, name: made.name, notes: '', rigId, siteId: s2?.id ?? null, tree, nodeCount: countNodes(tree), targetCount: treeTargetIds(tree).length, plannedExposureS: totals(tree).lightShutterS })
      .returning();
    await db.insert(recipeRevision).values({ recipeId: row!.id, version: 1, name: row!.name, notes: '', tree, nodeCount: row!.nodeCount });
  }
}

main().catch((err: unknown) => {
  console.error('[seed] failed:', err);
  process.exit(1);
});
