import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clubCast, joinClub, narrowbandRecipe, publish, type ClubCast } from './club-fixtures';
import { mailTo, ORIGIN, signUp, startHarness, uniqueEmail, type Harness } from './harness';

let h: Harness;
let c: ClubCast;
beforeAll(async () => {
  h = await startHarness();
  c = await clubCast(h, 'Dark Meadow Circle');
});
afterAll(async () => h.close());

const post = (u: { agent: ClubCast['owner']['agent'] }, path: string, body: object) => u.agent.post(path).set('Origin', ORIGIN).send(body);

describe('/api/clubs', () => {
  it('401 without a session', async () => {
    expect((await request(h.app).get('/api/clubs')).status).toBe(401);
    expect((await request(h.app).get(`/api/clubs/${c.clubId}`)).status).toBe(401);
  });

  it('lists the clubs of each role with counts; an outsider sees none of them', async () => {
    const { recipeId } = await narrowbandRecipe(c.admin);
    await publish(c.admin, c.clubId, recipeId, 'Listed template');
    for (const [u, roles] of [[c.owner, ['owner']], [c.admin, ['admin']], [c.member, ['member']]] as const) {
      const res = await u.agent.get('/api/clubs');
      expect(res.status).toBe(200);
      const club = res.body.clubs.find((x: { id: string }) => x.id === c.clubId);
      expect(club).toMatchObject({ name: 'Dark Meadow Circle', myRoles: roles, memberCount: 3 });
      expect(club.templateCount).toBeGreaterThanOrEqual(1);
    }
    expect((await c.outsider.agent.get('/api/clubs')).body.clubs).toEqual([]);
    expect((await c.otherOwner.agent.get('/api/clubs')).body.clubs.map((x: { id: string }) => x.id)).toEqual([c.otherClubId]);
  });

  it('shows the club page to members; pending invitations only to owners and admins; 404 to others', async () => {
    const pending = uniqueEmail('pending');
    expect((await post(c.owner, '/api/auth/organization/invite-member', { email: pending, role: 'member', organizationId: c.clubId })).status).toBe(200);
    for (const u of [c.owner, c.admin]) {
      const res = await u.agent.get(`/api/clubs/${c.clubId}`);
      expect(res.status).toBe(200);
      expect(res.body.invitations.map((i: { email: string }) => i.email)).toContain(pending);
      expect(res.body.members).toHaveLength(3);
    }
    const asMember = await c.member.agent.get(`/api/clubs/${c.clubId}`);
    expect(asMember.status).toBe(200);
    expect(asMember.body).toMatchObject({ club: { id: c.clubId, name: 'Dark Meadow Circle' }, myRoles: ['member'], invitations: [] });
    expect(asMember.body.members.map((m: { roles: string[] }) => m.roles[0]).sort()).toEqual(['admin', 'member', 'owner']);
    expect((await c.outsider.agent.get(`/api/clubs/${c.clubId}`)).status).toBe(404);
    expect((await c.otherOwner.agent.get(`/api/clubs/${c.clubId}`)).status).toBe(404);
    expect((await c.member.agent.get(`/api/clubs/${c.otherClubId}`)).status).toBe(404);
    expect((await c.member.agent.get('/api/clubs/no-such-club')).status).toBe(404);
  });
});

describe('club management through better-auth', () => {
  it('refuses a member inviting (403) and a member changing roles', async () => {
    expect((await post(c.member, '/api/auth/organization/invite-member', { email: uniqueEmail('x'), role: 'member', organizationId: c.clubId })).status).toBe(403);
    const page = await c.owner.agent.get(`/api/clubs/${c.clubId}`);
    expect(page.status).toBe(200);
    const members = await c.owner.agent.get(`/api/auth/organization/list-members?organizationId=${c.clubId}`);
    const adminMember = members.body.members.find((m: { userId: string }) => m.userId === c.admin.id);
    // Our club page carries better-auth's membership id, so the client needs no second call.
    expect(page.body.members.find((m: { userId: string }) => m.userId === c.admin.id).memberId).toBe(adminMember.id);
    const res = await post(c.member, '/api/auth/organization/update-member-role', { memberId: adminMember.id, role: 'member', organizationId: c.clubId });
    expect(res.status).toBe(403);
    expect((await c.admin.agent.get(`/api/clubs/${c.clubId}`)).body.myRoles).toEqual(['admin']);
  });

  it('refuses the last owner leaving (400 from better-auth) until ownership is handed over', async () => {
    const owner = await signUp(h, { name: 'Lone Owner' });
    const heir = await signUp(h, { name: 'Heir' });
    const created = await post(owner, '/api/auth/organization/create', { name: 'Lone Club', slug: `lone-${owner.id.slice(0, 8).toLowerCase()}` });
    const clubId = created.body.id as string;
    const refused = await post(owner, '/api/auth/organization/leave', { organizationId: clubId });
    expect(refused.status).toBe(400);
    expect((await owner.agent.get(`/api/clubs/${clubId}`)).status).toBe(200);
    // Demoting oneself as the only owner is refused too.
    const list = await owner.agent.get(`/api/auth/organization/list-members?organizationId=${clubId}`);
    const me = list.body.members[0];
    expect((await post(owner, '/api/auth/organization/update-member-role', { memberId: me.id, role: 'member', organizationId: clubId })).status).toBe(400);
    // Hand over, then leave.
    await joinClub(owner, heir, clubId, 'member');
    const all = await owner.agent.get(`/api/auth/organization/list-members?organizationId=${clubId}`);
    const heirMember = all.body.members.find((m: { userId: string }) => m.userId === heir.id);
    expect((await post(owner, '/api/auth/organization/update-member-role', { memberId: heirMember.id, role: 'owner', organizationId: clubId })).status).toBe(200);
    expect((await post(owner, '/api/auth/organization/leave', { organizationId: clubId })).status).toBe(200);
    expect((await owner.agent.get(`/api/clubs/${clubId}`)).status).toBe(404);
    expect((await heir.agent.get(`/api/clubs/${clubId}`)).body.myRoles).toEqual(['owner']);
  });

  it('lets a member leave; the club then answers 404', async () => {
    const u = await signUp(h, { name: 'Brief Member' });
    await joinClub(c.owner, u, c.clubId, 'member');
    expect((await post(u, '/api/auth/organization/leave', { organizationId: c.clubId })).status).toBe(200);
    expect((await u.agent.get(`/api/clubs/${c.clubId}`)).status).toBe(404);
  });

  it('mails the inviter when an invitation is accepted, with a link to the club', async () => {
    const inviter = await signUp(h, { name: 'Inviting Owner' });
    const invitee = await signUp(h, { name: 'New Friend' });
    const created = await post(inviter, '/api/auth/organization/create', { name: 'Mail Club', slug: `mail-club-${inviter.id.slice(0, 8).toLowerCase()}` });
    const clubId = created.body.id as string;
    const inv = await post(inviter, '/api/auth/organization/invite-member', { email: invitee.email, role: 'member', organizationId: clubId });
    const invitation = await mailTo(h, invitee.email);
    expect(invitation.text).toContain(`/invitations/${inv.body.id}`);
    expect((await post(invitee, '/api/auth/organization/accept-invitation', { invitationId: inv.body.id })).status).toBe(200);
    const accepted = await mailTo(h, inviter.email);
    expect(accepted.subject).toBe('New Friend joined Mail Club');
    expect(accepted.text).toContain(`${ORIGIN}/clubs/${clubId}`);
  });
});

describe('/api/account/settings', () => {
  it('401 without a session; defaults, then stores the choice; 400 on bad input; 403 cross-site', async () => {
    expect((await request(h.app).get('/api/account/settings')).status).toBe(401);
    const u = await signUp(h);
    expect((await u.agent.get('/api/account/settings')).body).toEqual({ settings: { notifyTemplateVersions: true } });
    const bad = await u.agent.put('/api/account/settings').set('Origin', ORIGIN).send({ notifyTemplateVersions: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.notifyTemplateVersions).toBeDefined();
    expect((await u.agent.put('/api/account/settings').set('Origin', 'https://evil.example').send({ notifyTemplateVersions: false })).status).toBe(403);
    expect((await u.agent.get('/api/account/settings')).body.settings.notifyTemplateVersions).toBe(true);
    const ok = await u.agent.put('/api/account/settings').set('Origin', ORIGIN).send({ notifyTemplateVersions: false });
    expect(ok.body).toEqual({ settings: { notifyTemplateVersions: false } });
    expect((await u.agent.get('/api/account/settings')).body.settings.notifyTemplateVersions).toBe(false);
  });
});
