import { describe, expect, it } from 'vitest';
import { dateTicks, scanBars, scanMaxHours } from '@/components/dry-run/scan-geometry';
import { bestNights, initialScanState, nightsPayload, scanFraction, scanReducer, type NightScan } from '@/components/dry-run/scan-state';
import { parseEventData } from '@/lib/event-stream';

/* The best-nights scan on the client: the stream's state, the ranking and the chart's geometry (Nightloom's own rules). */

const night = (date: string, usableH: number, stop = 0, warn = 0, totalH = usableH): NightScan => ({
  date,
  integrationS: totalH * 3600,
  usableIntegrationS: usableH * 3600,
  nightEnd: null,
  findings: { stop, warn, info: 0 },
  codes: [],
});

describe('scanReducer', () => {
  it('appends chunks while running and finishes at the total', () => {
    let s = scanReducer(initialScanState, { type: 'start', from: '2026-12-01', total: 10 });
    s = scanReducer(s, { type: 'nights', done: 7, total: 10, nights: [night('2026-12-01', 5)] });
    expect([s.status, s.done, scanFraction(s)]).toEqual(['running', 7, 0.7]);
    s = scanReducer(s, { type: 'done' });
    expect([s.status, s.done, s.nights.length]).toEqual(['done', 10, 1]);
  });

  it('keeps the nights so far on cancel and ignores chunks that arrive after it', () => {
    let s = scanReducer(initialScanState, { type: 'start', from: '2026-12-01', total: 365 });
    s = scanReducer(s, { type: 'nights', done: 7, total: 365, nights: [night('2026-12-01', 5)] });
    s = scanReducer(s, { type: 'cancel' });
    s = scanReducer(s, { type: 'nights', done: 14, total: 365, nights: [night('2026-12-08', 5)] });
    expect([s.status, s.done, s.nights.length]).toEqual(['cancelled', 7, 1]);
  });

  it('starts afresh and reports a broken stream', () => {
    let s = scanReducer(initialScanState, { type: 'start', from: '2026-12-01', total: 3 });
    s = scanReducer(s, { type: 'error', message: 'broke' });
    expect([s.status, s.error]).toEqual(['error', 'broke']);
    expect(scanReducer(s, { type: 'start', from: '2027-01-01', total: 5 })).toEqual({ status: 'running', from: '2027-01-01', total: 5, done: 0, nights: [], error: null });
  });

  it('trusts only a well-formed `nights` payload', () => {
    expect(nightsPayload(parseEventData('{"done":7,"total":30,"nights":[]}'))).toEqual({ done: 7, total: 30, nights: [] });
    expect(nightsPayload(parseEventData('{"done":"7"}'))).toBeNull();
    expect(parseEventData('not json')).toBeUndefined();
  });
});

describe('bestNights', () => {
  it('ranks nights without a stop first, then by usable integration, fewer warnings, earlier date', () => {
    const nights = [night('2026-12-01', 9, 1), night('2026-12-02', 7), night('2026-12-03', 8, 0, 2), night('2026-12-04', 8), night('2026-12-05', 0), night('2026-12-06', 7)];
    expect(bestNights(nights, 5).map((n) => n.date)).toEqual(['2026-12-04', '2026-12-03', '2026-12-02', '2026-12-06', '2026-12-01']);
  });
});

describe('scan chart geometry', () => {
  const plot = { left: 40, right: 340, top: 10, bottom: 110 };

  it('lays out slots for the whole range while nights stream in', () => {
    const bars = scanBars([night('2026-12-01', 4, 0, 0, 8), night('2026-12-02', 8, 1)], 30, plot, scanMaxHours([night('x', 8)]));
    expect(bars[1]!.slotX).toBe(50);
    expect(bars[0]).toMatchObject({ usableY: 60, totalY: 10, stop: false });
    expect(bars[1]!.stop).toBe(true);
    expect(bars[0]!.barWidth).toBeLessThan(bars[0]!.slotWidth);
  });

  it('rounds the hours axis up to even hours, at least 2', () => {
    expect(scanMaxHours([night('a', 7.2)])).toBe(8);
    expect(scanMaxHours([])).toBe(2);
  });

  it('labels the first night, month starts and, on short ranges, the 8th, 15th and 22nd', () => {
    const dates = Array.from({ length: 30 }, (_, i) => new Date(Date.UTC(2026, 10, 20 + i)).toISOString().slice(0, 10));
    expect(dateTicks(dates, 30, { left: 0, right: 3000, top: 0, bottom: 0 }, 30).map((t) => t.label)).toEqual(['20 Nov', '22', 'Dec', '8', '15']);
    expect(dateTicks(dates, 365, { left: 0, right: 365, top: 0, bottom: 0 }, 30).map((t) => t.label)).toEqual(['20 Nov']);
  });
});
