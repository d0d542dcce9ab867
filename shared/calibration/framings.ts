import { integrationByFilter, totalSeconds } from '@/shared/calibration/integration';
import { angleDiffDeg, circularMeanDeg, meanPosition, paDiffMod180Deg, separationDeg } from '@/shared/calibration/sky-geometry';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import type { RecordedFraming } from '@/shared/schemas/calibration-api';

/*
 * Recorded framings: plate-solved lights of one target grouped by where they point and how the
 * camera was turned, so the user can see what a target has, and continue it.
 */

/** A frame joins a framing when its centre is within 1′ of the framing's first frame (Nightloom choice: a small fraction of any imaging field). */
export const FRAMING_CENTRE_TOLERANCE_DEG = 1 / 60;
/** …and its position angle equals the framing's modulo 180° within 1° (Nightloom choice: stacking tolerates it). */
export const FRAMING_PA_TOLERANCE_DEG = 1;

const SLACK = 1e-9;

type Solved = StoredFrame & { wcsRaDeg: number; wcsDecDeg: number; wcsPositionAngleDeg: number };

/** True for a light with a plate solution (centre and position angle). */
export function isSolved(f: StoredFrame): f is Solved {
  return f.wcsRaDeg !== null && f.wcsDecDeg !== null && f.wcsPositionAngleDeg !== null;
}

interface Cluster {
  first: Solved;
  frames: Solved[];
}

/** Solved frames in time order, each joining the first cluster whose first frame it matches. */
function clusterFrames(frames: readonly StoredFrame[]): Cluster[] {
  const solved = frames.filter(isSolved).sort((a, b) => (a.takenAt < b.takenAt ? -1 : a.takenAt > b.takenAt ? 1 : 0));
  const clusters: Cluster[] = [];
  for (const f of solved) {
    const home = clusters.find(
      (c) => separationDeg(c.first.wcsRaDeg, c.first.wcsDecDeg, f.wcsRaDeg, f.wcsDecDeg) <= FRAMING_CENTRE_TOLERANCE_DEG + SLACK && paDiffMod180Deg(c.first.wcsPositionAngleDeg, f.wcsPositionAngleDeg) <= FRAMING_PA_TOLERANCE_DEG + SLACK,
    );
    if (home) home.frames.push(f);
    else clusters.push({ first: f, frames: [f] });
  }
  return clusters;
}

/** A number rounded for a key, wrapped into [0, 360) when asked; "-0" never appears. */
function keyNumber(v: number, decimals: number, wrap: boolean): string {
  const scale = 10 ** decimals;
  let r = Math.round(v * scale) / scale;
  if (wrap && r >= 360) r -= 360;
  return (r === 0 ? 0 : r).toFixed(decimals);
}

/** A stable key of a recorded framing from its centre (0.001°) and PA (0.1°), e.g. "10.685,41.269,330.0". */
export function framingKey(raDeg: number, decDeg: number, positionAngleDeg: number): string {
  return [keyNumber(raDeg, 3, true), keyNumber(decDeg, 3, false), keyNumber(positionAngleDeg, 1, true)].join(',');
}

/** The user's framing a recorded one matches: centre within 1′, PA within 1° (not flipped) or 180° ± 1° (flipped); unflipped and nearer first. */
export function matchUserFraming(rec: { raDeg: number; decDeg: number; positionAngleDeg: number }, framings: HistoryTargetRef['framings']): { framingId: string | null; framingFlipped: boolean } {
  let best: { id: string; flipped: boolean; sep: number } | null = null;
  for (const fr of framings) {
    const sep = separationDeg(rec.raDeg, rec.decDeg, fr.raDeg, fr.decDeg);
    if (sep > FRAMING_CENTRE_TOLERANCE_DEG + SLACK) continue;
    const d = angleDiffDeg(fr.positionAngleDeg, rec.positionAngleDeg);
    const flipped = d > 90;
    if ((flipped ? 180 - d : d) > FRAMING_PA_TOLERANCE_DEG + SLACK) continue;
    if (!best || (best.flipped && !flipped) || (best.flipped === flipped && sep < best.sep)) best = { id: fr.id, flipped, sep };
  }
  return { framingId: best?.id ?? null, framingFlipped: best?.flipped ?? false };
}

function summarise(c: Cluster, userFramings: HistoryTargetRef['framings']): RecordedFraming {
  const pa0 = c.first.wcsPositionAngleDeg;
  const sameSide = c.frames.filter((f) => angleDiffDeg(f.wcsPositionAngleDeg, pa0) <= 90);
  const otherSide = c.frames.filter((f) => angleDiffDeg(f.wcsPositionAngleDeg, pa0) > 90);
  const [major, minor] = totalSeconds(otherSide) > totalSeconds(sameSide) ? [otherSide, sameSide] : [sameSide, otherSide];
  const positionAngleDeg = circularMeanDeg(major.map((f) => f.wcsPositionAngleDeg));
  const { raDeg, decDeg } = meanPosition(c.frames.map((f) => ({ raDeg: f.wcsRaDeg, decDeg: f.wcsDecDeg })));
  return {
    key: framingKey(raDeg, decDeg, positionAngleDeg),
    raDeg,
    decDeg,
    positionAngleDeg,
    frames: major.length,
    seconds: totalSeconds(major),
    flippedFrames: minor.length,
    flippedSeconds: totalSeconds(minor),
    ...matchUserFraming({ raDeg, decDeg, positionAngleDeg }, userFramings),
    byFilter: integrationByFilter(c.frames),
  };
}

/**
 * Recorded framings of a target's lights: plate-solved frames (in time order) join a framing
 * when their centre is within 1′ of its first frame's centre (great-circle distance) and their
 * PA equals its PA modulo 180° within 1°. In a framing, frames at the PA most seconds were taken
 * at count as `frames`/`seconds` (PA = their circular mean), those 180° off as flipped; the
 * centre is the mean of all its frames and `byFilter` counts both sides. Most integration first.
 */
export function recordedFramings(lights: readonly StoredFrame[], userFramings: HistoryTargetRef['framings']): RecordedFraming[] {
  return recordedFramingsWithLights(lights, userFramings).map((r) => r.framing);
}

/** `recordedFramings`, each with the lights it was made of (for "continue": their exposures). */
export function recordedFramingsWithLights(lights: readonly StoredFrame[], userFramings: HistoryTargetRef['framings']): { framing: RecordedFraming; lights: StoredFrame[] }[] {
  return clusterFrames(lights)
    .map((c) => ({ framing: summarise(c, userFramings), lights: c.frames as StoredFrame[] }))
    .sort((a, b) => b.framing.seconds + b.framing.flippedSeconds - (a.framing.seconds + a.framing.flippedSeconds) || a.framing.key.localeCompare(b.framing.key));
}
