import { describe, expect, it } from 'vitest';
import { createNode } from '@/shared/recipe/factory';
import { collectIds, sequentialIds } from '@/shared/recipe/ids';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { filterRefsOf, fromTemplateTree, stageIdsOf, toTemplateTree } from '@/shared/recipe/template';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';

function rigWith(slots: RigInput['filterWheel']['slots']): RigInput {
  const rig = defaultRigInput();
  rig.filterWheel.slots = slots;
  return rig;
}

// A narrowband rig with the publisher's own filter names (bands say what each is).
const narrowRig = rigWith([
  { name: 'Astro Ha 7nm', band: 'Ha', focusOffsetSteps: 12 },
  { name: 'O3 6.5', band: 'OIII', focusOffsetSteps: -8 },
  { name: 'S2 6.5', band: 'SII', focusOffsetSteps: -5 },
  { name: 'Tri-band', band: 'custom', focusOffsetSteps: 0 },
]);
const lrgbHaRig = rigWith([
  { name: 'Lum', band: 'L', focusOffsetSteps: 0 },
  { name: 'Red', band: 'R', focusOffsetSteps: 3 },
  { name: 'Green', band: 'G', focusOffsetSteps: 3 },
  { name: 'Blue', band: 'B', focusOffsetSteps: 4 },
  { name: 'H-alpha 3nm', band: 'Ha', focusOffsetSteps: 10 },
]);

const TARGET = '00000000-0000-4000-8000-0000000000aa';

function publisherTree(): RecipeTree {
  const newId = sequentialIds();
  const make = { newId };
  const stage = createNode('stage', { targetId: TARGET }, make);
  const exposes = ['Astro Ha 7nm', 'O3 6.5', 'S2 6.5'].map((filter) => createNode('expose', { filter, exposureS: 300, count: 12, gain: 100, offset: 30 }, make));
  const children: RecipeNode[] = [createNode('focus', { filter: 'Astro Ha 7nm', stepSize: 35 }, make), ...exposes];
  const flats = createNode('flats', { filters: ['Astro Ha 7nm', 'Tri-band'], matchFramingOf: { kind: 'stage', stageId: stage.id } }, make);
  const tree = { children: [createNode('cool', { maxRateCPerMin: 2 }, make), { ...stage, children }, flats] };
  return recipeTreeSchema.parse(tree);
}

describe('toTemplateTree', () => {
  it('names filters by band, keeps custom filters by name, and drops rig numbers and targets', () => {
    const snap = toTemplateTree(publisherTree(), { rig: narrowRig, targetOf: (id) => (id === TARGET ? { designation: 'XC 1', name: 'Test Cloud', raDeg: 83.8, decDeg: -5.4 } : undefined) });
    expect(snap.bands).toEqual(['Ha', 'OIII', 'SII', 'Tri-band']);
    const [cool, stage, flats] = snap.tree.children as [RecipeNode, RecipeNode, RecipeNode];
    expect(cool).not.toHaveProperty('maxRateCPerMin');
    expect(stage.kind === 'stage' && stage.targetId).toBe(null);
    expect(snap.suggestedTargets[stage.id]).toEqual({ designation: 'XC 1', name: 'Test Cloud', raDeg: 83.8, decDeg: -5.4 });
    const steps = stage.kind === 'stage' ? stage.children : [];
    // Focuser step size is the placeholder default (trade-defaults.md: depends on the focuser).
    expect(steps[0]).toMatchObject({ kind: 'focus', filter: 'Ha', stepSize: 50 });
    for (const e of steps.slice(1)) {
      expect(e).not.toHaveProperty('gain');
      expect(e).not.toHaveProperty('offset');
    }
    expect(flats).toMatchObject({ kind: 'flats', filters: ['Ha', 'Tri-band'], matchFramingOf: { kind: 'stage', stageId: stage.id } });
    expect(recipeTreeSchema.safeParse(snap.tree).success).toBe(true);
  });

  it('without a rig, reads bands from the names alone and leaves targets open', () => {
    const snap = toTemplateTree(publisherTree());
    expect(snap.bands).toEqual(['Astro Ha 7nm', 'O3 6.5', 'S2 6.5', 'Tri-band']);
    expect(snap.suggestedTargets).toEqual({});
  });
});

describe('fromTemplateTree', () => {
  const template = toTemplateTree(publisherTree(), { rig: narrowRig }).tree;

  it('reports bands the rig has no filter for', () => {
    const r = fromTemplateTree(template, { rig: lrgbHaRig });
    expect(r.unmapped).toEqual(['OIII', 'SII', 'Tri-band']);
  });

  it('maps bands to the rig by band, and to the chosen filters by bandMap; fresh ids, targets set', () => {
    const stageId = stageIdsOf(template)[0]!;
    const r = fromTemplateTree(template, { rig: lrgbHaRig, bandMap: { OIII: 'Green', SII: 'red', 'Tri-band': 'Lum' }, targetIds: { [stageId]: TARGET }, newId: sequentialIds(500) });
    expect(r.unmapped).toEqual([]);
    expect(r.badMappings).toEqual([]);
    expect(filterRefsOf(r.tree)).toEqual(['H-alpha 3nm', 'Green', 'Red', 'Lum']);
    const before = new Set(collectIds(template));
    expect(collectIds(r.tree).some((id) => before.has(id))).toBe(false);
    const stage = r.tree.children[1]!;
    expect(stage.kind === 'stage' && stage.targetId).toBe(TARGET);
    // The flats step follows the copied stage.
    expect(r.tree.children[2]).toMatchObject({ matchFramingOf: { kind: 'stage', stageId: stage.id } });
  });

  it('flags a bandMap entry that names no slot of the rig', () => {
    const r = fromTemplateTree(template, { rig: lrgbHaRig, bandMap: { OIII: 'Nope', SII: 'Red', 'Tri-band': 'Lum' } });
    expect(r.badMappings).toEqual(['OIII']);
  });

  it('without a rig keeps band names as filter names', () => {
    const r = fromTemplateTree(template, { rig: null });
    expect(r.unmapped).toEqual([]);
    expect(filterRefsOf(r.tree)).toEqual(['Ha', 'OIII', 'SII', 'Tri-band']);
  });
});
