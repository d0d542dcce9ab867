import { defaultExposureForFilter } from '@/shared/recipe/filters';
import { defaultNewId, type NewId } from '@/shared/recipe/ids';
import { nodeSchema } from '@/shared/recipe/schema';
import type { NodeKind, NodeOf, RecipeNodeInput } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

type InputOf<K extends NodeKind> = Extract<RecipeNodeInput, { kind: K }>;
/** Parameters of a new node; `id` and `kind` come from `createNode`. */
export type NodeParams<K extends NodeKind> = Partial<Omit<InputOf<K>, 'kind' | 'id'>>;

/**
 * Starting values for the parameters that have no context-free default (RECIPE_DEFAULTS
 * covers the rest through the schema). Nightloom choices where the design is silent: a new
 * repeat runs until astronomical dawn (product.md: "until darkness ends"), a new wait waits
 * for astronomical dusk, new darks are one 300 s set (the narrowband sub length).
 */
function required(kind: NodeKind, filter: string, rig?: Pick<RigInput, 'filterWheel'>): Record<string, unknown> {
  switch (kind) {
    case 'repeat':
      return { until: { sunEvent: 'astronomical-dawn' } };
    case 'slew':
      return { to: { kind: 'stage-target' } };
    case 'rotate':
      return { to: { matchFraming: true } };
    case 'expose': {
      const exposureS = defaultExposureForFilter(filter, rig);
      // About 15 minutes of one filter per block (Nightloom choice): a passing cloud costs a block, not the night.
      return { filter, exposureS, count: Math.max(1, Math.round(900 / exposureS)) };
    }
    case 'meridian':
      return { policy: { kind: 'flip' } };
    case 'wait':
      return { until: { sunEvent: 'astronomical-dusk' } };
    case 'flats':
      return { filters: [filter] };
    case 'darks':
      return { exposuresS: [300] };
    case 'note':
      return { text: 'Note' };
    default:
      return {};
  }
}

/**
 * A new node of a kind with its defaults (trade-defaults.md via RECIPE_DEFAULTS) and the given
 * parameters on top. Throws a ZodError when the parameters are invalid.
 */
export function createNode<K extends NodeKind>(kind: K, params: NodeParams<K> = {}, opts: { newId?: NewId; rig?: Pick<RigInput, 'filterWheel'> } = {}): NodeOf<K> {
  const p = params as Record<string, unknown>;
  const filter = typeof p.filter === 'string' ? p.filter : (opts.rig?.filterWheel.slots[0]?.name ?? 'L');
  const id = (opts.newId ?? defaultNewId)();
  return nodeSchema.parse({ ...required(kind, filter, opts.rig), ...params, id, kind }) as NodeOf<K>;
}
