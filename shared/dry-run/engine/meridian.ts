import { CENTRE_MODEL } from '@/shared/dry-run/models/centre';
import { msAfterTransit } from '@/shared/dry-run/models/flip';
import { FOCUS_MODEL } from '@/shared/dry-run/models/focus';
import { GUIDE_MODEL } from '@/shared/dry-run/models/guide';
import { mountAxes, slewDurationS } from '@/shared/dry-run/models/slew';
import { horizonVector, type Vec3 } from '@/shared/dry-run/models/slew-path';
import { emit } from '@/shared/dry-run/engine/act';
import { centreNow, focusNow, rotateToPa } from '@/shared/dry-run/engine/mount-steps';
import { currentSkyPaDeg, mountPosition } from '@/shared/dry-run/engine/pointing';
import { fits, type Ended, type Scope, type StageCtx } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { checkSlewSun } from '@/shared/dry-run/engine/sun-checks';
import { hhmm, minutes, n } from '@/shared/dry-run/engine/text';
import { waitUntil } from '@/shared/dry-run/engine/wait';

/** The meridian instants of the stage target's current transit, while a German mount tracks it west of the pier. */
export interface MeridianTimes {
  stage: StageCtx;
  transitMs: number;
  /** The mount stops tracking here (hour angle = `trackPastMin`). */
  limitMs: number;
  /** When the policy flips (`flip`: flipAfterMin past, never later than the limit; `pause-before`: the mount's flip delay). */
  flipMs: number | null;
  /** `pause-before`: no frame runs past this. */
  pauseMs: number | null;
}

/**
 * The current meridian instants of the stage target, or null when no meridian handling applies
 * (not a German mount, not pointing at the stage target, or already east of the pier). Hour
 * angles become clock time at the sidereal rate (`msAfterTransit`).
 */
export function meridianTimes(sim: Sim, scope: Scope): MeridianTimes | null {
  const stage = scope.stage;
  const p = sim.pointing;
  if (!stage || sim.rig.mount.type !== 'german-equatorial' || sim.pier !== 'west' || p.kind !== 'radec' || p.sky !== stage.sky) return null;
  const transitMs = stage.sky.transitNear(sim.t);
  const { trackPastMin, flipDelayS } = sim.rig.mount.meridian;
  const limitMs = transitMs + msAfterTransit(trackPastMin);
  const policy = stage.policy;
  let flipMs: number | null = null;
  let pauseMs: number | null = null;
  if (policy?.kind === 'flip') flipMs = transitMs + msAfterTransit(Math.min(policy.flipAfterMin, trackPastMin));
  if (policy?.kind === 'pause-before') {
    pauseMs = transitMs - msAfterTransit(policy.minutesBefore);
    flipMs = transitMs + flipDelayS * 1000;
  }
  return { stage, transitMs, limitMs, flipMs, pauseMs };
}

/** True when a flip comes within `FOCUS_MODEL.noRunBeforeFlipMin` of `ms` (rule 2: no focus run then). */
export function flipSoon(sim: Sim, scope: Scope, ms: number): boolean {
  const m = meridianTimes(sim, scope);
  return m !== null && m.flipMs !== null && m.flipMs - ms < FOCUS_MODEL.noRunBeforeFlipMin * 60_000;
}

const endStage = (m: MeridianTimes, scope: Scope, atMs: number): Ended => ({ ownerId: m.stage.node.id, reason: 'meridian', openEnded: scope.openEnded, atMs });

/** Before any step of a stage: flip (or pause, end the stage) once the policy's moment has come. */
export function meridianGate(sim: Sim, scope: Scope): Ended | null {
  return beforeFrame(sim, scope, 0, 0, NO_HOOKS);
}

/** What an expose step does before the meridian handling records anything: close its block; record a cut frame. */
export interface FrameHooks {
  flush: () => void;
  cut: ((fromMs: number, toMs: number) => void) | null;
}

const NO_HOOKS: FrameHooks = { flush: () => {}, cut: null };

/**
 * Before a frame of `frameS` (exposure `exposureS`): `flip` flips once due; a frame that would
 * run past the mount's limit is ended at the flip. `pause-before` lets no frame run past the pause
 * point, idles to the flip and flips. `end-stage` ends the stage rather than cross the meridian.
 * No policy: `meridian-unhandled` when a frame crosses the meridian; the stage ends at the limit.
 */
export function beforeFrame(sim: Sim, scope: Scope, frameS: number, exposureS: number, hooks: FrameHooks): Ended | null {
  const m = meridianTimes(sim, scope);
  if (!m) return null;
  const { stage } = m;
  const endMs = sim.t + frameS * 1000;
  const policy = stage.policy;
  if (policy?.kind === 'flip') {
    if (policy.flipAfterMin > sim.rig.mount.meridian.trackPastMin) unhandledLate(sim, stage, policy.flipAfterMin);
    if (sim.t >= m.flipMs! || endMs > m.limitMs) {
      hooks.flush();
      if (sim.t < m.flipMs! && hooks.cut) hooks.cut(sim.t, m.flipMs!);
      return flip(sim, scope, stage, { refocus: policy.refocus, recentre: policy.recentre });
    }
    return null;
  }
  if (policy?.kind === 'pause-before') {
    if (endMs <= m.pauseMs! && sim.t < m.pauseMs!) return null;
    hooks.flush();
    const ended = waitUntil(sim, scope, m.flipMs!, stage.policyNodeId, `Meridian pause: ${stage.name} crosses at ${hhmm(sim, m.transitMs)}`, 'pause');
    return ended ?? flip(sim, scope, stage, { refocus: false, recentre: true });
  }
  if (policy?.kind === 'end-stage') return endMs > m.transitMs || sim.t >= m.transitMs ? endStage(m, scope, sim.t) : null;
  if (frameS > 0 && endMs > m.transitMs && !stage.reported.has('meridian')) {
    stage.reported.add('meridian');
    sim.out.finding({ code: 'meridian-unhandled', severity: 'stop', ms: sim.t, nodeId: stage.node.id, key: `meridian-unhandled|none|${stage.node.id}`, message: `${n(exposureS)} s frames run across the meridian at ${hhmm(sim, m.transitMs)} on a German mount with no meridian step: the mount stops tracking at ${hhmm(sim, m.limitMs)}`, fix: 'Add a meridian step (flip, pause before, or end the stage) before the frames' });
  }
  return endMs > m.limitMs || sim.t >= m.limitMs ? endStage(m, scope, sim.t) : null;
}

function unhandledLate(sim: Sim, stage: StageCtx, flipAfterMin: number): void {
  const limit = sim.rig.mount.meridian.trackPastMin;
  sim.out.finding({ code: 'meridian-unhandled', severity: 'stop', ms: sim.t, nodeId: stage.policyNodeId, key: `meridian-unhandled|late|${stage.policyNodeId}`, message: `The flip is set ${n(flipAfterMin)} min past the meridian, but ${sim.rig.name} stops tracking ${n(limit)} min past it; the dry run flips at the limit`, fix: `Flip at most ${n(limit)} min past the meridian` });
}

/**
 * The flip (rule 2): slew to the other side of the pier (its path checked for the Sun, taken
 * through the pole), centre if asked, turn the rotator back if a rotate step matched the framing,
 * restart guiding, refocus if asked. Without the rotator restore the sky PA turns 180°.
 */
function flip(sim: Sim, scope: Scope, stage: StageCtx, opts: { refocus: boolean; recentre: boolean }): Ended | null {
  const nodeId = stage.policyNodeId;
  const slewS = flipSlewS(sim);
  const restartS = sim.guiding ? GUIDE_MODEL.restartS : 0;
  const ended = fits(scope, sim.t, slewS + restartS);
  if (ended) return ended;
  checkSlewSun(sim, flipPath(sim), nodeId, scope.skyFlats);
  const restore = stage.restoreRotation && sim.rig.rotator.present;
  const paBefore = currentSkyPaDeg(sim);
  const paNote = paBefore === null ? '' : restore ? `; the rotator then restores PA ${n(paBefore)}°` : `; sky PA ${n(paBefore)}° → ${n((paBefore + 180) % 360)}° (turned 180°, no rotator restore)`;
  emit(sim, 'flip', slewS, nodeId, `Meridian flip: the tube moves to the east side of the pier, ${minutes(slewS)}${paNote}`);
  sim.pier = 'east';
  const guiding = sim.guiding;
  sim.guiding = false;
  let r: Ended | null = null;
  if (opts.recentre) r = centreNow(sim, scope, { ...stage.centre, errorArcsec: CENTRE_MODEL.slewErrorArcsec }, nodeId, 'Centre after the flip', 'flip');
  if (!r && restore && paBefore !== null) r = rotateToPa(sim, scope, paBefore, 0, nodeId, 'Rotator restores the framing after the flip', 'flip');
  if (!r && guiding) emit(sim, 'flip', restartS, nodeId, 'Guiding restarts after the flip');
  sim.guiding = guiding && !r;
  if (!r && opts.refocus) r = focusNow(sim, scope, stage.focus, sim.filter, nodeId, 'Refocus after the flip', 'flip');
  sim.lastCentreMs = sim.t;
  return r;
}

/** The flip slew at the current hour angle: axis 1 turns 180°, axis 2 from δ to 180° − δ (slew model, with settle). */
function flipSlewS(sim: Sim): number {
  const pos = mountPosition(sim, sim.pointing, sim.t);
  const type = sim.rig.mount.type;
  return slewDurationS(mountAxes(type, pos, 'west'), mountAxes(type, pos, 'east'), sim.rig.mount);
}

/** The tube's path in a flip, target → pole → target, as horizontal unit vectors. */
function flipPath(sim: Sim): Vec3[] {
  const target = sim.pointing.kind === 'radec' ? sim.pointing.sky.altAz(sim.t) : { altDeg: 90, azDeg: 0 };
  const lat = sim.site.latitudeDeg;
  const pole = horizonVector(Math.abs(lat), lat >= 0 ? 0 : 180);
  const t = horizonVector(target.altDeg, target.azDeg);
  return [t, pole, t];
}
