import { resolveFilter } from '@/shared/recipe/filters';
import type { NodeOf, StepNode } from '@/shared/recipe/types';
import { FOCUS_MODEL } from '@/shared/dry-run/models/focus';
import { guideStartS } from '@/shared/dry-run/models/guide';
import { act } from '@/shared/dry-run/engine/act';
import { runDarks, runFlats } from '@/shared/dry-run/engine/calibration-steps';
import { runExpose } from '@/shared/dry-run/engine/expose';
import { flipSoon } from '@/shared/dry-run/engine/meridian';
import { centreNow, filterChangeNowS, focusNow, rotateToPa, slewTo } from '@/shared/dry-run/engine/mount-steps';
import type { Ended, Scope } from '@/shared/dry-run/engine/scope';
import type { Pointing, Sim } from '@/shared/dry-run/engine/state';
import { runCool, runWarm } from '@/shared/dry-run/engine/temperature-steps';
import { hhmm, n } from '@/shared/dry-run/engine/text';
import { runWait } from '@/shared/dry-run/engine/wait-step';

/** Runs one step at the current time; returns who ends early when a deadline cuts it. */
export function runStep(sim: Sim, node: StepNode, scope: Scope): Ended | null {
  switch (node.kind) {
    case 'cool':
      return runCool(sim, node, scope);
    case 'warm':
      return runWarm(sim, node, scope);
    case 'slew':
      return runSlew(sim, node, scope);
    case 'centre':
      return runCentre(sim, node, scope);
    case 'rotate':
      return runRotate(sim, node, scope);
    case 'focus':
      return runFocus(sim, node, scope);
    case 'expose':
      return runExpose(sim, node, scope);
    case 'guide':
      return runGuide(sim, node, scope);
    case 'meridian':
      if (scope.stage) Object.assign(scope.stage, { policy: node.policy, policyNodeId: node.id });
      return null;
    case 'wait':
      return runWait(sim, node, scope);
    case 'flats':
      return runFlats(sim, node, scope);
    case 'darks':
      return runDarks(sim, node, scope);
    case 'park':
      return slewTo(sim, scope, { kind: 'park' }, node.id, 'Park the mount', 'park');
    case 'note':
      return null;
  }
}

function runSlew(sim: Sim, node: NodeOf<'slew'>, scope: Scope): Ended | null {
  const to = node.to;
  let p: Pointing | null = null;
  if (to.kind === 'stage-target' && scope.stage) {
    const s = scope.stage;
    p = { kind: 'radec', raDeg: s.raDeg, decDeg: s.decDeg, sky: s.sky, targetId: s.targetId, label: s.name };
  } else if (to.kind === 'radec') p = { kind: 'radec', raDeg: to.raDeg, decDeg: to.decDeg, sky: sim.sky.target(to.raDeg, to.decDeg), targetId: null, label: `RA ${n(to.raDeg)}°, Dec ${n(to.decDeg)}°` };
  else if (to.kind === 'altaz') p = { kind: 'altaz', altDeg: to.altDeg, azDeg: to.azDeg };
  if (!p) return null;
  const label = p.kind === 'radec' ? p.label : p.kind === 'altaz' ? `alt ${n(p.altDeg)}°, az ${n(p.azDeg)}°` : 'park';
  return slewTo(sim, scope, p, node.id, `Slew to ${label}`, 'slew');
}

function runCentre(sim: Sim, node: NodeOf<'centre'>, scope: Scope): Ended | null {
  const settings = { toleranceArcsec: node.toleranceArcsec, maxAttempts: node.maxAttempts, solveExposureS: node.solveExposureS };
  if (scope.stage) scope.stage.centre = settings;
  const slot = node.filter === undefined ? undefined : resolveFilter(sim.rig, node.filter);
  const changeS = filterChangeNowS(sim, slot);
  const ended = act(sim, scope, 'centre', changeS, node.id, `Filter change to ${slot?.name ?? ''}`, { overhead: { 'filter-change': changeS } });
  if (ended) return ended;
  if (slot) sim.filter = slot;
  return centreNow(sim, scope, { ...settings, errorArcsec: sim.pointingErrorArcsec }, node.id, 'Centre');
}

function runRotate(sim: Sim, node: NodeOf<'rotate'>, scope: Scope): Ended | null {
  const framing = scope.stage?.framingPaDeg;
  const pa = node.to.matchFraming ? framing : node.to.positionAngleDeg;
  if (pa === undefined) return null;
  if (node.to.matchFraming && scope.stage) scope.stage.restoreRotation = true;
  if (framing !== undefined && !node.to.matchFraming && Math.abs(Math.abs(pa - framing) - 180) < 0.5) {
    sim.out.finding({ code: 'rotator-limit', severity: 'info', ms: sim.t, nodeId: node.id, key: `rotator-limit|180|${node.id}`, message: `PA ${n(pa)}° is exactly 180° from the framing's ${n(framing)}°: often a convention mix-up (rule 12)`, fix: 'Check which way the framing measures its angle; rotate to match the framing if in doubt' });
  }
  return rotateToPa(sim, scope, pa, node.toleranceArcmin / 60, node.id, 'Rotate');
}

function runFocus(sim: Sim, node: NodeOf<'focus'>, scope: Scope): Ended | null {
  const params = { points: node.points, exposureS: node.exposureS };
  if (scope.stage) scope.stage.focus = params;
  const slot = node.filter === undefined ? sim.filter : resolveFilter(sim.rig, node.filter);
  const ended = focusNow(sim, scope, params, slot, node.id, 'Focus');
  if (!ended && flipSoon(sim, scope, sim.t)) {
    sim.out.finding({ code: 'focus-drift', severity: 'info', ms: sim.t, nodeId: node.id, message: `This focus run ends at ${hhmm(sim, sim.t)}, less than ${FOCUS_MODEL.noRunBeforeFlipMin} min before the meridian flip, which disturbs focus (rule 2)`, fix: 'Focus after the flip instead (the flip policy can refocus)' });
  }
  return ended;
}

function runGuide(sim: Sim, node: NodeOf<'guide'>, scope: Scope): Ended | null {
  if (!sim.rig.guider.present || sim.pointing.kind === 'park') return null;
  const durationS = guideStartS(node.calibrate, sim.rig.guider);
  const ended = act(sim, scope, 'guide', durationS, node.id, node.calibrate ? 'Start guiding with calibration' : 'Start guiding');
  if (ended) return ended;
  sim.guiding = true;
  sim.guideSettleS = node.settleTimeS;
  return null;
}
