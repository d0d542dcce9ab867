import { describe, expect, it } from 'vitest';
import { computeNight, type NightSite } from '@/shared/ephemeris/night';
import type { Night } from '@/shared/schemas/night';
import { addDaysYmd } from '@/shared/time';

const MINUTE_MS = 60_000;
const ms = (iso: string | null): number => {
  if (iso === null) throw new Error('expected an instant, got null');
  return new Date(iso).getTime();
};

const USNO_SITE: NightSite = { latitudeDeg: 29, longitudeDeg: -81, elevationM: 0, timeZone: 'America/New_York' };

describe('computeNight against the USNO rise/set tables', () => {
  // U.S. Naval Observatory rise/set tables, 2019, W 81°, N 29°, times UT (checks.md); tolerance 1 min.
  // Each local night (noon to noon, America/New_York) holds that evening's sunset and the next
  // morning's sunrise, so the sunrise of date D comes from the night of D − 1.
  const sun = [
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Sun Jan 1 12:18/22:38
    { date: '2019-01-01', rise: '2019-01-01T12:18Z', set: '2019-01-01T22:38Z' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Sun Mar 20 11:28/23:35
    { date: '2019-03-20', rise: '2019-03-20T11:28Z', set: '2019-03-20T23:35Z' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Sun Jun 21 10:26/00:26 (next day)
    { date: '2019-06-21', rise: '2019-06-21T10:26Z', set: '2019-06-22T00:26Z' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Sun Sep 23 11:13/23:20
    { date: '2019-09-23', rise: '2019-09-23T11:13Z', set: '2019-09-23T23:20Z' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Sun Dec 21 12:13/22:31
    { date: '2019-12-21', rise: '2019-12-21T12:13Z', set: '2019-12-21T22:31Z' },
  ];
  for (const row of sun) {
    it(`Sun on ${row.date}`, () => {
      const sunrise = computeNight(USNO_SITE, addDaysYmd(row.date, -1)).sunrise;
      const sunset = computeNight(USNO_SITE, row.date).sunset;
      expect(Math.abs(ms(sunrise) - ms(row.rise))).toBeLessThanOrEqual(MINUTE_MS);
      expect(Math.abs(ms(sunset) - ms(row.set))).toBeLessThanOrEqual(MINUTE_MS);
    });
  }

  // The Moon's table is by UT date: an event of UT date D lies in the local night of D − 1
  // (before about 16:00 UT) or of D; collect both and keep the one on D.
  const moon = [
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Moon Jan 1 08:12/19:34
    { date: '2019-01-01', rise: '08:12', set: '19:34' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Moon Mar 10 14:07/02:16
    { date: '2019-03-10', rise: '14:07', set: '02:16' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Moon Jun 15 22:57/09:07
    { date: '2019-06-15', rise: '22:57', set: '09:07' },
    // U.S. Naval Observatory, 2019, W 81°, N 29°, times UT: Moon Sep 13 23:38/10:31
    { date: '2019-09-13', rise: '23:38', set: '10:31' },
  ];
  const onUtDate = (date: string, pick: (n: Night) => string | null): string => {
    const found = [computeNight(USNO_SITE, addDaysYmd(date, -1)), computeNight(USNO_SITE, date)]
      .map(pick)
      .filter((iso): iso is string => iso !== null && iso.startsWith(date));
    expect(found).toHaveLength(1);
    return found[0] ?? '';
  };
  for (const row of moon) {
    it(`Moon on ${row.date}`, () => {
      const rise = onUtDate(row.date, (n) => n.moonrise);
      const set = onUtDate(row.date, (n) => n.moonset);
      expect(Math.abs(ms(rise) - ms(`${row.date}T${row.rise}Z`))).toBeLessThanOrEqual(MINUTE_MS);
      expect(Math.abs(ms(set) - ms(`${row.date}T${row.set}Z`))).toBeLessThanOrEqual(MINUTE_MS);
    });
  }
});
