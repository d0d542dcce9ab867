/** Clubs, members and recipes for the club and template API tests. */
import { createNode } from '@/shared/recipe/factory';
import type { RecipeNode } from '@/shared/recipe/types';
import { ORIGIN, signUp, type Harness, type TestUser } from './harness';

export type Role = 'owner' | 'admin' | 'member';

export async function createClub(owner: TestUser, name: string): Promise<string> {
  const res = await owner.agent.post('/api/auth/organization/create').set('Origin', ORIGIN).send({ name, slug: `${name.toLowerCase().replace(/\W+/g, '-')}-${owner.id.slice(0, 8).toLowerCase()}` });
  if (res.status !== 200) throw new Error(`club create failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

/** Invites `u` with `role` and accepts; returns the invitation id. */
export async function joinClub(owner: TestUser, u: TestUser, clubId: string, role: Exclude<Role, 'owner'>): Promise<string> {
  const inv = await owner.agent.post('/api/auth/organization/invite-member').set('Origin', ORIGIN).send({ email: u.email, role, organizationId: clubId });
  if (inv.status !== 200) throw new Error(`invite failed: ${inv.status} ${JSON.stringify(inv.body)}`);
  const acc = await u.agent.post('/api/auth/organization/accept-invitation').set('Origin', ORIGIN).send({ invitationId: inv.body.id });
  if (acc.status !== 200) throw new Error(`accept failed: ${acc.status} ${JSON.stringify(acc.body)}`);
  return inv.body.id as string;
}

export interface ClubCast {
  clubId: string;
  otherClubId: string;
  owner: TestUser;
  admin: TestUser;
  member: TestUser;
  outsider: TestUser;
  /** Owner of another club, a member of none of this one. */
  otherOwner: TestUser;
}

/** A club with an owner, an admin and a member, plus an outsider and another club's owner. */
export async function clubCast(h: Harness, name: string): Promise<ClubCast> {
  const [owner, admin, member, outsider, otherOwner] = [
    await signUp(h, { name: 'Club Owner' }),
    await signUp(h, { name: 'Club Admin' }),
    await signUp(h, { name: 'Club Member' }),
    await signUp(h, { name: 'Outsider' }),
    await signUp(h, { name: 'Other Owner' }),
  ];
  const clubId = await createClub(owner, name);
  await joinClub(owner, admin, clubId, 'admin');
  await joinClub(owner, member, clubId, 'member');
  const otherClubId = await createClub(otherOwner, `${name} Rivals`);
  return { clubId, otherClubId, owner, admin, member, outsider, otherOwner };
}

/** A rig of the user's with these filter slots; returns its id. */
export async function makeRig(u: TestUser, name: string, slots: { name: string; band: string; focusOffsetSteps?: number }[]): Promise<string> {
  const res = await u.agent.post('/api/rigs').set('Origin', ORIGIN).send({ name, filterWheel: { slots } });
  if (res.status !== 201) throw new Error(`rig failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.rig.id as string;
}

export const NARROWBAND_SLOTS = [
  { name: 'Astro Ha 7nm', band: 'Ha', focusOffsetSteps: 12 },
  { name: 'O3 6.5', band: 'OIII', focusOffsetSteps: -8 },
  { name: 'S2 6.5', band: 'SII', focusOffsetSteps: -5 },
];
export const LRGB_HA_SLOTS = [
  { name: 'Lum', band: 'L' },
  { name: 'Red', band: 'R' },
  { name: 'Green', band: 'G' },
  { name: 'Blue', band: 'B' },
  { name: 'H-alpha 3nm', band: 'Ha' },
];

/** A narrowband recipe on a narrowband rig: one stage on the user's target, gain set on every sub. */
export async function narrowbandRecipe(u: TestUser): Promise<{ recipeId: string; rigId: string; targetId: string }> {
  const rigId = await makeRig(u, 'Narrowband rig', NARROWBAND_SLOTS);
  const t = await u.agent.post('/api/targets').set('Origin', ORIGIN).send({ designation: 'NGC 7000', name: 'North America Nebula', type: 'emission-nebula', raDeg: 314.75, decDeg: 44.53, majorArcmin: 120 });
  const targetId = t.body.target.id as string;
  const exposes = NARROWBAND_SLOTS.map((s) => createNode('expose', { filter: s.name, exposureS: 300, count: 12, gain: 100 }));
  const stage: RecipeNode = { ...createNode('stage', { targetId }), children: [createNode('focus', { filter: 'Astro Ha 7nm', stepSize: 35 }), ...exposes] };
  const tree = { children: [createNode('cool', {}), stage, createNode('park', {})] };
  const res = await u.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'Narrowband night', rigId, start: { kind: 'tree', tree } });
  if (res.status !== 201) throw new Error(`recipe failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { recipeId: res.body.recipe.id as string, rigId, targetId };
}

/** Publishes a recipe of `u` to the club; returns the template id. */
export async function publish(u: TestUser, clubId: string, recipeId: string, title = 'Narrowband triad'): Promise<string> {
  const res = await u.agent.post(`/api/clubs/${clubId}/templates`).set('Origin', ORIGIN).send({ recipeId, title, description: 'Three narrowband filters, 5 min subs', tags: ['narrowband'], changelog: 'First version' });
  if (res.status !== 201) throw new Error(`publish failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.template.id as string;
}
