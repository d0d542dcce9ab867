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
