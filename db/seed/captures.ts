/**
 * Demo capture history and dark library (invented sessions of a real object): three autumn
 * nights of M31 across two years, one of them partly after a meridian flip without restoring
 * the rotator, a night's panel flats with their bias, and two dark sets entered by hand (one
 * older than the default six months). Frame values are plausible for the demo rig (a 26 MP cooled CMOS camera at
 * gain 100, offset 50, −10 °C); positions are M31's published J2000 coordinates.
 */
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { createDatabase } from '@/db/client';
import { captureFrame, captureShare, darkSet, target } from '@/db/schema';
import { frameNightDate } from '@/shared/calibration/intake';
import { fnv1a64Hex } from '@/shared/fits/fingerprint';

type Db = ReturnType<typeof createDatabase>;
type FrameRow = typeof captureFrame.$inferInsert;

const M31 = { raDeg: 10.6847, decDeg: 41.2689 };
const TIME_ZONE = 'Europe/Zurich';

/** Nights (UTC start of the first frame), with (filter, count) runs of 300 s frames. */
const NIGHTS: { start: string; runs: [string, number][]; flippedAfter?: number }[] = [
  { start: '2025-10-18T19:40:00Z', runs: [['L', 24], ['Ha 3nm', 12]] },
  { start: '2026-09-26T20:10:00Z', runs: [['Ha 3nm', 30], ['OIII 3nm', 18]], flippedAfter: 36 },
  { start: '2026-11-11T17:55:00Z', runs: [['L', 36], ['R', 10], ['G', 10], ['B', 10]] },
];
const FOCUS: Record<string, number> = { L: 15240, R: 15252, G: 15248, B: 15260, 'Ha 3nm': 15205, 'OIII 3nm': 15212 };

function light(filter: string, takenAtMs: number, flipped: boolean, i: number): Omit<FrameRow, 'ownerId' | 'intakeId'> {
  const takenAt = new Date(takenAtMs).toISOString();
  return {
    fingerprint: fnv1a64Hex(`demo-light|${takenAt}|${filter}`),
    fileName: `M31/${takenAt.slice(0, 10)}/M31_${filter.replace(/\s+/g, '')}_300s_${String(i).padStart(4, '0')}.fits`,
    frameType: 'light',
    object: 'M 31',
    takenAt: new Date(takenAtMs),
    nightDate: frameNightDate(takenAt, TIME_ZONE),
    exposureS: 300,
    filter,
    gain: 100,
    offset: 50,
    binning: 1,
    setTempC: -10,
    sensorTempC: -10.1,
    focuserPositionSteps: FOCUS[filter] ?? 15240,
    rotatorAngleDeg: 35,
    pierSide: flipped ? 'west' : 'east',
    pointingRaDeg: M31.raDeg + 0.002,
    pointingDecDeg: M31.decDeg - 0.001,
    wcsRaDeg: M31.raDeg + ((i % 5) - 2) * 0.0015,
    wcsDecDeg: M31.decDeg + ((i % 3) - 1) * 0.001,
    wcsPositionAngleDeg: flipped ? 215.04 : 35.04,
    wcsScaleArcsecPerPx: 1.4633,
    wcsMirrored: false,
  };
}

function demoFrames(): Omit<FrameRow, 'ownerId' | 'intakeId'>[] {
  const rows: Omit<FrameRow, 'ownerId' | 'intakeId'>[] = [];
  for (const night of NIGHTS) {
    let t = Date.parse(night.start);
    let n = 0;
    for (const [filter, count] of night.runs) {
      for (let k = 0; k < count; k += 1) {
        rows.push(light(filter, t, night.flippedAfter !== undefined && n >= night.flippedAfter, n));
        t += 306_000; // 300 s exposure + download and dither settle
        n += 1;
      }
    }
  }
  // Panel flats the next afternoon for the last night's L at its rotator and focus position.
  const flatsAt = Date.parse('2026-11-12T14:30:00Z');
  for (let k = 0; k < 25; k += 1) {
    const takenAt = new Date(flatsAt + k * 4_000).toISOString();
    rows.push({
      fingerprint: fnv1a64Hex(`demo-flat|${takenAt}`), fileName: `flats/2026-11-12/FLAT_L_${String(k).padStart(4, '0')}.fits`, frameType: 'flat', object: null,
      takenAt: new Date(takenAt), nightDate: frameNightDate(takenAt, TIME_ZONE), exposureS: 1.2, filter: 'L', gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10,
      focuserPositionSteps: FOCUS.L, rotatorAngleDeg: 35, pierSide: null, pointingRaDeg: null, pointingDecDeg: null, wcsRaDeg: null, wcsDecDeg: null, wcsPositionAngleDeg: null, wcsScaleArcsecPerPx: null, wcsMirrored: null,
    });
  }
  // Bias at the same gain, offset and binning, for calibrating those flats.
  for (let k = 0; k < 50; k += 1) {
    const takenAt = new Date(flatsAt + 200_000 + k * 2_000).toISOString();
    rows.push({
      fingerprint: fnv1a64Hex(`demo-bias|${takenAt}`), fileName: `bias/2026-11-12/BIAS_${String(k).padStart(4, '0')}.fits`, frameType: 'bias', object: null,
      takenAt: new Date(takenAt), nightDate: frameNightDate(takenAt, TIME_ZONE), exposureS: 0, filter: null, gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10,
      focuserPositionSteps: null, rotatorAngleDeg: 35, pierSide: null, pointingRaDeg: null, pointingDecDeg: null, wcsRaDeg: null, wcsDecDeg: null, wcsPositionAngleDeg: null, wcsScaleArcsecPerPx: null, wcsMirrored: null,
    });
  }
  return rows;
}

/** Loads the demo history and dark library for one user once (nothing when they already have frames). */
export async function seedCaptures(db: Db, ownerId: string, clubId: string | null): Promise<void> {
  const [any] = await db.select({ id: captureFrame.id }).from(captureFrame).where(eq(captureFrame.ownerId, ownerId)).limit(1);
  if (any) return;
  const intakeId = randomUUID();
  await db.transaction(async (tx) => {
    await tx.insert(captureFrame).values(demoFrames().map((f) => ({ ...f, ownerId, intakeId })));
    await tx.insert(darkSet).values([
      { ownerId, exposureS: 300, gain: 100, offset: 50, binning: 1, temperatureC: -10, frames: 40, takenOn: '2026-09-20', notes: 'Cloudy night in the garage, camera capped.' },
      { ownerId, exposureS: 120, gain: 100, offset: 50, binning: 1, temperatureC: -10, frames: 30, takenOn: '2026-02-14', notes: 'Before the camera firmware update.' },
    ]);
    const [m31] = await tx.select({ id: target.id }).from(target).where(and(eq(target.ownerId, ownerId), eq(target.designation, 'M31')));
    if (m31 && clubId) await tx.insert(captureShare).values({ ownerId, targetId: m31.id, organizationId: clubId }).onConflictDoNothing();
  });
}
