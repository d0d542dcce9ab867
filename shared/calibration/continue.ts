import type { StoredFrame } from '@/shared/calibration/types';
import type { RecordedFraming } from '@/shared/schemas/calibration-api';
import { wrap360 } from '@/shared/calibration/sky-geometry';
import { createNode } from '@/shared/recipe/factory';
import { findSlotByName } from '@/shared/recipe/filters';
import { stageSchema } from '@/shared/recipe/schema';
import type { NodeOf, RecipeNode } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

/** A recorded filter's exposure settings (its most used, as the caller picks them). */
export interface RecordedExposure {
  filter: string | null;
  exposureS: number;
  gain: number | null;
  offset: number | null;
  binning: number;
}

/** An exposure the new stage takes: `filter` is the wheel slot's own name. */
export type ContinueExposure = RecordedExposure & { filter: string };

const inRange = (v: number, min: number, max: number) => Number.isFinite(v) && v >= min && v <= max;

/**
 * The recorded exposures a "continue" stage can take on this rig: those whose filter is in the
 * wheel by name (case and surrounding spaces ignored; the slot's spelling is used), first one per
 * slot, with settings an expose step holds (exposure 0.001–3600 s, binning 1–4). `skipped` names
 * the recorded filters left out (frames without a filter name are left out unnamed).
 */
export function continueExposures(exposures: readonly RecordedExposure[], rig: Pick<RigInput, 'filterWheel'>): { kept: ContinueExposure[]; skipped: string[] } {
  const kept: ContinueExposure[] = [];
  const skipped: string[] = [];
  for (const e of exposures) {
    if (e.filter === null) continue;
    const slot = findSlotByName(rig, e.filter);
    const usable = slot !== undefined && inRange(e.exposureS, 0.001, 3600) && Number.isInteger(e.binning) && inRange(e.binning, 1, 4);
    if (!slot || !usable) {
      if (!skipped.includes(e.filter)) skipped.push(e.filter);
      continue;
    }
    if (kept.some((k) => k.filter === slot.name)) continue;
    kept.push({ ...e, filter: slot.name });
  }
  return { kept, skipped };
}

/** Frames per expose block: about 15 minutes of one filter (Nightloom choice, as a new expose step). */
function blockCount(exposureS: number): number {
  return Math.max(1, Math.round(900 / exposureS));
}

function exposeNode(e: ContinueExposure, rig: RigInput): RecipeNode {
  const gain = e.gain !== null && inRange(e.gain, 0, 100000) ? { gain: e.gain } : {};
  const offset = e.offset !== null && inRange(e.offset, 0, 100000) ? { offset: e.offset } : {};
  return createNode('expose', { filter: e.filter, exposureS: e.exposureS, count: blockCount(e.exposureS), binning: e.binning, ...gain, ...offset }, { rig });
}

/**
 * "Continue this target": a stage named "Continue <label>" for the target, framed at the recorded
 * framing's centre and the chosen PA, between astronomical dusk and dawn. Children: slew to the
 * stage target, centre, rotate to the framing (with a rotator), focus with the first filter,
 * guide (with a guider), a flip policy (German mount), then one expose step per recorded filter
 * the wheel holds (`continueExposures`), with its exposure, gain, offset and binning.
 */
export function continueStage(targetId: string, targetLabel: string, framing: RecordedFraming, positionAngleDeg: number, exposures: readonly { filter: string | null; exposureS: number; gain: number | null; offset: number | null; binning: number }[], rig: RigInput): NodeOf<'stage'> {
  const { kept } = continueExposures(exposures, rig);
  const make = { rig };
  const children: RecipeNode[] = [createNode('slew', { to: { kind: 'stage-target' } }, make), createNode('centre', {}, make)];
  if (rig.rotator.present) children.push(createNode('rotate', { to: { matchFraming: true } }, make));
  children.push(createNode('focus', kept[0] ? { filter: kept[0].filter } : {}, make));
  if (rig.guider.present) children.push(createNode('guide', {}, make));
  if (rig.mount.type === 'german-equatorial') children.push(createNode('meridian', {}, make));
  for (const e of kept) children.push(exposeNode(e, rig));
  const stage = createNode('stage', {
    targetId,
    label: `Continue ${targetLabel}`.slice(0, 80).trim(),
    framing: { raDeg: wrap360(framing.raDeg), decDeg: Math.max(-90, Math.min(90, framing.decDeg)), positionAngleDeg: wrap360(positionAngleDeg) },
    window: { notBefore: 'astronomical-dusk', endBy: 'astronomical-dawn' },
  });
  return stageSchema.parse({ ...stage, children }) as NodeOf<'stage'>;
}

/** Per filter, the (exposure, gain, offset, binning) most of its frames used (ties: the longer integration). */
export function mostUsedExposures(lights: readonly Pick<StoredFrame, 'filter' | 'exposureS' | 'gain' | 'offset' | 'binning'>[]): RecordedExposure[] {
  const tally = new Map<string, { e: RecordedExposure; frames: number; seconds: number }>();
  for (const f of lights) {
    const key = JSON.stringify([f.filter, f.exposureS, f.gain, f.offset, f.binning]);
    const t = tally.get(key) ?? { e: { filter: f.filter, exposureS: f.exposureS, gain: f.gain, offset: f.offset, binning: f.binning }, frames: 0, seconds: 0 };
    t.frames += 1;
    t.seconds += f.exposureS;
    tally.set(key, t);
  }
  const best = new Map<string | null, { e: RecordedExposure; frames: number; seconds: number }>();
  for (const t of tally.values()) {
    const b = best.get(t.e.filter);
    if (!b || t.frames > b.frames || (t.frames === b.frames && t.seconds > b.seconds)) best.set(t.e.filter, t);
  }
  return [...best.values()].map((t) => t.e);
}
