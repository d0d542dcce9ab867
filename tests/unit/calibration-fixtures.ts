import { frameNightDate, readIntakeFile } from '@/shared/calibration/intake';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import { cameraFrame, type CameraFrameSpec } from '@/tests/helpers/fits';

/*
 * Frames for the calibration tests: written as FITS headers by the synthetic builder and read
 * back through intake, so every test runs the real reading path; or plain records for the pure
 * grouping rules.
 */

/** The site time zone of these tests (CET/CEST). */
export const TZ = 'Europe/Berlin';

/** A header written by the builder, read through intake, stored with its night in `TZ`. */
export function storedFrame(spec: CameraFrameSpec, name = 'frame.fits'): StoredFrame {
  const out = readIntakeFile(name, cameraFrame(spec));
  if (!out.ok) throw new Error(`fixture rejected: ${out.reason}`);
  return { ...out.frame, nightDate: frameNightDate(out.frame.takenAt, TZ) };
}

let serial = 0;

/** A stored frame as a plain record: a light of 300 s with nothing else recorded, unless given. */
export function frameRecord(over: Partial<StoredFrame> = {}): StoredFrame {
  serial += 1;
  return {
    fingerprint: `fp${serial}`,
    fileName: `f${serial}.fits`,
    frameType: 'light',
    object: null,
    takenAt: '2026-01-15T21:00:00.000Z',
    exposureS: 300,
    filter: null,
    gain: null,
    offset: null,
    binning: 1,
    readoutMode: null,
    setTempC: null,
    sensorTempC: null,
    focuserPositionSteps: null,
    rotatorAngleDeg: null,
    pierSide: null,
    pointingRaDeg: null,
    pointingDecDeg: null,
    wcsRaDeg: null,
    wcsDecDeg: null,
    wcsPositionAngleDeg: null,
    wcsScaleArcsecPerPx: null,
    wcsMirrored: null,
    nightDate: '2026-01-15',
    ...over,
  };
}

const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

/** Two targets 0.40° apart (J2000 positions of NGC 224 = M31 and NGC 221 = M32 from OpenNGC, NGC.csv, rounded to 0.0001°) and a third far away. */
export const M31: HistoryTargetRef = { id: uuid(31), designation: 'M31', name: 'Andromeda Galaxy', aliases: ['NGC 224'], raDeg: 10.6848, decDeg: 41.2691, framings: [] };
export const M32: HistoryTargetRef = { id: uuid(32), designation: 'M32', name: '', aliases: ['NGC 221'], raDeg: 10.6743, decDeg: 40.8653, framings: [] };
export const NGC7000: HistoryTargetRef = { id: uuid(7000), designation: 'NGC 7000', name: 'North America Nebula', aliases: ['Caldwell 20'], raDeg: 314.7, decDeg: 44.33, framings: [] };
