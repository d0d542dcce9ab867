import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailTo, ORIGIN, signUp, startHarness, uniqueEmail, type Harness } from './harness';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h.close());

describe('health and unknown routes', () => {
  it('answers /api/health without a session', async () => {
    const res = await request(h.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ok: true, db: 'up' });
  });

  it('answers an unknown API path with JSON 404, not the web app', async () => {
    const u = await signUp(h);
    const res = await u.agent.get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });
});

describe('site administrator pages', () => {
  it('401 without a session, 403 for an ordinary user, 200 for a site admin', async () => {
    expect((await request(h.app).get('/api/dev/mail')).status).toBe(401);
    const plain = await signUp(h);
    const res = await plain.agent.get('/api/dev/mail');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    const admin = await signUp(h, { siteAdmin: true });
    const ok = await admin.agent.get('/api/dev/mail');
    expect(ok.status).toBe(200);
    expect(Array.isArray(ok.body.messages)).toBe(true);
  });
});

describe('clubs and roles (organization plugin)', () => {
  it('lets the owner invite by e-mail and refuses the same action to a plain member (403)', async () => {
    const owner = await signUp(h, { name: 'Club Owner' });
    const created = await owner.agent.post('/api/auth/organization/create').set('Origin', ORIGIN).send({ name: 'Test Circle', slug: `test-circle-${owner.id.slice(0, 6).toLowerCase()}` });
    expect(created.status).toBe(200);
    const clubId = created.body.id as string;

    const memberUser = await signUp(h, { name: 'Plain Member' });
    const invite = await owner.agent.post('/api/auth/organization/invite-member').set('Origin', ORIGIN).send({ email: memberUser.email, role: 'member', organizationId: clubId });
    expect(invite.status).toBe(200);
    const mail = await mailTo(h, memberUser.email);
    expect(mail.subject).toContain('Test Circle');
    expect(mail.text).toContain(`/invitations/${invite.body.id}`);

    const accept = await memberUser.agent.post('/api/auth/organization/accept-invitation').set('Origin', ORIGIN).send({ invitationId: invite.body.id });
    expect(accept.status).toBe(200);

    const memberInvite = await memberUser.agent
      .post('/api/auth/organization/invite-member')
      .set('Origin', ORIGIN)
      .send({ email: uniqueEmail('outsider'), role: 'member', organizationId: clubId });
    expect(memberInvite.status).toBe(403);
  });
});

describe('compression', () => {
  it('gzips JSON answers when the client accepts it', async () => {
    const u = await signUp(h);
    for (let i = 0; i < 3; i += 1) await u.agent.post('/api/sites').set('Origin', ORIGIN).send({ name: `Compressed site ${i} with a fairly long name to pass the size threshold`, latitudeDeg: 46.9, longitudeDeg: 7.6, elevationM: 870, timeZone: 'Europe/Zurich' });
    const res = await u.agent.get('/api/tonight').set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
  });
});
