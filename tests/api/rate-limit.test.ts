import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORIGIN, startHarness, uniqueEmail, type Harness } from './harness';

// Two app instances on one database stand for two server processes behind a proxy.
let a: Harness;
let b: Harness;
beforeAll(async () => {
  a = await startHarness({ AUTH_STRICT_RATE_LIMIT: '3' });
  b = await startHarness({ AUTH_STRICT_RATE_LIMIT: '3' });
});
afterAll(async () => {
  await a.close();
  await b.close();
});

describe('sign-in rate limit', () => {
  it('counts attempts per client address in PostgreSQL, shared by every server process', async () => {
    const clientIp = '203.0.113.7'; // documentation range (RFC 5737), via a trusted proxy header
    const attempt = (h: Harness) =>
      request(h.app)
        .post('/api/auth/sign-in/email')
        .set('Origin', ORIGIN)
        .set('X-Forwarded-For', clientIp)
        .send({ email: uniqueEmail('nobody'), password: 'wrong-password-1' });
    // Supertest connects from loopback, the one proxy the app trusts, so X-Forwarded-For counts.
    expect((await attempt(a)).status).toBe(401);
    expect((await attempt(b)).status).toBe(401);
    expect((await attempt(a)).status).toBe(401);
    const limited = await attempt(b);
    expect(limited.status).toBe(429);
    // Another address is not affected.
    const other = await request(a.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .set('X-Forwarded-For', '203.0.113.8')
      .send({ email: uniqueEmail('nobody'), password: 'wrong-password-1' });
    expect(other.status).toBe(401);
  });

  it('ignores a client-supplied copy of the internal address header', async () => {
    const res = await request(a.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .set('X-Forwarded-For', '203.0.113.7')
      .set('X-Nightloom-Client-Ip', '198.51.100.1')
      .send({ email: uniqueEmail('nobody'), password: 'wrong-password-1' });
    expect(res.status).toBe(429);
  });
});

describe('public invitation preview rate limit', () => {
  it('answers 429 with Retry-After past the limit per client address, counted across processes', async () => {
    const p1 = await startHarness({ AUTH_RATE_LIMIT: '3' });
    const p2 = await startHarness({ AUTH_RATE_LIMIT: '3' });
    try {
      const clientIp = '203.0.113.21'; // documentation range (RFC 5737)
      const preview = (h: Harness, ip = clientIp) => request(h.app).get('/api/invitations/0123456789abcdef0123456789abcdef/preview').set('X-Forwarded-For', ip);
      expect((await preview(p1)).status).toBe(404);
      expect((await preview(p2)).status).toBe(404);
      expect((await preview(p1)).status).toBe(404);
      const limited = await preview(p2);
      expect(limited.status).toBe(429);
      expect(limited.body.error.code).toBe('too-many-requests');
      expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
      expect(Number(limited.headers['retry-after'])).toBeLessThanOrEqual(60);
      // Another address still gets its answer.
      expect((await preview(p1, '203.0.113.22')).status).toBe(404);
    } finally {
      await p1.close();
      await p2.close();
    }
  });
});
