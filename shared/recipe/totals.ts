import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

export interface FrameTotal {
  frames: number;
  /** Planned shutter-open time, seconds. */
  shutterS: number;
}

export interface RecipeTotals {
  /** Light frames by filter (as the steps name it). */
  lights: Record<string, FrameTotal>;
  /** Light frames by stage target id ('' outside a stage or in a stage without a target), then filter. */
  lightsByTarget: Record<string, Record<string, FrameTotal>>;
  lightFrames: number;
  lightShutterS: number;
  darks: FrameTotal;
  flatFrames: number;
  /** Switched-on repeats with no count: their contents are counted once. */
  openEndedRepeatIds: string[];
  /** True when some frames sit inside an open-ended repeat, so the totals are a floor. */
  atLeast: boolean;
}

const add = (map: Map<string, FrameTotal>, key: string, frames: number, shutterS: number) => {
  const t = map.get(key) ?? { frames: 0, shutterS: 0 };
  map.set(key, { frames: t.frames + frames, shutterS: t.shutterS + shutterS });
};

/**
 * Planned frames and shutter-open seconds of a recipe, switched-off nodes left out. A repeat
 * with a count multiplies its contents; an open-ended repeat (clock, altitude, sun event)
 * counts them once and is listed, since only the dry run knows how often it loops.
 */
export function totals(tree: RecipeTree): RecipeTotals {
  const lights = new Map<string, FrameTotal>();
  const byTarget = new Map<string, Map<string, FrameTotal>>();
  const darks = { frames: 0, shutterS: 0 };
  const out = { flatFrames: 0, atLeast: false, openEndedRepeatIds: [] as string[] };
  const visit = (children: RecipeNode[], mult: number, open: boolean, target: string) => {
    for (const node of children) {
      if (!node.enabled) continue;
      if (node.kind === 'stage') visit(node.children, mult, open, node.targetId ?? '');
      else if (node.kind === 'group') visit(node.children, mult, open, target);
      else if (node.kind === 'repeat') {
        const count = node.until.count;
        if (count === undefined) out.openEndedRepeatIds.push(node.id);
        visit(node.children, mult * (count ?? 1), open || count === undefined, target);
      } else if (node.kind === 'expose') {
        const frames = node.count * mult;
        add(lights, node.filter, frames, frames * node.exposureS);
        if (!byTarget.has(target)) byTarget.set(target, new Map());
        add(byTarget.get(target)!, node.filter, frames, frames * node.exposureS);
        out.atLeast ||= open;
      } else if (node.kind === 'darks') {
        darks.frames += node.count * node.exposuresS.length * mult;
        darks.shutterS += node.count * node.exposuresS.reduce((a, b) => a + b, 0) * mult;
        out.atLeast ||= open;
      } else if (node.kind === 'flats') {
        out.flatFrames += node.count * node.filters.length * mult;
        out.atLeast ||= open;
      }
    }
  };
  visit(tree.children, 1, false, '');
  const lightList = [...lights.values()];
  return {
    lights: Object.fromEntries(lights),
    lightsByTarget: Object.fromEntries([...byTarget].map(([k, v]) => [k, Object.fromEntries(v)])),
    lightFrames: lightList.reduce((a, t) => a + t.frames, 0),
    lightShutterS: lightList.reduce((a, t) => a + t.shutterS, 0),
    darks,
    ...out,
  };
}

/** Target ids of every stage (switched off or not), first appearance first, without repeats. */
export function targetIds(tree: RecipeTree): string[] {
  const ids = new Set<string>();
  const visit = (children: RecipeNode[]) => {
    for (const node of children) {
      if (node.kind === 'stage' && node.targetId !== null) ids.add(node.targetId);
      if ('children' in node) visit(node.children);
    }
  };
  visit(tree.children);
  return [...ids];
}
