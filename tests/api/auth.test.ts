import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { session, user } from '@/db/schema';
import { mailTo, ORIGIN, signUp, startHarness, uniqueEmail, type Harness } from './harness';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h.close());

describe('sign-up, sign-in and sign-out', () => {
  it('signs up, reads the session, signs out and loses it', async () => {
    const u = await signUp(h);
    const me = await u.agent.get('/api/auth/get-session');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(u.email);
    expect(me.body.user.role).toBe('user');
    const out = await u.agent.post('/api/auth/sign-out').set('Origin', ORIGIN).send({});
    expect(out.status).toBe(200);
    const after = await u.agent.get('/api/sites');
    expect(after.status).toBe(401);
  });

  it('signs in with the right password only', async () => {
    const u = await signUp(h);
    const fresh = request.agent(h.app);
    const bad = await fresh.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: u.email, password: 'wrong-password-1' });
    expect(bad.status).toBe(401);
    const good = await fresh.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: u.email, password: u.password });
    expect(good.status).toBe(200);
    expect((await fresh.get('/api/sites')).status).toBe(200);
  });

  it('rejects a short password and stores no user', async () => {
    const email = uniqueEmail('short');
    const res = await request(h.app).post('/api/auth/sign-up/email').set('Origin', ORIGIN).send({ name: 'X', email, password: 'short' });
    expect(res.status).toBe(400);
    expect(await h.db.select().from(user).where(eq(user.email, email))).toHaveLength(0);
  });

  it('refuses a sign-in from a foreign origin (CSRF guard stays on under NODE_ENV=test)', async () => {
    const u = await signUp(h);
    const res = await request(h.app).post('/api/auth/sign-in/email').set('Origin', 'http://evil.example').send({ email: u.email, password: u.password });
    expect(res.status).toBe(403);
  });
});

describe('password reset by e-mail', () => {
  it('mails a link that leads to a working new password and ends old sessions', async () => {
    const u = await signUp(h);
    const ask = await request(h.app)
      .post('/api/auth/request-password-reset')
      .set('Origin', ORIGIN)
      .send({ email: u.email, redirectTo: `${ORIGIN}/reset-password` });
    expect(ask.status).toBe(200);
    const mail = await mailTo(h, u.email);
    expect(mail.subject).toMatch(/reset/i);
    const link = /https?:\/\/\S+\/api\/auth\/reset-password\/\S+/.exec(mail.text)?.[0];
    expect(link).toBeDefined();
    // Following the link redirects to the app's page with the token.
    const follow = await request(h.app).get(new URL(link!).pathname + new URL(link!).search);
    expect(follow.status).toBe(302);
    const target = new URL(follow.headers.location as string);
    expect(target.pathname).toBe('/reset-password');
    const token = target.searchParams.get('token');
    expect(token).toBeTruthy();
    const reset = await request(h.app).post('/api/auth/reset-password').set('Origin', ORIGIN).send({ token, newPassword: 'a-brand-new-pass-9' });
    expect(reset.status).toBe(200);
    expect(await h.db.select().from(session).where(eq(session.userId, u.id))).toHaveLength(0);
    const fresh = request.agent(h.app);
    const signIn = await fresh.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: u.email, password: 'a-brand-new-pass-9' });
    expect(signIn.status).toBe(200);
  });

  it('rejects a made-up token', async () => {
    const res = await request(h.app).post('/api/auth/reset-password').set('Origin', ORIGIN).send({ token: 'not-a-token', newPassword: 'whatever-pass-1' });
    expect(res.status).toBe(400);
  });
});
