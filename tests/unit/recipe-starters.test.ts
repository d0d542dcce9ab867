import { describe, expect, it } from 'vitest';
import { checkRecipe } from '@/shared/recipe/checks';
import { collectIds, sequentialIds } from '@/shared/recipe/ids';
import { recipeSchema } from '@/shared/recipe/schema';
import { copyRecipe, emptyRecipe, starterFilters, starterRecipe } from '@/shared/recipe/starters';
import { summarizeNode } from '@/shared/recipe/summary';
import { flattenTree } from '@/shared/recipe/flat';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';

const M31 = { id: '00000000-0000-4000-8000-00000000a031', name: 'M31' };
const M42 = { id: '00000000-0000-4000-8000-00000000a042', name: 'M42' };

function narrowbandRig(): RigInput {
  const rig = defaultRigInput();
  rig.filterWheel.slots = rig.filterWheel.slots.filter((s) => ['Ha', 'OIII', 'SII'].includes(s.band));
  return rig;
}

describe('emptyRecipe', () => {
  it('is a valid recipe with an empty tree', () => {
    expect(recipeSchema.parse(emptyRecipe())).toEqual({ name: 'New recipe', notes: '', rigId: null, siteId: null, tree: { children: [] } });
  });
});

describe('starterFilters', () => {
  it('LRGB when the wheel has broadband slots, else narrowband, else every slot', () => {
    expect(starterFilters(defaultRigInput())).toEqual(['L', 'R', 'G', 'B']);
    expect(starterFilters(narrowbandRig())).toEqual(['Ha', 'OIII', 'SII']);
    const custom = defaultRigInput();
    custom.filterWheel.slots = [{ name: 'UV/IR cut', band: 'custom', focusOffsetSteps: 0 }];
    expect(starterFilters(custom)).toEqual(['UV/IR cut']);
  });
});

describe('starterRecipe', () => {
  const rig = defaultRigInput();
  const recipe = starterRecipe({ rig, targets: [M31, M42], newId: sequentialIds() });

  it('cool → one stage per target → warm → park, and it parses', () => {
    expect(recipe.tree.children.map((n) => n.kind)).toEqual(['cool', 'stage', 'stage', 'warm', 'park']);
    expect(recipeSchema.parse(recipe)).toEqual(recipe);
    expect(recipe.name).toBe('Starter: M31, M42');
  });

  it('each stage: slew, centre, focus, guide, flip policy, repeat until below 30°; rules 1 °C and 60 min', () => {
    const stage = recipe.tree.children[1]!;
    if (stage.kind !== 'stage') throw new Error('not a stage');
    expect(stage.targetId).toBe(M31.id);
    expect(stage.window).toEqual({ notBefore: 'astronomical-dusk', endBy: 'astronomical-dawn', minAltitudeDeg: 30 });
    expect(stage.children.map((n) => summarizeNode(n))).toEqual([
      'Slew to the stage target',
      'Centre within 30″, up to 3 tries',
      'Focus with L: 9 points × 5 s, 50 steps apart',
      'Guide, settle within 1.5 px for 10 s, calibrate first',
      'Flip 5 min past the meridian, then recentre and refocus',
      'Repeat until the target sinks below 30°',
    ]);
    const repeat = stage.children[5]!;
    expect('children' in repeat && repeat.children.map((n) => summarizeNode(n))).toEqual(['L 5 × 180 s, bin 1, dither every frame', 'R 8 × 120 s, bin 1, dither every frame', 'G 8 × 120 s, bin 1, dither every frame', 'B 8 × 120 s, bin 1, dither every frame']);
    expect(stage.rules).toMatchObject([{ kind: 'refocus-on-temperature', deltaC: 1 }, { kind: 'refocus-on-interval', every: { minutes: 60 } }]);
  });

  it('passes the static checks on its own rig', () => {
    expect(checkRecipe(recipe.tree, { rig, site: { duskTempC: 10 } })).toEqual([]);
  });

  it('adds a rotate step with a rotator, leaves out guide and flip without a guider or on a fork mount', () => {
    const other = defaultRigInput();
    other.rotator.present = true;
    other.guider.present = false;
    other.mount.type = 'fork';
    const stage = starterRecipe({ rig: other, targets: [M31] }).tree.children[1]!;
    expect('children' in stage && stage.children.map((n) => n.kind)).toEqual(['slew', 'centre', 'rotate', 'focus', 'repeat']);
  });

  it('narrowband wheels get 300 s subs; no targets gives one stage to fill in', () => {
    const nb = starterRecipe({ rig: narrowbandRig(), targets: [] });
    expect(nb.name).toBe('Starter recipe');
    const rows = flattenTree(nb.tree);
    expect(rows.filter((r) => r.kind === 'stage')).toHaveLength(1);
    expect(JSON.stringify(nb.tree).match(/"exposureS":300/g)).toHaveLength(3);
    // Until the user picks a target, the checks say so.
    expect([...new Set(checkRecipe(nb.tree).map((f) => f.code))]).toEqual(['stage-no-target', 'no-target', 'endless-repeat']);
  });

  it('unique ids throughout', () => {
    const all = collectIds(recipe.tree);
    expect(new Set(all).size).toBe(all.length);
  });
});

describe('copyRecipe', () => {
  it('gives every node and rule a fresh id and keeps everything else', () => {
    const original = starterRecipe({ rig: defaultRigInput(), targets: [M31], newId: sequentialIds() }).tree;
    const copy = copyRecipe(original, sequentialIds(1000));
    const before = new Set(collectIds(original));
    const after = collectIds(copy);
    expect(after).toHaveLength(before.size);
    expect(after.some((id) => before.has(id))).toBe(false);
    const strip = (v: unknown) => JSON.stringify(v).replace(/"id":"[^"]+"/g, '"id":"…"');
    expect(strip(copy)).toBe(strip(original));
  });

  it('re-points flats at copied stages, also at stages later in the list', () => {
    const ids = sequentialIds();
    const stageId = ids();
    const tree = recipeSchema.shape.tree.parse({
      children: [
        { id: ids(), kind: 'flats', filters: ['L'], matchFramingOf: { kind: 'stage', stageId } },
        { id: stageId, kind: 'stage' },
        { id: ids(), kind: 'flats', filters: ['L'], matchFramingOf: { kind: 'stage', stageId } },
      ],
    });
    const copy = copyRecipe(tree, sequentialIds(50));
    const newStage = copy.children[1]!.id;
    expect(copy.children[0]).toMatchObject({ matchFramingOf: { stageId: newStage } });
    expect(copy.children[2]).toMatchObject({ matchFramingOf: { stageId: newStage } });
  });
});
