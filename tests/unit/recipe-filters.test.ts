import { describe, expect, it } from 'vitest';
import { bandFromName, bandOfFilter, defaultExposureForFilter, findSlotByBand, findSlotByName, mapFiltersToRig, resolveFilter } from '@/shared/recipe/filters';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import { sequentialIds } from '@/shared/recipe/ids';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';

function rigWith(slots: RigInput['filterWheel']['slots']): RigInput {
  const rig = defaultRigInput();
  rig.filterWheel.slots = slots;
  return rig;
}

const rig = rigWith([
  { name: 'Lum', band: 'L', focusOffsetSteps: 0 },
  { name: 'Astro Ha 7nm', band: 'Ha', focusOffsetSteps: 12 },
  { name: 'Dual band', band: 'custom', focusOffsetSteps: 0 },
]);

describe('filters', () => {
  it('finds a slot by name (case and spaces ignored) or by band', () => {
    expect(findSlotByName(rig, ' lum ')?.name).toBe('Lum');
    expect(findSlotByName(rig, 'Ha')).toBeUndefined();
    expect(findSlotByBand(rig, 'Ha')?.name).toBe('Astro Ha 7nm');
    expect(findSlotByBand(rig, 'OIII')).toBeUndefined();
  });

  it('reads bands from common spellings', () => {
    expect(['L', 'Luminance', 'H-alpha', 'O3', 'S2', 'red', 'Dual band'].map(bandFromName)).toEqual(['L', 'L', 'Ha', 'OIII', 'SII', 'R', 'custom']);
  });

  it('resolves a reference by name first, then by band', () => {
    expect(resolveFilter(rig, 'Dual band')?.name).toBe('Dual band');
    expect(resolveFilter(rig, 'Ha')?.name).toBe('Astro Ha 7nm');
    expect(resolveFilter(rig, 'L')?.name).toBe('Lum');
    expect(resolveFilter(rig, 'OIII')).toBeUndefined();
    expect(bandOfFilter('Astro Ha 7nm', rig)).toBe('Ha');
    expect(bandOfFilter('Astro Ha 7nm')).toBe('custom');
  });

  it('default sub length follows the band (trade-defaults.md: L 180 s, RGB 120 s, narrowband 300 s)', () => {
    expect(defaultExposureForFilter('Astro Ha 7nm', rig)).toBe(300);
    expect(defaultExposureForFilter('G')).toBe(120);
    expect(defaultExposureForFilter('Dual band', rig)).toBe(180);
  });

  it("maps a template's band names onto a rig's slots and lists what it cannot map", () => {
    const ids = sequentialIds();
    const template = recipeTreeSchema.parse({
      children: [
        { id: ids(), kind: 'group', children: [{ id: ids(), kind: 'expose', filter: 'Ha', exposureS: 300, count: 5 }, { id: ids(), kind: 'focus', filter: 'L' }, { id: ids(), kind: 'centre' }] },
        { id: ids(), kind: 'flats', filters: ['Ha', 'OIII'] },
      ],
    });
    const { tree, unresolved } = mapFiltersToRig(template, rig);
    expect(JSON.stringify(tree)).toContain('"filter":"Astro Ha 7nm"');
    expect(JSON.stringify(tree)).toContain('"filter":"Lum"');
    expect(tree.children[1]).toMatchObject({ filters: ['Astro Ha 7nm', 'OIII'] });
    expect(unresolved).toEqual(['OIII']);
  });
});
