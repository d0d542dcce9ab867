import { describe, expect, it } from 'vitest';
import { framingKey } from '@/shared/calibration/framings';
import { historySummary, linkLight, objectHistory, targetHistory } from '@/shared/calibration/history';
import { frameNightDate, readIntakeFile } from '@/shared/calibration/intake';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import { buildFits, cameraFrameCards, type CameraFrameSpec } from '@/tests/helpers/fits';
import { frameRecord, M31, M32, NGC7000, storedFrame, TZ } from './calibration-fixtures';

const ARCMIN = 1 / 60;

/** A plate-solved light of M31 from the builder (PA of +y east of north, 1.46331″/px: checks.md's example rig). */
function solved(dateObs: string, at: { raDeg: number; decDeg: number; positionAngleDeg: number }, over: Partial<CameraFrameSpec> = {}): StoredFrame {
  return storedFrame({ type: 'Light Frame', dateObs, exposureS: 300, filter: 'Ha', object: 'M31', wcs: { ...at, scaleArcsecPerPx: 1.46331 }, ...over });
}

/** The same frame after a meridian flip: CD → −CD (checks.md: position angle + 180°, mirroring and scale unchanged). */
function flipped(dateObs: string, at: { raDeg: number; decDeg: number; positionAngleDeg: number }): StoredFrame {
  const cards = cameraFrameCards({ type: 'Light Frame', dateObs, exposureS: 300, filter: 'Ha', object: 'M31', wcs: { ...at, scaleArcsecPerPx: 1.46331 } });
  const negated = cards.map((c) => (typeof c !== 'string' && /^CD\d_\d$/.test(c.key) && typeof c.value === 'number' ? { ...c, value: -c.value } : c));
  const out = readIntakeFile('flip.fits', buildFits(negated));
  if (!out.ok) throw new Error(out.reason);
  return { ...out.frame, nightDate: frameNightDate(out.frame.takenAt, TZ) };
}

const TARGETS = [M31, M32, NGC7000];

describe('linkLight', () => {
  it('by position: the nearest target within 1° of the WCS centre (M31 and M32 lie 0.40° apart)', () => {
    expect(linkLight(frameRecord({ wcsRaDeg: 10.6848, wcsDecDeg: 41.2191 }), TARGETS)).toBe(M31.id); // 0.05° from M31, 0.35° from M32
    expect(linkLight(frameRecord({ wcsRaDeg: 10.6743, wcsDecDeg: 40.9153 }), TARGETS)).toBe(M32.id);
    expect(linkLight(frameRecord({ pointingRaDeg: 315.2, pointingDecDeg: 44.9 }), TARGETS)).toBe(NGC7000.id);
    // the solved centre wins over the mount's pointing
    expect(linkLight(frameRecord({ wcsRaDeg: 314.7, wcsDecDeg: 44.33, pointingRaDeg: 10.68, pointingDecDeg: 41.27 }), TARGETS)).toBe(NGC7000.id);
  });

  it('position before name: a frame on M32 that says OBJECT = M31 belongs to M32', () => {
    expect(linkLight(frameRecord({ wcsRaDeg: 10.6743, wcsDecDeg: 40.8653, object: 'M31' }), TARGETS)).toBe(M32.id);
  });

  it('by name when no target is within 1°: designation, name or alias, case, spaces and hyphens ignored', () => {
    const named = (object: string, over: Partial<StoredFrame> = {}) => linkLight(frameRecord({ object, ...over }), TARGETS);
    expect(named('M 31')).toBe(M31.id);
    expect(named('m31')).toBe(M31.id);
    expect(named('NGC-224')).toBe(M31.id);
    expect(named('andromeda  galaxy')).toBe(M31.id);
    expect(named('Caldwell20')).toBe(NGC7000.id);
    expect(named('M31', { wcsRaDeg: 200, wcsDecDeg: -30 })).toBe(M31.id);
    expect(named('M 33')).toBeNull();
    expect(named('  ')).toBeNull();
    expect(linkLight(frameRecord(), TARGETS)).toBeNull();
  });

  it('just beyond 1° no longer links by position', () => {
    expect(linkLight(frameRecord({ wcsRaDeg: 314.7, wcsDecDeg: 44.33 + 0.99 }), TARGETS)).toBe(NGC7000.id);
    expect(linkLight(frameRecord({ wcsRaDeg: 314.7, wcsDecDeg: 44.33 + 1.01 }), TARGETS)).toBeNull();
  });
});

describe('historySummary', () => {
  const m31 = (nightDate: string, filter: string | null, exposureS: number, takenAt: string) => frameRecord({ nightDate, filter, exposureS, takenAt, object: 'M31' });
  const lights = [
    m31('2026-01-10', 'Ha', 300, '2026-01-10T20:00:00Z'),
    m31('2026-01-10', 'Ha', 300, '2026-01-10T20:05:00Z'),
    m31('2026-01-10', 'Ha', 300, '2026-01-10T20:10:00Z'),
    m31('2026-01-12', 'OIII', 300, '2026-01-12T20:00:00Z'),
    m31('2026-01-12', 'OIII', 300, '2026-01-12T20:05:00Z'),
    m31('2026-01-12', 'L', 120, '2026-01-12T20:10:00Z'),
    m31('2026-01-12', null, 60, '2026-01-12T20:15:00Z'),
    frameRecord({ nightDate: '2026-01-14', filter: 'Ha', exposureS: 600, wcsRaDeg: 314.7, wcsDecDeg: 44.33 }),
    frameRecord({ nightDate: '2026-01-14', filter: 'Ha', exposureS: 600, pointingRaDeg: 314.6, pointingDecDeg: 44.4 }),
    frameRecord({ nightDate: '2026-01-13', object: 'SH2 129', exposureS: 180, takenAt: '2026-01-13T21:00:00Z' }),
    frameRecord({ nightDate: '2026-01-13', object: 'sh2-129', exposureS: 180, takenAt: '2026-01-13T20:00:00Z' }),
    frameRecord({ nightDate: '2026-01-11', exposureS: 30 }),
    frameRecord({ frameType: 'dark', nightDate: '2026-01-15', object: 'M31', setTempC: -10 }),
  ];
  const rows = historySummary(lights, TARGETS, new Map([[M31.id, ['club-a']]]));

  it('one row per target with lights and per unmatched OBJECT, latest night first', () => {
    expect(rows.map((r) => [r.targetId, r.label, r.name])).toEqual([
      [NGC7000.id, 'NGC 7000', 'North America Nebula'],
      [null, 'sh2-129', ''],
      [M31.id, 'M31', 'Andromeda Galaxy'],
      [null, 'Unnamed', ''],
    ]);
  });

  it('totals per target: frames, seconds, nights and integration per filter (no filter last)', () => {
    expect(rows[2]).toEqual({
      targetId: M31.id,
      label: 'M31',
      name: 'Andromeda Galaxy',
      frames: 7,
      seconds: 3 * 300 + 2 * 300 + 120 + 60,
      nights: 2,
      firstNight: '2026-01-10',
      lastNight: '2026-01-12',
      byFilter: [
        { filter: 'Ha', frames: 3, seconds: 900 },
        { filter: 'L', frames: 1, seconds: 120 },
        { filter: 'OIII', frames: 2, seconds: 600 },
        { filter: null, frames: 1, seconds: 60 },
      ],
      sharedWith: ['club-a'],
    });
    expect(rows[0]).toMatchObject({ frames: 2, seconds: 1200, nights: 1, sharedWith: [] });
    expect(rows[1]).toMatchObject({ frames: 2, seconds: 360, firstNight: '2026-01-13', lastNight: '2026-01-13' });
  });

  it('the unmatched object’s page takes the same frames', () => {
    const page = objectHistory('SH2-129', lights, TARGETS);
    expect(page.target).toEqual(rows[1]);
    expect(page.framings).toEqual([]);
    expect(page.unsolvedFrames).toBe(2);
    expect(objectHistory('Unnamed', lights, TARGETS).target.frames).toBe(1);
  });
});

describe('targetHistory: recorded framings', () => {
  const A = { raDeg: M31.raDeg, decDeg: M31.decDeg, positionAngleDeg: 35 };
  const near = (dDecArcmin: number, pa = 35) => ({ raDeg: A.raDeg, decDeg: A.decDeg + dDecArcmin * ARCMIN, positionAngleDeg: pa });
  const B = { raDeg: M31.raDeg, decDeg: M31.decDeg + 0.3, positionAngleDeg: 35 };
  const lights = [
    solved('2026-01-10T19:00:00', A),
    solved('2026-01-10T19:05:00', near(0.3)),
    solved('2026-01-10T19:10:00', near(-0.3), { filter: 'OIII' }),
    solved('2026-01-10T19:15:00', near(0.9)), // 0.9′ from the first frame: joins
    flipped('2026-01-10T23:00:00', near(0.2)), // after the flip: PA 215°
    flipped('2026-01-10T23:05:00', near(-0.2)),
    flipped('2026-01-10T23:10:00', near(0)),
    solved('2026-01-12T19:00:00', near(1.1)), // 1.1′ away: a framing of its own
    solved('2026-01-12T20:00:00', B),
    solved('2026-01-12T20:05:00', B),
    solved('2026-01-12T21:00:00', near(0, 90)), // same centre, PA 55° off: another framing
    storedFrame({ type: 'Light Frame', dateObs: '2026-01-12T22:00:00', exposureS: 120, filter: 'L', object: 'M 31' }),
    storedFrame({ type: 'Light Frame', dateObs: '2026-01-12T22:05:00', exposureS: 120, filter: 'L', object: 'M 31' }),
    solved('2026-01-12T22:10:00', { raDeg: M32.raDeg, decDeg: M32.decDeg, positionAngleDeg: 0 }), // M32's: not this target's
  ];
  const target: HistoryTargetRef = {
    ...M31,
    framings: [
      { id: 'fr-a', raDeg: A.raDeg, decDeg: A.decDeg + 0.5 * ARCMIN, positionAngleDeg: 35.5 },
      { id: 'fr-b', raDeg: B.raDeg, decDeg: B.decDeg, positionAngleDeg: 214.6 },
    ],
  };
  const h = targetHistory(target, lights, ['club-a'], TARGETS);
  const a = h.framings[0]!;

  it('the flip turns the PA by 180° (CD → −CD) and the history counts those frames as flipped', () => {
    expect(lights[4]!.wcsPositionAngleDeg).toBeCloseTo(215, 9);
    expect(a).toMatchObject({ frames: 4, seconds: 1200, flippedFrames: 3, flippedSeconds: 900, framingId: 'fr-a', framingFlipped: false });
    expect(a.positionAngleDeg).toBeCloseTo(35, 6);
    expect(a.byFilter).toEqual([{ filter: 'Ha', frames: 6, seconds: 1800 }, { filter: 'OIII', frames: 1, seconds: 300 }]);
  });

  it('splits by centre (1′) and by PA modulo 180° (1°); a user framing 180° off matches as flipped', () => {
    expect(h.framings.map((f) => [f.frames + f.flippedFrames, Math.round(f.positionAngleDeg)])).toEqual([[7, 35], [2, 35], [1, 90], [1, 35]]); // ties: by key
    const b = h.framings.find((f) => Math.abs(f.decDeg - B.decDeg) < 1e-6)!;
    expect(b).toMatchObject({ framingId: 'fr-b', framingFlipped: true });
    // fr-a (0.5′ and 0.5° from the first framing) also lies within 1′ of the one 1.1′ away
    expect(h.framings.map((f) => f.framingId)).toEqual(['fr-a', 'fr-b', null, 'fr-a']);
  });

  it('centre = mean of the frames; the key rounds it (0.001°, PA 0.1°) and does not depend on the order of the frames', () => {
    const meanDec = A.decDeg + ((0 + 0.3 - 0.3 + 0.9 + 0.2 - 0.2 + 0) / 7) * ARCMIN;
    expect(a.decDeg).toBeCloseTo(meanDec, 6);
    expect(a.raDeg).toBeCloseTo(A.raDeg, 6);
    expect(a.key).toBe(framingKey(a.raDeg, a.decDeg, a.positionAngleDeg));
    expect(a.key).toBe('10.685,41.271,35.0');
    expect(targetHistory(target, [...lights].reverse(), [], TARGETS).framings.map((f) => f.key)).toEqual(h.framings.map((f) => f.key));
  });

  it('totals, nights oldest first, and the lights without a plate solution', () => {
    expect(h.target).toMatchObject({ targetId: M31.id, label: 'M31', frames: 13, seconds: 11 * 300 + 2 * 120, nights: 2, firstNight: '2026-01-10', lastNight: '2026-01-12', sharedWith: ['club-a'] });
    expect(h.nights).toEqual([
      { nightDate: '2026-01-10', byFilter: [{ filter: 'Ha', frames: 6, seconds: 1800 }, { filter: 'OIII', frames: 1, seconds: 300 }], seconds: 2100 },
      { nightDate: '2026-01-12', byFilter: [{ filter: 'Ha', frames: 4, seconds: 1200 }, { filter: 'L', frames: 2, seconds: 240 }], seconds: 1440 },
    ]);
    expect(h.unsolvedFrames).toBe(2);
  });

  it('most integration on the far side: the PA becomes the flipped one', () => {
    const P = { raDeg: 314.7, decDeg: 44.33, positionAngleDeg: 10 };
    const frames = [solved('2026-01-10T19:00:00', P, { object: 'NGC 7000' }), solved('2026-01-10T19:05:00', P, { object: 'NGC 7000' })];
    for (const t of ['23:00', '23:05', '23:10']) frames.push(flipped(`2026-01-10T${t}:00`, P));
    const [f] = targetHistory(NGC7000, frames, []).framings;
    expect(f).toMatchObject({ frames: 3, flippedFrames: 2, seconds: 900, flippedSeconds: 600 });
    expect(f!.positionAngleDeg).toBeCloseTo(190, 6);
  });

  it('averages position angles across north (359.6° and 0.4° → 0°, not 180°)', () => {
    const at = (pa: number) => ({ raDeg: 314.7, decDeg: 44.33, positionAngleDeg: pa });
    const [f] = targetHistory(NGC7000, [solved('2026-01-10T19:00:00', at(359.6)), solved('2026-01-10T19:05:00', at(0.4))], []).framings;
    expect(f!.frames).toBe(2);
    expect(Math.min(f!.positionAngleDeg, 360 - f!.positionAngleDeg)).toBeLessThan(1e-6);
    expect(f!.key.endsWith(',0.0')).toBe(true);
  });
});
