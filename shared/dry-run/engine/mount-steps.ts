import { horizonAltitudeAt } from '@/shared/horizon/profile';
import type { FilterSlot } from '@/shared/rig/schema';
import { ambientTempC } from '@/shared/dry-run/models/cooling';
import { CENTRE_MODEL, centreDurationS } from '@/shared/dry-run/models/centre';
import { filterChangeS, focusRunS, type FocusParams } from '@/shared/dry-run/models/focus';
import { GUIDE_MODEL } from '@/shared/dry-run/models/guide';
import { planRotation } from '@/shared/dry-run/models/rotate';
import { mountAxes, slewDurationS } from '@/shared/dry-run/models/slew';
import { act, emit } from '@/shared/dry-run/engine/act';
import { mountPosition, pierFor, pointingAltAz } from '@/shared/dry-run/engine/pointing';
import { fits, type Ended, type Scope } from '@/shared/dry-run/engine/scope';
import type { Pointing, Sim } from '@/shared/dry-run/engine/state';
import { checkSlewSun, slewWaypoints } from '@/shared/dry-run/engine/sun-checks';
import { hhmm, minutes, n } from '@/shared/dry-run/engine/text';
import type { TimelineKind } from '@/shared/dry-run/types';

/** Seconds to slew from the current pointing to `to` now (slew model), and the pier side it ends on. */
export function slewPlan(sim: Sim, to: Pointing, settle = true): { durationS: number; pier: Sim['pier'] } {
  const type = sim.rig.mount.type;
  const from = mountAxes(type, mountPosition(sim, sim.pointing, sim.t), sim.pier);
  const pier = pierFor(sim, to, sim.t);
  const dest = mountAxes(type, mountPosition(sim, to, sim.t), pier);
  return { durationS: slewDurationS(from, dest, sim.rig.mount, settle), pier };
}

/**
 * Slews to a pointing (or parks): Sun check on the path, horizon check at the destination,
 * then the pointing, pier side and guiding change. A slew to where the mount already points
 * takes no time and changes nothing.
 */
export function slewTo(sim: Sim, scope: Scope, to: Pointing, nodeId: string | null, what: string, kind: 'slew' | 'park'): Ended | null {
  const { durationS, pier } = slewPlan(sim, to, kind === 'slew');
  if (durationS === 0 && pier === sim.pier) return null;
  const ended = fits(scope, sim.t, durationS);
  if (ended) return ended;
  checkSlewSun(sim, slewWaypoints(sim, sim.pointing, to), nodeId, scope.skyFlats);
  if (to.kind !== 'park') checkDestination(sim, to, nodeId);
  sim.pointing = to;
  sim.pier = pier;
  sim.guiding = false;
  emit(sim, kind, durationS, nodeId, `${what}, ${minutes(durationS)}`);
  sim.lastCentreMs = sim.t;
  sim.pointingErrorArcsec = CENTRE_MODEL.slewErrorArcsec;
  sim.framesSinceDither = 0;
  return null;
}

function checkDestination(sim: Sim, to: Pointing, nodeId: string | null): void {
  const { altDeg, azDeg } = pointingAltAz(sim, to, sim.t);
  const horizon = horizonAltitudeAt({ points: sim.site.horizon }, azDeg);
  if (altDeg >= horizon) return;
  sim.out.finding({ code: 'below-horizon', severity: 'stop', ms: sim.t, nodeId, key: `below-horizon|slew|${nodeId}`, message: `At ${hhmm(sim, sim.t)} this slew points at altitude ${n(altDeg)}°, below the horizon (${n(horizon)}° at azimuth ${n(azDeg)}°)`, fix: 'Point above the site horizon, or move the step to when the position is up' });
}

/** Changes filter now if needed (wheel change time + a focuser move for a different offset). */
export function filterChangeNowS(sim: Sim, slot: FilterSlot | undefined): number {
  if (!slot || slot === sim.filter) return 0;
  return filterChangeS(sim.filter, slot, sim.rig.filterWheel.changeTimeS);
}

/** Centres on the current pointing (plate solving; attempts from the error vs tolerance), restarting guiding if it ran. */
export function centreNow(sim: Sim, scope: Scope, p: { toleranceArcsec: number; maxAttempts: number; solveExposureS: number; errorArcsec: number }, nodeId: string | null, what: string, kind: TimelineKind = 'centre'): Ended | null {
  if (sim.pointing.kind !== 'radec') return null;
  const { attempts, durationS } = centreDurationS(p, sim.rig);
  const restartS = sim.guiding ? GUIDE_MODEL.restartS : 0;
  const ended = fits(scope, sim.t, durationS + restartS);
  if (ended) return ended;
  emit(sim, kind, durationS, nodeId, `${what}: ${attempts} solve${attempts === 1 ? '' : 's'} to ${n(p.toleranceArcsec)}″`);
  sim.lastCentreMs = sim.t;
  sim.pointingErrorArcsec = 0;
  if (restartS > 0) emit(sim, kind === 'flip' ? 'flip' : 'guide', restartS, nodeId, 'Guiding restarts');
  return null;
}

/** An autofocus run now with a filter (its change first); records the focus state. */
export function focusNow(sim: Sim, scope: Scope, params: FocusParams, slot: FilterSlot | undefined, nodeId: string | null, what: string, kind: TimelineKind = 'focus'): Ended | null {
  const changeS = filterChangeNowS(sim, slot);
  const runS = focusRunS(params, sim.rig);
  const ended = act(sim, scope, kind, changeS + runS, nodeId, `${what}: ${params.points} points × ${n(params.exposureS)} s`, { filter: slot?.name ?? sim.filter?.name, overhead: kind === 'flip' ? { flip: changeS + runS } : { 'filter-change': changeS, focus: runS } });
  if (ended) return ended;
  if (slot) sim.filter = slot;
  sim.lastFocus = { ms: sim.t, tempC: ambientTempC(sim.sky.ambient, sim.t), frames: 0 };
  return null;
}

/** Turns the rotator to a sky PA (nearest angle within travel); `rotator-limit` when none is. */
export function rotateToPa(sim: Sim, scope: Scope, paDeg: number, toleranceDeg: number, nodeId: string | null, what: string, kind: TimelineKind = 'rotate'): Ended | null {
  const r = sim.rig.rotator;
  if (!r.present) return null;
  const move = planRotation(sim.rotatorDeg, paDeg, sim.pier, r, toleranceDeg);
  if (!move.reachable) {
    sim.out.finding({ code: 'rotator-limit', severity: 'stop', ms: sim.t, nodeId, message: `PA ${n(paDeg)}° needs a rotator angle outside its travel (${n(r.minDeg)}° to ${n(r.maxDeg)}°)`, fix: 'Widen the travel limits if the cables allow, or choose a PA 180° away and accept the turned frame' });
    return null;
  }
  const ended = act(sim, scope, kind, move.durationS, nodeId, `${what}: ${n(move.moveDeg)}° to PA ${n(paDeg)}°`);
  if (ended) return ended;
  sim.rotatorDeg = move.mechanicalDeg;
  return null;
}
