import { describe, expect, it } from 'vitest';
import { continueExposures, continueStage } from '@/shared/calibration/continue';
import { targetHistory } from '@/shared/calibration/history';
import { runDryRun } from '@/shared/dry-run';
import { createNode } from '@/shared/recipe/factory';
import { stageSchema } from '@/shared/recipe/schema';
import type { NodeOf } from '@/shared/recipe/types';
import { defaultRigInput, rigInputSchema, type RigInput } from '@/shared/rig/schema';
import { REFERENCE_SITE, REFERENCE_TARGETS } from '@/tests/helpers/dry-run-reference';
import { M31, storedFrame } from './calibration-fixtures';

/** Great-circle distance by the haversine formula (Sinnott 1984, Sky & Telescope 68, 159), written out here independently of the code under test. */
function haversineDeg(ra1: number, dec1: number, ra2: number, dec2: number): number {
  const r = Math.PI / 180;
  const a = Math.sin(((dec2 - dec1) * r) / 2) ** 2 + Math.cos(dec1 * r) * Math.cos(dec2 * r) * Math.sin(((ra2 - ra1) * r) / 2) ** 2;
  return (2 * Math.atan2(Math.sqrt(a), Math.sqrt(1 - a))) / r;
}

const rigWith = (over: { rotator?: boolean; guider?: boolean; mount?: RigInput['mount']['type'] } = {}): RigInput =>
  rigInputSchema.parse({ ...defaultRigInput(), rotator: { ...defaultRigInput().rotator, present: over.rotator ?? true }, guider: { ...defaultRigInput().guider, present: over.guider ?? true }, mount: { ...defaultRigInput().mount, type: over.mount ?? 'german-equatorial' } });

// A framing of M31 shot over two nights: small pointing scatter, PA 35°, 1.46331″/px.
const scatter = [
  [0, 0],
  [0.004, 0.003],
  [-0.003, 0.005],
  [0.002, -0.006],
  [-0.005, -0.002],
] as const;
const frames = scatter.map(([dRa, dDec], i) =>
  storedFrame({ type: 'Light Frame', dateObs: `2026-01-1${i < 3 ? 0 : 2}T${19 + i}:00:00`, exposureS: i % 2 ? 180 : 300, filter: i % 2 ? 'OIII' : 'Ha', gain: 100, offset: 50, object: 'M31', wcs: { raDeg: M31.raDeg + dRa, decDeg: M31.decDeg + dDec, positionAngleDeg: 35, scaleArcsecPerPx: 1.46331 } }),
);
const [framing] = targetHistory(M31, frames, []).framings;
const exposures = [
  { filter: 'ha', exposureS: 300, gain: 100, offset: 50, binning: 1 },
  { filter: 'OIII', exposureS: 180, gain: 100, offset: 50, binning: 1 },
  { filter: 'Lum', exposureS: 60, gain: 0, offset: 50, binning: 1 },
  { filter: null, exposureS: 60, gain: null, offset: null, binning: 1 },
];

describe('continueStage', () => {
  const stage = continueStage(M31.id, 'M31', framing!, framing!.positionAngleDeg, exposures, rigWith());

  it('is a valid stage for the target, named "Continue M31"', () => {
    expect(stageSchema.safeParse(stage).success).toBe(true);
    expect(stage).toMatchObject({ kind: 'stage', targetId: M31.id, label: 'Continue M31' });
  });

  it('centres within 1′ of every frame of the recorded framing (haversine), at the chosen PA', () => {
    for (const f of frames) expect(haversineDeg(stage.framing!.raDeg, stage.framing!.decDeg, f.wcsRaDeg!, f.wcsDecDeg!) * 60).toBeLessThan(1);
    expect(stage.framing!.positionAngleDeg).toBeCloseTo(35, 6);
    const turned = continueStage(M31.id, 'M31', framing!, 215, exposures, rigWith());
    expect(turned.framing!.positionAngleDeg).toBe(215);
    expect(turned.framing!.raDeg).toBe(stage.framing!.raDeg);
  });

  it('slews, centres, rotates to the framing, focuses, guides, sets a flip policy, then exposes per recorded filter the wheel holds', () => {
    expect(stage.children.map((c) => c.kind)).toEqual(['slew', 'centre', 'rotate', 'focus', 'guide', 'meridian', 'expose', 'expose']);
    expect(stage.children[0]).toMatchObject({ to: { kind: 'stage-target' } });
    expect(stage.children[2]).toMatchObject({ to: { matchFraming: true } });
    expect(stage.children[3]).toMatchObject({ kind: 'focus', filter: 'Ha' });
    const exposes = stage.children.filter((c): c is NodeOf<'expose'> => c.kind === 'expose');
    // the wheel's own spelling ("Ha" for the recorded "ha"); blocks of about 15 min (Nightloom choice)
    expect(exposes).toMatchObject([
      { filter: 'Ha', exposureS: 300, gain: 100, offset: 50, binning: 1, count: 3 },
      { filter: 'OIII', exposureS: 180, gain: 100, offset: 50, binning: 1, count: 5 },
    ]);
  });

  it('names the filters it skipped (not in the wheel)', () => {
    expect(continueExposures(exposures, rigWith()).skipped).toEqual(['Lum']);
  });

  it('leaves out rotate without a rotator, guide without a guider and the flip policy on a fork', () => {
    const bare = continueStage(M31.id, 'M31', framing!, 35, exposures, rigWith({ rotator: false, guider: false, mount: 'fork' }));
    expect(bare.children.map((c) => c.kind)).toEqual(['slew', 'centre', 'focus', 'expose', 'expose']);
  });

  it('dry-runs: the rotator turns to the chosen PA', () => {
    const refM31 = Object.keys(REFERENCE_TARGETS)[3]!;
    const s = continueStage(refM31, 'M31', framing!, 215, exposures, rigWith());
    const r = runDryRun({ tree: { children: [createNode('cool'), s, createNode('warm'), createNode('park')] }, rig: rigWith(), site: REFERENCE_SITE, nightDate: '2026-10-12', targets: REFERENCE_TARGETS, darkLibrary: [] });
    expect(r.timeline.some((e) => e.kind === 'rotate' && e.nodeId === s.children[2]!.id && e.what.includes('PA 215°'))).toBe(true);
    expect(r.totals.integrationByTargetAndFilter[refM31]).toHaveProperty('Ha');
  });
});
