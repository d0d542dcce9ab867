import { describe, expect, it } from 'vitest';
import { exportPlan, importPlan, planOutline, planPreview, remapPlanTree, type Plan } from '@/shared/plan';
import { planFileName } from '@/shared/plan/file-name';
import { samplePlan, SAMPLE_IDS } from './plan-sample';

function sample(): Plan {
  const result = importPlan(exportPlan(samplePlan()));
  if (!result.ok) throw new Error('sample does not read');
  return result.plan;
}

describe('plan preview and import helpers', () => {
  it('outlines the tree in the trade’s words, targets by designation', () => {
    const lines = planOutline(sample());
    expect(lines[0]).toEqual({ depth: 0, kind: 'cool', label: null, summary: 'Cool to −10 °C', enabled: true });
    expect(lines[1]).toMatchObject({ depth: 0, kind: 'stage', summary: expect.stringMatching(/^M31 · after astronomical dusk/) });
    expect(lines.find((l) => l.kind === 'expose')).toMatchObject({ depth: 2, summary: expect.stringMatching(/^L 10 × 180 s/) });
  });

  it('summarises what an import adds', () => {
    const p = planPreview(sample(), { siteId: null, siteName: null, rigId: 'r1', rigName: 'Mine', targetOnList: () => false });
    expect(p).toMatchObject({ recipeName: 'Andromeda in L', nodeCount: 10, nightDate: '2026-10-10', hasEstimate: false, targets: [{ designation: 'M31', onYourList: false }] });
    expect(p.site).toMatchObject({ name: 'Test Meadow', matchId: null });
    expect(p.rig).toMatchObject({ matchId: 'r1', filters: ['L', 'R', 'G', 'B', 'Ha', 'OIII', 'SII'] });
  });

  it('moves stage targets and framing references to the importing user’s ids, keeping node ids', () => {
    const plan = sample();
    const children = [...plan.recipe.children, { kind: 'flats', id: crypto.randomUUID(), enabled: true, source: 'panel', filters: ['L'], count: 30, matchFramingOf: { kind: 'framing', framingId: SAMPLE_IDS.framing } }] as Plan['recipe']['children'];
    const mine = '0a0a0a0a-0a0a-4a0a-8a0a-0a0a0a0a0a0a';
    const myFraming = '0b0b0b0b-0b0b-4b0b-8b0b-0b0b0b0b0b0b';
    const out = remapPlanTree(children, new Map([[SAMPLE_IDS.target, mine]]), new Map([[SAMPLE_IDS.framing, myFraming]]));
    expect(out[1]).toMatchObject({ id: SAMPLE_IDS.stage, targetId: mine });
    expect(out[out.length - 1]).toMatchObject({ matchFramingOf: { kind: 'framing', framingId: myFraming } });
    expect(children[1]).toMatchObject({ targetId: SAMPLE_IDS.target });
  });

  it('names the download after the recipe and the night', () => {
    expect(planFileName('Andromeda · Ha & L', '2026-10-10')).toBe('andromeda-ha-l-2026-10-10.yaml');
    expect(planFileName('Ñandú', undefined)).toBe('nandu.yaml');
    expect(planFileName('☾☾', '2026-01-01')).toBe('plan-2026-01-01.yaml');
  });
});
