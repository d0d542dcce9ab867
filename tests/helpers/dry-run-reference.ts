import { createNode, type NodeParams } from '@/shared/recipe/factory';
import { sequentialIds } from '@/shared/recipe/ids';
import type { NodeKind, NodeOf, RecipeNode, RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import type { DryRunInput, DryRunSite, DryRunTarget } from '@/shared/dry-run/types';

/*
 * A reference night for the bench and the tests: a field site in central Europe, the default rig
 * (trade-defaults.md values) and eight autumn targets with published J2000 positions.
 * Eight stages of short subs give more than 1,000 frames in a ten-hour dark window.
 */

export const REFERENCE_SITE: DryRunSite = {
  latitudeDeg: 46.93,
  longitudeDeg: 7.62,
  elevationM: 870,
  timeZone: 'Europe/Zurich',
  horizon: [
    { azDeg: 0, altDeg: 12 },
    { azDeg: 90, altDeg: 8 },
    { azDeg: 180, altDeg: 6 },
    { azDeg: 270, altDeg: 15 },
  ],
  minAltitudeDeg: 30,
  duskTempC: 10,
  dawnTempC: 4,
};

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

/** J2000 positions (degrees) of the reference targets, rounded from the published catalogue values. */
export const REFERENCE_TARGETS: Record<string, DryRunTarget> = {
  [id(9001)]: { designation: 'NGC 6960', name: 'Western Veil', raDeg: 311.43, decDeg: 30.72 },
  [id(9002)]: { designation: 'NGC 7000', name: 'North America Nebula', raDeg: 314.7, decDeg: 44.33 },
  [id(9003)]: { designation: 'NGC 281', name: 'Pacman Nebula', raDeg: 13.2, decDeg: 56.62 },
  [id(9004)]: { designation: 'M31', name: 'Andromeda Galaxy', raDeg: 10.68, decDeg: 41.27, framings: [{ raDeg: 10.68, decDeg: 41.27, positionAngleDeg: 35 }] },
  [id(9005)]: { designation: 'M33', name: 'Triangulum Galaxy', raDeg: 23.46, decDeg: 30.66 },
  [id(9006)]: { designation: 'IC 1805', name: 'Heart Nebula', raDeg: 38.2, decDeg: 61.45 },
  [id(9007)]: { designation: 'M45', name: 'Pleiades', raDeg: 56.75, decDeg: 24.12 },
  [id(9008)]: { designation: 'M42', name: 'Orion Nebula', raDeg: 83.82, decDeg: -5.39 },
};

/** A tiny recipe builder over `createNode` with deterministic ids. */
export function recipeBuilder(start = 1) {
  const newId = sequentialIds(start);
  const node = <K extends NodeKind>(kind: K, params: NodeParams<K> = {}): NodeOf<K> => createNode(kind, params, { newId });
  const container = <K extends 'stage' | 'repeat' | 'group'>(kind: K, params: NodeParams<K>, children: RecipeNode[]) => ({ ...node(kind, params), children }) as NodeOf<K>;
  return { node, container, newId };
}

type Builder = ReturnType<typeof recipeBuilder>;

/** One imaging stage: slew, centre, focus, guide, flip policy, then a repeat of filter blocks until the window ends. */
export function imagingStage(b: Builder, targetId: string, window: NodeParams<'stage'>['window'], blocks: { filter: string; exposureS: number; count: number }[], until: NodeParams<'repeat'>['until'] = { sunEvent: 'astronomical-dawn' }): NodeOf<'stage'> {
  const exposes = blocks.map((x) => b.node('expose', { ...x, ditherEvery: 4 }));
  const stage = b.container('stage', { targetId, window }, [
    b.node('slew'),
    b.node('centre'),
    b.node('focus', { filter: blocks[0]?.filter }),
    b.node('guide'),
    b.node('meridian', { policy: { kind: 'flip', flipAfterMin: 5, refocus: true, recentre: true } }),
    b.container('repeat', { until }, exposes),
  ]);
  return { ...stage, rules: [{ id: b.newId(), kind: 'refocus-on-temperature', deltaC: 1 }] };
}

/** The bench's reference recipe: cool, eight stages in clock windows of 20–45 s subs, warm, park. */
export function referenceTree(): RecipeTree {
  const b = recipeBuilder();
  const ids = Object.keys(REFERENCE_TARGETS);
  const windows: [string, string][] = [['astronomical-dusk', '21:40'], ['21:40', '22:50'], ['22:50', '23:50'], ['23:50', '00:50'], ['00:50', '01:50'], ['01:50', '03:00'], ['03:00', '04:20'], ['04:20', 'astronomical-dawn']];
  const narrow = [{ filter: 'Ha', exposureS: 45, count: 8 }, { filter: 'OIII', exposureS: 45, count: 8 }];
  const broad = [{ filter: 'L', exposureS: 20, count: 16 }, { filter: 'R', exposureS: 20, count: 8 }, { filter: 'G', exposureS: 20, count: 8 }, { filter: 'B', exposureS: 20, count: 8 }];
  const stages = windows.map(([notBefore, endBy], i) => imagingStage(b, ids[i]!, { notBefore, endBy }, i % 3 === 0 ? narrow : broad));
  return { children: [b.node('cool', { setpointC: -10 }), ...stages, b.node('warm'), b.node('park')] };
}

/** The reference dry-run input for a night (default 2026-10-12: about ten hours of astronomical darkness). */
export function referenceInput(nightDate = '2026-10-12', rig: RigInput = defaultRigInput()): DryRunInput {
  return { tree: referenceTree(), rig, site: REFERENCE_SITE, nightDate, targets: REFERENCE_TARGETS, darkLibrary: [] };
}
