/**
 * Calibration and history speed: reading a night folder's headers (the server's share of an
 * intake), grouping a dark library, and a history of 20,000 lights (a few years of a busy rig).
 * Cases for the index's table; runnable through it only.
 */
import { frameNightDate, readIntakeFile } from '@/shared/calibration/intake';
import { groupDarkFrames } from '@/shared/calibration/darks';
import { historySummary, targetHistory } from '@/shared/calibration/history';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import { cameraFrame } from '@/tests/helpers/fits';

const FILTERS = ['L', 'R', 'G', 'B', 'Ha', 'OIII'];

/** 500 headers like one long night's folder: lights with a plate solution, darks, flats. */
const folder = Array.from({ length: 500 }, (_, i) => {
  const minute = i * 2;
  const dateObs = new Date(Date.UTC(2026, 10, 20, 18, 0, 0) + minute * 60_000).toISOString().slice(0, 19);
  const kind = i % 10;
  if (kind < 7) {
    return cameraFrame({ type: 'Light Frame', dateObs, exposureS: 300, object: 'M 31', filter: FILTERS[i % FILTERS.length], gain: 100, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10.1, focuserPositionSteps: 15200 + (i % 6) * 40, rotatorAngleDeg: 120, pierSide: 'WEST', wcs: { raDeg: 10.6847, decDeg: 41.269, positionAngleDeg: 120, scaleArcsecPerPx: 1.46331 } });
  }
  if (kind < 9) return cameraFrame({ type: 'Dark Frame', dateObs, exposureS: 300, gain: 100, offset: 50, binning: 1, setTempC: -10 });
  return cameraFrame({ type: 'Flat Field', dateObs, exposureS: 1.5, filter: FILTERS[i % FILTERS.length], gain: 100, offset: 50, binning: 1, setTempC: -10, rotatorAngleDeg: 120 });
});

const m31: HistoryTargetRef = { id: 't-m31', designation: 'M 31', name: 'Andromeda Galaxy', aliases: ['NGC 224'], raDeg: 10.6847, decDeg: 41.269, framings: [{ id: 'f1', raDeg: 10.6847, decDeg: 41.269, positionAngleDeg: 120 }] };
const targets: HistoryTargetRef[] = [m31, ...Array.from({ length: 49 }, (_, i) => ({ id: `t${i}`, designation: `NGC ${1000 + i}`, name: '', aliases: [], raDeg: (i * 7.3) % 360, decDeg: -30 + i, framings: [] }))];

/** 20,000 lights over three years across the 50 targets, half of them on M 31. */
const lights: StoredFrame[] = Array.from({ length: 20_000 }, (_, i) => {
  const t = i % 2 === 0 ? m31 : targets[1 + (i % 49)]!;
  const takenAt = new Date(Date.UTC(2024, 0, 1, 22) + Math.floor(i / 20) * 86_400_000).toISOString();
  const flipped = i % 7 === 0;
  return {
    fingerprint: `fp${i}`, fileName: `f${i}.fits`, frameType: 'light', object: t.designation, takenAt, nightDate: frameNightDate(takenAt, 'Europe/Zurich'), exposureS: 300, filter: FILTERS[i % FILTERS.length]!,
    gain: 100, offset: 50, binning: 1, readoutMode: null, setTempC: -10, sensorTempC: -10, focuserPositionSteps: 15200, rotatorAngleDeg: 120, pierSide: flipped ? 'east' : 'west',
    pointingRaDeg: t.raDeg, pointingDecDeg: t.decDeg, wcsRaDeg: t.raDeg, wcsDecDeg: t.decDeg, wcsPositionAngleDeg: flipped ? 300 : 120, wcsScaleArcsecPerPx: 1.46331, wcsMirrored: false,
  };
});
const darks: StoredFrame[] = Array.from({ length: 3_000 }, (_, i) => ({ ...lights[i]!, frameType: 'dark', fingerprint: `d${i}`, exposureS: [60, 120, 180, 300, 600][i % 5]!, setTempC: [-20, -10, 0][i % 3]! }));

export const calibrationCases = [
  { name: 'intake: read 500 frame headers', goal: '< 250 ms', runs: 10, fn: () => folder.map((bytes, i) => readIntakeFile(`frame-${i}.fits`, bytes)) },
  { name: 'dark library: group 3,000 dark frames', goal: '< 50 ms', runs: 20, fn: () => groupDarkFrames(darks, 6, '2026-12-01') },
  { name: 'history: summary of 20,000 lights, 50 targets', goal: '< 200 ms', runs: 10, fn: () => historySummary(lights, targets, new Map()) },
  { name: 'history: one target of 10,000 lights', goal: '< 200 ms', runs: 10, fn: () => targetHistory(m31, lights, []) },
];
