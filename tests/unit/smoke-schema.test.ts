import { describe, expect, it } from 'vitest';
import { isIanaTimeZone, siteInputSchema } from '@/shared/schemas/site';

describe('siteInputSchema', () => {
  it('accepts a plausible site and rejects an unknown time zone', () => {
    const ok = siteInputSchema.safeParse({ name: 'Field', latitudeDeg: 47.1, longitudeDeg: 8.2, elevationM: 600, timeZone: 'Europe/Zurich' });
    expect(ok.success).toBe(true);
    const bad = siteInputSchema.safeParse({ name: 'Field', latitudeDeg: 47.1, longitudeDeg: 8.2, elevationM: 600, timeZone: 'Mars/Olympus' });
    expect(bad.success).toBe(false);
  });
  it('knows UTC and rejects bare abbreviations', () => {
    expect(isIanaTimeZone('UTC')).toBe(true);
    expect(isIanaTimeZone('CET')).toBe(false);
  });
});
