import { describe, expect, it } from 'vitest';
import { templateChangeText, templateChangeWords } from '@/components/templates/template-change-text';
import { createNode } from '@/shared/recipe/factory';
import { sequentialIds } from '@/shared/recipe/ids';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { fromTemplateTree, toTemplateTree, type SuggestedTarget } from '@/shared/recipe/template';
import { diffTemplateTrees, type TreeChange } from '@/shared/recipe/template-diff';
import type { NodeOf, RecipeNode, RecipeTree } from '@/shared/recipe/types';

/*
 * The "what changed" list of a newer template version. Step texts come from summarizeNode
 * (tests/unit/recipe-summary.test.ts); the numbers here are arbitrary fixture values.
 */

// Approximate J2000 position of M 31 (from memory; any position serves here).
const M31: SuggestedTarget = { designation: 'M 31', name: 'Andromeda Galaxy', raDeg: 10.68, decDeg: 41.27 };

/** cool → stage (M 31 suggested) [slew, focus, Ha 3 × 300 s, OIII 3 × 300 s, repeat [L 20 × 60 s]] → flats on the stage → park. */
function version1(): { tree: RecipeTree; targets: Record<string, SuggestedTarget> } {
  const make = { newId: sequentialIds() };
  const expose = (filter: string, count: number, exposureS: number) => createNode('expose', { filter, count, exposureS, ditherEvery: 2 }, make);
  const repeat = { ...createNode('repeat', { until: { count: 10 } }, make), children: [expose('L', 20, 60)] };
  const stage = { ...createNode('stage', { window: { minAltitudeDeg: 30 } }, make), children: [createNode('slew', {}, make), createNode('focus', { filter: 'Ha' }, make), expose('Ha', 3, 300), expose('OIII', 3, 300), repeat] };
  const flats = createNode('flats', { filters: ['Ha', 'OIII'], count: 20, matchFramingOf: { kind: 'stage', stageId: stage.id } }, make);
  const tree = recipeTreeSchema.parse({ children: [createNode('cool', {}, make), stage, flats, createNode('park', {}, make)] });
  return { tree, targets: { [stage.id]: M31 } };
}

/** A newer version: same ids are not needed (a new snapshot), so the edit works on a fresh copy. */
function edit(tree: RecipeTree, change: (children: RecipeNode[], stage: NodeOf<'stage'>) => void): RecipeTree {
  const next = structuredClone(tree);
  const stage = next.children[1] as NodeOf<'stage'>;
  change(next.children, stage);
  return next;
}

const texts = (changes: TreeChange[]) => changes.map(templateChangeText);

describe('diffTemplateTrees', () => {
  const v1 = version1();

  it('finds no change between a template and a fresh copy re-abstracted to bands (ids differ)', () => {
    const copy = fromTemplateTree(v1.tree, { rig: null, newId: sequentialIds(500) }).tree;
    expect(diffTemplateTrees(toTemplateTree(copy).tree, v1.tree)).toEqual([]);
  });

  it('a changed frame count: the step in words, in its stage by the suggested target, with its place', () => {
    const v2 = edit(v1.tree, (_, stage) => Object.assign(stage.children[2]!, { count: 40 }));
    const changes = diffTemplateTrees(v1.tree, v2, { fromTargets: v1.targets });
    expect(changes).toEqual([
      { kind: 'changed', path: '1.2', nodeKind: 'expose', before: 'Ha 3 × 300 s, bin 1, dither every 2', after: 'Ha 40 × 300 s, bin 1, dither every 2', where: { within: ["stage 'M 31'"] , step: 3 } },
    ]);
    expect(texts(changes)).toEqual(["Changed in stage 'M 31' (step 3): Ha 3 × 300 s, bin 1, dither every 2 → Ha 40 × 300 s, bin 1, dither every 2"]);
    // The notice sets the lead apart from the step itself.
    expect(templateChangeWords(changes[0]!)).toEqual({ lead: "Changed in stage 'M 31' (step 3)", detail: 'Ha 3 × 300 s, bin 1, dither every 2 → Ha 40 × 300 s, bin 1, dither every 2' });
  });

  it('an inserted step is one addition after its neighbour, not a run of changes', () => {
    const v2 = edit(v1.tree, (_, stage) => stage.children.splice(2, 0, createNode('guide', { settlePx: 1 }, { newId: sequentialIds(900) })));
    expect(texts(diffTemplateTrees(v1.tree, v2, { toTargets: v1.targets }))).toEqual(["Added in stage 'M 31' after 'Focus': Guide, settle within 1 px for 10 s, calibrate first"]);
  });

  it('removals name the stage they left; a removed container counts its steps', () => {
    const v2 = edit(v1.tree, (children, stage) => {
      stage.children.splice(3, 2);
      children.pop();
    });
    expect(texts(diffTemplateTrees(v1.tree, v2, { fromTargets: v1.targets }))).toEqual([
      "Removed from stage 'M 31': OIII 3 × 300 s, bin 1, dither every 2",
      "Removed from stage 'M 31': Repeat 10 times (with 1 step inside)",
      'Removed: Park the mount',
    ]);
  });

  it('changes inside a repeat say so; a stage without a label or target is named by its number', () => {
    const v2 = edit(v1.tree, (_, stage) => Object.assign((stage.children[4] as NodeOf<'repeat'>).children[0]!, { exposureS: 120, count: 10 }));
    expect(texts(diffTemplateTrees(v1.tree, v2))).toEqual(['Changed in stage 1 › Repeat 10 times (step 1): L 20 × 60 s, bin 1, dither every 2 → L 10 × 120 s, bin 1, dither every 2']);
  });

  it('a stage label names the stage; an added step at the start and at the top level', () => {
    const make = { newId: sequentialIds(700) };
    const v2 = edit(v1.tree, (children, stage) => {
      stage.label = 'Core';
      stage.children.unshift(createNode('wait', { until: { sunEvent: 'nautical-dusk' } }, make));
      children.splice(3, 0, createNode('warm', {}, make));
    });
    expect(texts(diffTemplateTrees(v1.tree, v2, { fromTargets: v1.targets }))).toEqual([
      "Changed at step 2: M 31 · above 30° (renamed to 'Core')",
      "Added at the start of stage 'M 31': Wait until nautical dusk",
      "Added after 'Flats': Warm to ambient",
    ]);
  });

  it('settings the summaries do not show: a step turned off, flats matching another stage', () => {
    const make = { newId: sequentialIds(800) };
    const v2 = edit(v1.tree, (children, stage) => {
      stage.children[0]!.enabled = false;
      const second = { ...createNode('stage', { label: 'Rim' }, make), children: [] };
      children.splice(1, 0, second);
      const flats = children[3] as NodeOf<'flats'>;
      flats.matchFramingOf = { kind: 'stage', stageId: second.id };
    });
    const changes = diffTemplateTrees(v1.tree, v2, { fromTargets: v1.targets });
    expect(texts(changes)).toEqual([
      "Added after 'Cool': Rim",
      "Changed in stage 'M 31' (step 1): Slew to the stage target (turned off)",
      "Changed at step 4: Panel flats: Ha and OIII, 20 each, matching a stage's framing (now matches stage 'Rim')",
    ]);
  });

  it('a stage inserted before the one a flats step matches: the flats step is unchanged', () => {
    const v2 = edit(v1.tree, (children) => children.splice(1, 0, { ...createNode('stage', { label: 'Rim' }, { newId: sequentialIds(850) }), children: [] }));
    expect(texts(diffTemplateTrees(v1.tree, v2, { fromTargets: v1.targets, toTargets: v1.targets }))).toEqual(["Added after 'Cool': Rim"]);
  });

  it('a step of another kind in the same place is a removal and an addition', () => {
    const v2 = edit(v1.tree, (children) => children.splice(3, 1, createNode('warm', { targetC: 5 }, { newId: sequentialIds(950) })));
    expect(diffTemplateTrees(v1.tree, v2).map((c) => [c.kind, c.nodeKind, c.path])).toEqual([
      ['removed', 'park', '3'],
      ['added', 'warm', '3'],
    ]);
  });

  it('a very long list is compared by position (no quadratic alignment): one changed step', () => {
    const make = { newId: sequentialIds(2000) };
    const long = recipeTreeSchema.parse({ children: Array.from({ length: 600 }, (_, i) => createNode('wait', { until: { durationS: 60 + i } }, make)) });
    const next = structuredClone(long);
    Object.assign(next.children[599]!, { until: { durationS: 30 } });
    expect(texts(diffTemplateTrees(long, next))).toEqual(['Changed at step 600: Wait 659 s → Wait 30 s']);
  });
});
