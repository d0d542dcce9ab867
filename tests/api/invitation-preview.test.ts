import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitation } from '@/db/schema';
import { maskEmail } from '@/server/routes/invitation-preview';
import { createClub, joinClub } from './club-fixtures';
import { ORIGIN, signUp, startHarness, type Harness, type TestUser } from './harness';

let h: Harness;
let owner: TestUser;
let clubId: string;
const CLUB = 'Quarry Hill Imaging Circle';
beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h, { name: 'Ines Varga' });
  clubId = await createClub(owner, CLUB);
});
afterAll(async () => h.close());

/** An invitation from the owner; returns its id. */
async function invite(email: string, role: 'member' | 'admin' = 'member'): Promise<string> {
  const res = await owner.agent.post('/api/auth/organization/invite-member').set('Origin', ORIGIN).send({ email, role, organizationId: clubId });
  if (res.status !== 200) throw new Error(`invite failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

// Plain requests, no cookie: the link is opened before signing up or in.
const preview = (id: string) => request(h.app).get(`/api/invitations/${encodeURIComponent(id)}/preview`);
const quarryAddress = () => `tomas.${randomUUID().slice(0, 8)}@quarryhill.example`;

describe('GET /api/invitations/:id/preview', () => {
  it('shows a pending invitation without a session: exactly club, inviter, role, masked address, expiry, status', async () => {
    const email = quarryAddress();
    const id = await invite(email);
    const res = await preview(id);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    const [stored] = await h.db.select().from(invitation).where(eq(invitation.id, id));
    expect(res.body).toEqual({
      clubName: CLUB,
      inviterName: 'Ines Varga',
      role: 'member',
      email: 't***@quarryhill.example',
      expiresAt: stored!.expiresAt.toISOString(),
      status: 'pending',
    });
    // No ids, no full address, nothing of the members.
    const text = JSON.stringify(res.body);
    for (const secret of [id, clubId, owner.id, owner.email, email]) expect(text).not.toContain(secret);
    // Reading it changes nothing.
    expect((await h.db.select({ status: invitation.status }).from(invitation).where(eq(invitation.id, id)))[0]?.status).toBe('pending');
  });

  it('names the role the club chose', async () => {
    const res = await preview(await invite(quarryAddress(), 'admin'));
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('admin');
  });

  it('answers a signed-in visitor the same way', async () => {
    const email = quarryAddress();
    const id = await invite(email);
    const someone = await signUp(h, { name: 'Someone Else' });
    const res = await someone.agent.get(`/api/invitations/${id}/preview`);
    expect(res.status).toBe(200);
    expect(res.body.clubName).toBe(CLUB);
  });

  it('410 for a revoked invitation', async () => {
    const id = await invite(quarryAddress());
    expect((await owner.agent.post('/api/auth/organization/cancel-invitation').set('Origin', ORIGIN).send({ invitationId: id })).status).toBe(200);
    const res = await preview(id);
    expect(res.status).toBe(410);
    expect(res.body).toEqual({ error: { code: 'invitation-revoked', message: expect.stringContaining('withdrew') } });
  });

  it('410 for an accepted invitation', async () => {
    const joiner = await signUp(h, { name: 'Tomas Joiner' });
    const id = await joinClub(owner, joiner, clubId, 'member');
    const res = await preview(id);
    expect(res.status).toBe(410);
    expect(res.body).toEqual({ error: { code: 'invitation-accepted', message: expect.stringContaining('already been accepted') } });
  });

  it('410 for a declined invitation', async () => {
    const decliner = await signUp(h, { name: 'Tomas Decliner' });
    const id = await invite(decliner.email);
    expect((await decliner.agent.post('/api/auth/organization/reject-invitation').set('Origin', ORIGIN).send({ invitationId: id })).status).toBe(200);
    const res = await preview(id);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('invitation-declined');
  });

  it('410 for a pending invitation past its expiry', async () => {
    const id = await invite(quarryAddress());
    await h.db.update(invitation).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(invitation.id, id));
    const res = await preview(id);
    expect(res.status).toBe(410);
    expect(res.body).toEqual({ error: { code: 'invitation-expired', message: expect.stringContaining('expired') } });
  });

  it('404 for an id of the right form that matches no invitation', async () => {
    for (const id of [randomUUID(), 'Zq7Kp2Lx9Vb4Nc8Mw3Rt6Yh1Jd5Gf0Ae']) {
      const res = await preview(id);
      expect(res.status).toBe(404);
      expect(res.body).toEqual({ error: { code: 'not-found', message: expect.stringContaining('No invitation') } });
    }
  });

  it('400 for anything that is not an invitation id, before asking the database', async () => {
    for (const junk of ['abc', 'x'.repeat(65), "'; select 1 --", '../../etc/passwd', 'aaaaaaaaaaaaaaaa aaaaaaaaaaaaaaa', 'Zq7Kp2Lx9Vb4Nc8Mw3Rt6Yh1Jd5Gf0A_']) {
      const res = await preview(junk);
      expect(res.status, junk).toBe(400);
      expect(res.body.error.code).toBe('invalid-invitation-id');
    }
  });

  it('is read-only: other methods and paths under /api/invitations answer 404', async () => {
    const id = await invite(quarryAddress());
    expect((await request(h.app).post(`/api/invitations/${id}/preview`).set('Origin', ORIGIN).send({})).status).toBe(404);
    expect((await request(h.app).get(`/api/invitations/${id}`)).status).toBe(404);
  });
});

describe(maskEmail, () => {
  it('keeps the first letter and the domain', () => {
    expect(maskEmail('tomas@quarryhill.example')).toBe('t***@quarryhill.example');
    expect(maskEmail('t@quarryhill.example')).toBe('t***@quarryhill.example');
    expect(maskEmail('odd"@name"@quarryhill.example')).toBe('o***@quarryhill.example');
  });

  it('hides everything of an address without a local part or an @', () => {
    expect(maskEmail('@quarryhill.example')).toBe('***');
    expect(maskEmail('not-an-address')).toBe('***');
  });
});
