import { describe, expect, it } from 'vitest';
import { addDaysYmd, formatInZone, isoWithOffset, localDateYmd, utcOffsetMinutes, zonedWallTimeToUtc } from '@/shared/time';

// Transition instants are the zones' published rules (IANA tz database): EU clocks change at
// 01:00 UTC on the last Sundays of March and October; US clocks at 02:00 local on the second
// Sunday of March and the first Sunday of November; New South Wales at 02:00 standard time
// on the first Sundays of October and April.

const utc = (h: number, m: number, dateYmd: string) => zonedWallTimeToUtc(dateYmd, h, m, 'UTC').toISOString();

describe('zonedWallTimeToUtc', () => {
  it('is the identity in UTC', () => {
    expect(utc(0, 0, '2026-01-01')).toBe('2026-01-01T00:00:00.000Z');
    expect(utc(23, 59, '2026-06-30')).toBe('2026-06-30T23:59:00.000Z');
  });

  it('Europe/Berlin, spring forward on 2026-03-29 (02:00 CET → 03:00 CEST)', () => {
    const tz = 'Europe/Berlin';
    expect(zonedWallTimeToUtc('2026-03-29', 1, 59, tz).toISOString()).toBe('2026-03-29T00:59:00.000Z');
    expect(zonedWallTimeToUtc('2026-03-29', 3, 0, tz).toISOString()).toBe('2026-03-29T01:00:00.000Z');
    // 02:30 does not exist: moved forward by the hour's gap, to 03:30 CEST.
    expect(zonedWallTimeToUtc('2026-03-29', 2, 30, tz).toISOString()).toBe('2026-03-29T01:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-03-29', 12, 0, tz).toISOString()).toBe('2026-03-29T10:00:00.000Z');
    expect(zonedWallTimeToUtc('2026-03-28', 12, 0, tz).toISOString()).toBe('2026-03-28T11:00:00.000Z');
  });

  it('Europe/Berlin, fall back on 2026-10-25 (03:00 CEST → 02:00 CET)', () => {
    const tz = 'Europe/Berlin';
    // 02:30 happens twice: the first (CEST) one is taken.
    expect(zonedWallTimeToUtc('2026-10-25', 2, 30, tz).toISOString()).toBe('2026-10-25T00:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-10-25', 3, 0, tz).toISOString()).toBe('2026-10-25T02:00:00.000Z');
    expect(zonedWallTimeToUtc('2026-10-25', 1, 59, tz).toISOString()).toBe('2026-10-24T23:59:00.000Z');
  });

  it('America/New_York, spring forward on 2026-03-08 and fall back on 2026-11-01', () => {
    const tz = 'America/New_York';
    expect(zonedWallTimeToUtc('2026-03-08', 1, 30, tz).toISOString()).toBe('2026-03-08T06:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-03-08', 2, 30, tz).toISOString()).toBe('2026-03-08T07:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-03-08', 3, 30, tz).toISOString()).toBe('2026-03-08T07:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-11-01', 1, 30, tz).toISOString()).toBe('2026-11-01T05:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-11-01', 2, 0, tz).toISOString()).toBe('2026-11-01T07:00:00.000Z');
    expect(zonedWallTimeToUtc('2026-11-01', 0, 59, tz).toISOString()).toBe('2026-11-01T04:59:00.000Z');
  });

  it('Australia/Sydney (southern hemisphere): forward on 2026-10-04, back on 2026-04-05', () => {
    const tz = 'Australia/Sydney';
    expect(zonedWallTimeToUtc('2026-10-04', 1, 59, tz).toISOString()).toBe('2026-10-03T15:59:00.000Z');
    // 02:30 does not exist: it becomes 03:30 AEDT.
    expect(zonedWallTimeToUtc('2026-10-04', 2, 30, tz).toISOString()).toBe('2026-10-03T16:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-10-04', 3, 0, tz).toISOString()).toBe('2026-10-03T16:00:00.000Z');
    // 02:30 happens twice: the first (AEDT, +11:00) one is taken.
    expect(zonedWallTimeToUtc('2026-04-05', 2, 30, tz).toISOString()).toBe('2026-04-04T15:30:00.000Z');
    expect(zonedWallTimeToUtc('2026-04-05', 3, 0, tz).toISOString()).toBe('2026-04-04T17:00:00.000Z');
  });

  it('round-trips every quarter hour of a DST-change day through the wall clock', () => {
    for (const [tz, day] of [
      ['Europe/Berlin', '2026-10-25'],
      ['America/New_York', '2026-03-08'],
      ['Australia/Sydney', '2026-04-05'],
    ] as const) {
      const start = zonedWallTimeToUtc(day, 0, 0, tz).getTime();
      for (let ms = start; localDateYmd(new Date(ms), tz) === day; ms += 15 * 60_000) {
        const [hh, mm] = formatInZone(new Date(ms), tz).split(':').map(Number) as [number, number];
        const back = zonedWallTimeToUtc(day, hh, mm, tz).getTime();
        // Repeated wall times map back to their first occurrence, an hour earlier.
        expect([0, 3_600_000]).toContain(ms - back);
        expect(formatInZone(new Date(back), tz)).toBe(formatInZone(new Date(ms), tz));
      }
    }
  });

  it('rejects malformed dates, times and zones', () => {
    expect(() => zonedWallTimeToUtc('2026-02-30', 12, 0, 'UTC')).toThrow(RangeError);
    expect(() => zonedWallTimeToUtc('2026-2-3', 12, 0, 'UTC')).toThrow(RangeError);
    expect(() => zonedWallTimeToUtc('2026-02-03', 24, 0, 'UTC')).toThrow(RangeError);
    expect(() => zonedWallTimeToUtc('2026-02-03', 12, 0, 'Mars/Olympus')).toThrow(RangeError);
  });
});

describe('utcOffsetMinutes', () => {
  it('follows DST in both hemispheres and knows half-hour zones', () => {
    expect(utcOffsetMinutes(new Date('2026-01-15T12:00:00Z'), 'Europe/Berlin')).toBe(60);
    expect(utcOffsetMinutes(new Date('2026-07-15T12:00:00Z'), 'Europe/Berlin')).toBe(120);
    expect(utcOffsetMinutes('2026-01-15T12:00:00Z', 'America/New_York')).toBe(-300);
    expect(utcOffsetMinutes('2026-07-15T12:00:00Z', 'America/New_York')).toBe(-240);
    expect(utcOffsetMinutes('2026-01-15T12:00:00Z', 'Australia/Sydney')).toBe(660);
    expect(utcOffsetMinutes('2026-07-15T12:00:00Z', 'Australia/Sydney')).toBe(600);
    expect(utcOffsetMinutes('2026-07-15T12:00:00Z', 'Asia/Kathmandu')).toBe(345);
    expect(utcOffsetMinutes('2026-07-15T12:00:00Z', 'UTC')).toBe(0);
  });

  it('changes exactly at the transition instant', () => {
    expect(utcOffsetMinutes('2026-03-29T00:59:59Z', 'Europe/Berlin')).toBe(60);
    expect(utcOffsetMinutes('2026-03-29T01:00:00Z', 'Europe/Berlin')).toBe(120);
    expect(utcOffsetMinutes('2026-11-01T05:59:59Z', 'America/New_York')).toBe(-240);
    expect(utcOffsetMinutes('2026-11-01T06:00:00Z', 'America/New_York')).toBe(-300);
  });
});

describe('formatInZone', () => {
  it('gives 24-hour local time, rounded to the minute unless seconds are asked for', () => {
    expect(formatInZone('2026-12-01T17:42:00Z', 'Europe/Berlin')).toBe('18:42');
    expect(formatInZone(new Date('2026-12-01T17:42:29Z'), 'Europe/Berlin')).toBe('18:42');
    expect(formatInZone('2026-12-01T17:42:31Z', 'Europe/Berlin')).toBe('18:43');
    expect(formatInZone('2026-12-01T17:42:07Z', 'Europe/Berlin', { seconds: true })).toBe('18:42:07');
    expect(formatInZone('2026-12-01T23:59:45Z', 'UTC', { date: true })).toBe('2026-12-02 00:00');
    expect(formatInZone('2026-07-01T04:05:00Z', 'America/New_York', { date: true })).toBe('2026-07-01 00:05');
    expect(formatInZone('2026-07-01T13:05:00Z', 'Australia/Sydney', { date: true })).toBe('2026-07-01 23:05');
  });

  it('writes midnight as 00, never 24', () => {
    expect(formatInZone('2026-12-01T23:00:00Z', 'Europe/Berlin')).toBe('00:00');
  });
});

describe('isoWithOffset', () => {
  it('writes local time with the offset in force', () => {
    expect(isoWithOffset(new Date('2026-12-01T17:42:00Z'), 'Europe/Berlin')).toBe('2026-12-01T18:42:00+01:00');
    expect(isoWithOffset('2026-07-01T16:42:00.900Z', 'Europe/Berlin')).toBe('2026-07-01T18:42:00+02:00');
    expect(isoWithOffset('2026-12-01T03:00:00Z', 'America/New_York')).toBe('2026-11-30T22:00:00-05:00');
    expect(isoWithOffset('2026-12-01T03:00:00Z', 'Australia/Sydney')).toBe('2026-12-01T14:00:00+11:00');
    expect(isoWithOffset('2026-12-01T03:00:00Z', 'Asia/Kathmandu')).toBe('2026-12-01T08:45:00+05:45');
    expect(isoWithOffset('2026-12-01T03:00:00Z', 'UTC')).toBe('2026-12-01T03:00:00+00:00');
  });

  it('tells the two 02:30s of a fall-back night apart', () => {
    expect(isoWithOffset('2026-10-25T00:30:00Z', 'Europe/Berlin')).toBe('2026-10-25T02:30:00+02:00');
    expect(isoWithOffset('2026-10-25T01:30:00Z', 'Europe/Berlin')).toBe('2026-10-25T02:30:00+01:00');
  });

  it('parses back to the same instant', () => {
    const instant = new Date('2026-04-05T15:59:00Z');
    expect(new Date(isoWithOffset(instant, 'Australia/Sydney')).getTime()).toBe(instant.getTime());
  });
});

describe('calendar helpers', () => {
  it('adds days across month and year ends and gives the local date', () => {
    expect(addDaysYmd('2026-12-31', 1)).toBe('2027-01-01');
    expect(addDaysYmd('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDaysYmd('2026-03-01', -1)).toBe('2026-02-28');
    expect(localDateYmd('2026-12-01T23:30:00Z', 'Europe/Berlin')).toBe('2026-12-02');
    expect(localDateYmd('2026-12-01T23:30:00Z', 'America/New_York')).toBe('2026-12-01');
  });
});
