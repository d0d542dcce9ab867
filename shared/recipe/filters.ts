import { defaultExposureS } from '@/shared/recipe/defaults';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { FILTER_BANDS, type FilterBand, type FilterSlot, type RigInput } from '@/shared/rig/schema';

/*
 * Steps name filters by the name of a slot in the rig's wheel. A template shared in a club may
 * name a band instead ("Ha"); these helpers map such names onto a given rig.
 */

type Wheel = Pick<RigInput, 'filterWheel'>;

const norm = (s: string) => s.trim().toLowerCase();

/** The slot with this name (case and surrounding spaces ignored). */
export function findSlotByName(rig: Wheel, name: string): FilterSlot | undefined {
  const wanted = norm(name);
  return rig.filterWheel.slots.find((s) => norm(s.name) === wanted);
}

/** The first slot of a band, in wheel order. */
export function findSlotByBand(rig: Wheel, band: FilterBand): FilterSlot | undefined {
  return rig.filterWheel.slots.find((s) => s.band === band);
}

/** Common spellings of each band in filter names and templates (lower case). */
const BAND_ALIASES: Record<Exclude<FilterBand, 'custom'>, string[]> = {
  L: ['l', 'lum', 'luminance', 'clear'],
  R: ['r', 'red'],
  G: ['g', 'green'],
  B: ['b', 'blue'],
  Ha: ['ha', 'h-alpha', 'halpha', 'h alpha', 'hα', 'h-a'],
  OIII: ['oiii', 'o3', 'o-iii', 'o iii'],
  SII: ['sii', 's2', 's-ii', 's ii'],
};

/** The band a filter name spells, e.g. "Lum" → L, "H-alpha" → Ha; 'custom' when unknown. */
export function bandFromName(name: string): FilterBand {
  const wanted = norm(name);
  for (const band of FILTER_BANDS) {
    if (band !== 'custom' && BAND_ALIASES[band].includes(wanted)) return band;
  }
  return 'custom';
}

/**
 * The rig's slot for a filter reference: by slot name first, then by the band the reference
 * spells ("Ha" finds a slot named "Astro Ha 7nm" whose band is Ha).
 */
export function resolveFilter(rig: Wheel, ref: string): FilterSlot | undefined {
  const byName = findSlotByName(rig, ref);
  if (byName) return byName;
  const band = bandFromName(ref);
  return band === 'custom' ? undefined : findSlotByBand(rig, band);
}

/** The band of a filter reference: the rig's slot band when known, else the name's spelling. */
export function bandOfFilter(ref: string, rig?: Wheel): FilterBand {
  const slot = rig ? resolveFilter(rig, ref) : undefined;
  return slot ? slot.band : bandFromName(ref);
}

/** Default sub length for a filter reference, by its band (trade-defaults.md "exposure"). */
export function defaultExposureForFilter(ref: string, rig?: Wheel): number {
  return defaultExposureS(bandOfFilter(ref, rig));
}

/** Every filter a node refers to (expose, centre, focus, flats). */
export function filtersOfNode(node: RecipeNode): string[] {
  switch (node.kind) {
    case 'expose':
      return [node.filter];
    case 'centre':
    case 'focus':
      return node.filter === undefined ? [] : [node.filter];
    case 'flats':
      return node.filters;
    default:
      return [];
  }
}

/**
 * A template's filter references rewritten to this rig's slot names (by name, then by band).
 * References no slot matches stay as they are and are listed in `unresolved`.
 */
export function mapFiltersToRig(tree: RecipeTree, rig: Wheel): { tree: RecipeTree; unresolved: string[] } {
  const unresolved = new Set<string>();
  const map = (ref: string) => {
    const slot = resolveFilter(rig, ref);
    if (!slot) unresolved.add(ref);
    return slot ? slot.name : ref;
  };
  const visit = (node: RecipeNode): RecipeNode => {
    switch (node.kind) {
      case 'expose':
        return { ...node, filter: map(node.filter) };
      case 'centre':
      case 'focus':
        return node.filter === undefined ? node : { ...node, filter: map(node.filter) };
      case 'flats':
        return { ...node, filters: node.filters.map(map) };
      case 'stage':
      case 'repeat':
      case 'group':
        return { ...node, children: node.children.map(visit) };
      default:
        return node;
    }
  };
  return { tree: { ...tree, children: tree.children.map(visit) }, unresolved: [...unresolved] };
}
