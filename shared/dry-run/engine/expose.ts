import { bandOfFilter, resolveFilter } from '@/shared/recipe/filters';
import type { NodeOf } from '@/shared/recipe/types';
import { cameraDownloadTimeS } from '@/shared/rig/optics';
import { ditherDue, ditherS } from '@/shared/dry-run/models/expose';
import { recordSpan } from '@/shared/dry-run/engine/act';
import { checkLightBlock } from '@/shared/dry-run/engine/light-checks';
import { beforeFrame } from '@/shared/dry-run/engine/meridian';
import { filterChangeNowS } from '@/shared/dry-run/engine/mount-steps';
import { ruleActions } from '@/shared/dry-run/engine/rules';
import { fits, type Ended, type Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm, n } from '@/shared/dry-run/engine/text';

type ExposeNode = NodeOf<'expose'>;

/** Frames between interruptions, recorded as one timeline event. */
interface Block {
  startMs: number;
  frames: number;
  shutterStartMs: number | null;
  downloadS: number;
  ditherS: number;
  changeS: number;
}

const newBlock = (ms: number): Block => ({ startMs: ms, frames: 0, shutterStartMs: null, downloadS: 0, ditherS: 0, changeS: 0 });

/**
 * An expose step, frame by frame: before each frame the rule actions (refocus, re-centre) and
 * the meridian policy may interrupt; then the filter change (first frame), a dither when
 * `ditherEvery` frames have passed, exposure and download. A frame starts only if it ends by
 * every deadline; otherwise the container that owns the deadline ends. Uninterrupted frames
 * form one timeline event.
 */
export function runExpose(sim: Sim, node: ExposeNode, scope: Scope): Ended | null {
  const slot = resolveFilter(sim.rig, node.filter);
  const band = bandOfFilter(node.filter, sim.rig);
  const downloadS = cameraDownloadTimeS(sim.rig.camera, node.binning);
  const frameS = node.exposureS + downloadS;
  let block = newBlock(sim.t);
  const flush = () => {
    closeBlock(sim, scope, node, block, band);
    block = newBlock(sim.t);
  };
  checkStart(sim, node);
  for (let i = 0; i < node.count; i += 1) {
    const before = sim.t;
    const interrupted = ruleActions(sim, scope, slot, flush) ?? beforeFrame(sim, scope, frameS, node.exposureS, { flush, cut: (from, to) => recordLostFrame(sim, node, from, to) });
    if (interrupted) {
      flush();
      return interrupted;
    }
    if (sim.t !== before) flush();
    const changeS = filterChangeNowS(sim, slot);
    const dither = ditherDue(sim.framesSinceDither, node.ditherEvery) ? ditherS(sim.guiding, sim.guideSettleS, sim.rig.mount.settleS) : 0;
    const ended = fits(scope, sim.t, changeS + dither + frameS);
    if (ended) {
      flush();
      return ended;
    }
    if (slot) sim.filter = slot;
    if (dither > 0) sim.framesSinceDither = 0;
    sim.t += (changeS + dither) * 1000;
    block.shutterStartMs ??= sim.t;
    sim.t += frameS * 1000;
    Object.assign(block, { frames: block.frames + 1, downloadS: block.downloadS + downloadS, ditherS: block.ditherS + dither, changeS: block.changeS + changeS });
    sim.framesSinceDither += 1;
    if (sim.lastFocus) sim.lastFocus.frames += 1;
  }
  flush();
  return null;
}

function closeBlock(sim: Sim, scope: Scope, node: ExposeNode, block: Block, band: ReturnType<typeof bandOfFilter>): void {
  if (block.frames === 0) {
    if (block.changeS + block.ditherS > 0) recordSpan(sim, 'expose', block.startMs, sim.t, node.id, `${node.filter}: filter change`, { filter: node.filter, frames: 0, overhead: { 'filter-change': block.changeS, dither: block.ditherS } });
    return;
  }
  const shutterS = block.frames * node.exposureS;
  recordSpan(sim, 'expose', block.startMs, sim.t, node.id, `${node.filter} ${block.frames} × ${n(node.exposureS)} s`, {
    filter: node.filter,
    frames: block.frames,
    overhead: { download: block.downloadS, dither: block.ditherS, 'filter-change': block.changeS },
  });
  const targetId = sim.pointing.kind === 'radec' ? (sim.pointing.targetId ?? '') : '';
  sim.out.shutterS += shutterS;
  sim.out.addIntegration(targetId, node.filter, block.frames, shutterS);
  sim.out.lights.push({ nodeId: node.id, exposureS: node.exposureS, gain: node.gain ?? sim.rig.camera.gainPresets[0]?.value ?? null, offset: node.offset ?? sim.rig.camera.offsetPresets[0]?.value ?? null, binning: node.binning, readoutMode: sim.rig.camera.readoutModes[0] ?? null, temperatureC: Math.round(sim.cooled && sim.setpointC !== null ? sim.setpointC : sim.sensorC), frames: block.frames });
  if (checkLightBlock(sim, scope, node.id, band, block.shutterStartMs ?? block.startMs, sim.t)) sim.out.usableS += shutterS;
}

/** A frame ended at the flip because it would run past the mount's limit: its time is lost. */
function recordLostFrame(sim: Sim, node: ExposeNode, fromMs: number, toMs: number): void {
  recordSpan(sim, 'expose', fromMs, toMs, node.id, `${node.filter}: frame ended at the flip (it would run past the mount's limit)`, { filter: node.filter, frames: 0, overhead: { lost: (toMs - fromMs) / 1000 } });
  sim.out.finding({ code: 'meridian-unhandled', severity: 'warn', ms: fromMs, nodeId: node.id, key: `meridian-unhandled|cut|${node.id}`, message: `A ${n(node.exposureS)} s frame started at ${hhmm(sim, fromMs)} would run past the mount's tracking limit: it is ended at the flip and lost`, fix: 'Flip earlier or use shorter subs: flip delay + the longest sub must stay inside the mount\'s limit (rule 1)' });
  sim.t = toMs;
}

/** Checks at the step's start: cooling and guiding. */
function checkStart(sim: Sim, node: ExposeNode): void {
  if (!sim.cooled && sim.rig.camera.cooling.maxDeltaBelowAmbientC > 0) {
    sim.out.finding({ code: 'not-cooled', severity: 'warn', ms: sim.t, nodeId: node.id, key: 'not-cooled|uncooled', message: `Light frames start at ${hhmm(sim, sim.t)} with the camera not cooled`, fix: 'Add a cool step before the first light frames (−10 °C is usual), and warm up before parking' });
  }
  if (!sim.guiding && node.exposureS > sim.opts.unguidedLimitS) {
    sim.out.finding({ code: 'unguided-long', severity: 'warn', ms: sim.t, nodeId: node.id, message: `${n(node.exposureS)} s subs run unguided from ${hhmm(sim, sim.t)}; beyond ${n(sim.opts.unguidedLimitS)} s they often trail`, fix: sim.rig.guider.present ? 'Add a guide step after the slew and centring' : `Keep subs at or below ${n(sim.opts.unguidedLimitS)} s, or add a guider to the rig` });
  }
}
