import { resolveFilter } from '@/shared/recipe/filters';
import { walk } from '@/shared/recipe/tree-read';
import type { NodeOf } from '@/shared/recipe/types';
import { darksDurationS, FLAT_MODEL, flatsDurationS } from '@/shared/dry-run/models/calibration';
import { temperatureChangeS } from '@/shared/dry-run/models/cooling';
import { FOCUS_MODEL } from '@/shared/dry-run/models/focus';
import { planRotation } from '@/shared/dry-run/models/rotate';
import { act } from '@/shared/dry-run/engine/act';
import { rotateToPa } from '@/shared/dry-run/engine/mount-steps';
import type { Ended, Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm, minutes, n } from '@/shared/dry-run/engine/text';
import { waitUntil } from '@/shared/dry-run/engine/wait';

/** Sky PA of a stage's framing, for flats that match it. */
function stagePaDeg(sim: Sim, stageId: string): number | undefined {
  let pa: number | undefined;
  walk(sim.input.tree, (node) => {
    if (node.id !== stageId || node.kind !== 'stage') return;
    const target = node.targetId === null ? undefined : sim.input.targets[node.targetId];
    pa = node.framing?.positionAngleDeg ?? target?.framings?.[0]?.positionAngleDeg ?? 0;
    return 'stop';
  });
  return pa;
}

type RecordedPositions = Extract<NonNullable<NodeOf<'flats'>['matchFramingOf']>, { kind: 'positions' }>;

/**
 * Back to the rotator angle and focuser position the lights were taken at. Model: the rotator
 * turns |Δ| / speed to the equivalent mechanical angle within travel nearest its own (as a
 * rotate step); the focuser makes one move of FOCUS_MODEL.moveS (5 s, common practice: the rig
 * stores no focuser speed and the dry run no focuser position). Without a rotator the angle is
 * set by hand before the night and takes no modelled time.
 */
function moveToPositions(sim: Sim, scope: Scope, p: RecordedPositions, nodeId: string): Ended | null {
  const r = sim.rig.rotator;
  if (p.rotatorAngleDeg !== undefined && r.present) {
    const move = planRotation(sim.rotatorDeg, p.rotatorAngleDeg, null, { ...r, skyOffsetDeg: 0 });
    if (!move.reachable) {
      sim.out.finding({ code: 'rotator-limit', severity: 'stop', ms: sim.t, nodeId, message: `Rotator angle ${n(p.rotatorAngleDeg)}° is outside its travel (${n(r.minDeg)}° to ${n(r.maxDeg)}°)`, fix: 'Widen the travel limits if the cables allow, or turn the camera by hand for these flats' });
    } else {
      const ended = act(sim, scope, 'rotate', move.durationS, nodeId, `Rotator to ${n(p.rotatorAngleDeg)}° for flats: ${n(move.moveDeg)}°`);
      if (ended) return ended;
      sim.rotatorDeg = move.mechanicalDeg;
    }
  }
  if (p.focuserPositionSteps !== undefined) {
    const ended = act(sim, scope, 'focus', FOCUS_MODEL.moveS, nodeId, `Focuser to ${p.focuserPositionSteps} for flats`);
    if (ended) return ended;
  }
  return null;
}

/**
 * Flats: count × (exposure + download) per filter with a change per filter (rule 5). With
 * `matchFramingOf` a stage, the rotator turns to that framing first; with recorded positions,
 * the rotator and focuser return to them first (`moveToPositions`). Sky flats wait for their
 * twilight window (dusk: Sun −4° to −10°; dawn: −10° to −7°) and must fit inside it; frames
 * beyond it are `daylight`.
 */
export function runFlats(sim: Sim, node: NodeOf<'flats'>, scope: Scope): Ended | null {
  const match = node.matchFramingOf?.kind === 'stage' ? stagePaDeg(sim, node.matchFramingOf.stageId) : undefined;
  if (match !== undefined) {
    const ended = rotateToPa(sim, scope, match, 0, node.id, 'Rotate to the framing for flats');
    if (ended) return ended;
  }
  if (node.matchFramingOf?.kind === 'positions') {
    const ended = moveToPositions(sim, scope, node.matchFramingOf, node.id);
    if (ended) return ended;
  }
  const { exposureS, durationS } = flatsDurationS(node.source, node.filters.length, node.count, sim.rig);
  if (node.source === 'sky') {
    const ended = skyFlatWindow(sim, node, scope, durationS);
    if (ended) return ended;
  }
  const ended = act(sim, scope, 'flats', durationS, node.id, `${node.source === 'sky' ? 'Sky' : 'Panel'} flats: ${node.filters.join(', ')}, ${node.count} × ${n(exposureS)} s each`);
  if (ended) return ended;
  const last = node.filters[node.filters.length - 1];
  const slot = last === undefined ? undefined : resolveFilter(sim.rig, last);
  if (slot) sim.filter = slot;
  return null;
}

function skyFlatWindow(sim: Sim, node: NodeOf<'flats'>, scope: Scope, durationS: number): Ended | null {
  const evening = sim.t < sim.sky.sun.lowestMs;
  if (!evening) sim.out.dawnSkyFlats = true;
  const w = evening ? FLAT_MODEL.duskWindow : FLAT_MODEL.dawnWindow;
  const opens = sim.sky.sun.crossing(w.fromDeg, !evening);
  const closes = sim.sky.sun.crossing(w.toDeg, !evening);
  if (opens === null || closes === null) return null;
  if (sim.t < opens) {
    const ended = waitUntil(sim, scope, opens, node.id, `Wait for the ${evening ? 'dusk' : 'dawn'} sky-flat window (Sun at ${n(w.fromDeg)}°)`);
    if (ended) return ended;
  }
  const endMs = sim.t + durationS * 1000;
  if (endMs <= closes) return null;
  const left = Math.max(0, (closes - sim.t) / 1000);
  // One finding per twilight window: the first flats step that overruns it (later ones overrun too).
  sim.out.finding({ code: 'daylight', severity: 'warn', ms: sim.t, nodeId: node.id, key: `daylight|sky-flats|${evening ? 'dusk' : 'dawn'}`, message: `These sky flats need ${minutes(durationS)} from ${hhmm(sim, sim.t)}, but the ${evening ? 'dusk' : 'dawn'} window (Sun ${n(w.fromDeg)}° to ${n(w.toDeg)}°) has ${minutes(left)} left`, fix: 'Take fewer flats or filters per twilight, start them as the window opens, or use a panel' });
  return null;
}

/** Darks: the sensor brought to their temperature if needed, then count × (exposure + download) per exposure. */
export function runDarks(sim: Sim, node: NodeOf<'darks'>, scope: Scope): Ended | null {
  const coolS = Math.abs(sim.sensorC - node.temperatureC) > 1 ? temperatureChangeS(sim.sensorC, node.temperatureC, sim.rig.camera.cooling.rateCPerMin) : 0;
  const runS = darksDurationS(node.exposuresS, node.count, node.binning, sim.rig.camera);
  const ended = act(sim, scope, 'darks', coolS + runS, node.id, `Darks: ${node.count} × ${node.exposuresS.map((e) => `${n(e)} s`).join(', ')} at ${n(node.temperatureC)} °C`, { overhead: { cool: coolS, darks: runS } });
  if (ended) return ended;
  if (coolS > 0) Object.assign(sim, { sensorC: node.temperatureC, cooled: true, setpointC: node.temperatureC });
  const cam = sim.rig.camera;
  for (const exposureS of node.exposuresS) {
    sim.out.darksTaken.push({ exposureS, gain: node.gain ?? cam.gainPresets[0]?.value ?? null, offset: node.offset ?? cam.offsetPresets[0]?.value ?? null, binning: node.binning, readoutMode: cam.readoutModes[0] ?? null, temperatureC: node.temperatureC });
  }
  return null;
}
