import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { nightSchema } from '@/shared/schemas/night';
import { ORIGIN, signUp, startHarness, validSite, type Harness } from './harness';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h.close());

describe('GET /api/tonight', () => {
  it('401 without a session', async () => {
    const res = await request(h.app).get('/api/tonight');
    expect(res.status).toBe(401);
  });

  it("404 'no-site' for a user without a site", async () => {
    const u = await signUp(h);
    const res = await u.agent.get('/api/tonight');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('no-site');
  });

  it('computes the night at the default site for a given date', async () => {
    const u = await signUp(h);
    await u.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
    const res = await u.agent.get('/api/tonight?date=2026-12-01');
    expect(res.status).toBe(200);
    const night = nightSchema.parse(res.body.night);
    expect(res.body.site.name).toBe(validSite.name);
    expect(night.date).toBe('2026-12-01');
    expect(night.timeZone).toBe('Europe/Zurich');
    // Early December at 47° N: sunset about 16:40 local (15:40 UT), darkness well over 12 h.
    // Rough bounds from the geometry (computed), the exact values are checked in the unit tests.
    expect(night.sunset!.slice(0, 13)).toBe('2026-12-01T15');
    expect(night.darkHours).toBeGreaterThan(11);
    expect(night.darkHours).toBeLessThan(14);
  });

  it('400 for a malformed date or site id, 404 for a foreign site', async () => {
    const u = await signUp(h);
    const other = await signUp(h);
    const created = await other.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite);
    const bad = await u.agent.get('/api/tonight?date=2026-13-40');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.date).toBeDefined();
    expect((await u.agent.get('/api/tonight?siteId=nope')).status).toBe(400);
    expect((await u.agent.get(`/api/tonight?siteId=${created.body.site.id}`)).status).toBe(404);
  });
});
