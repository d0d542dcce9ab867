import { TARGET_KINDS, type TargetKind } from '@/shared/targets/schema';

/** Our names for the object kinds, as the chips and lists show them. */
export const KIND_LABELS: Record<TargetKind, string> = {
  galaxy: 'Galaxy',
  'emission-nebula': 'Emission nebula',
  'reflection-nebula': 'Reflection nebula',
  'planetary-nebula': 'Planetary nebula',
  'supernova-remnant': 'Supernova remnant',
  'dark-nebula': 'Dark nebula',
  'open-cluster': 'Open cluster',
  'globular-cluster': 'Globular cluster',
  'cluster-with-nebula': 'Cluster with nebula',
  'galaxy-group': 'Galaxy group',
  'star-cloud': 'Star cloud',
  asterism: 'Asterism',
  'double-star': 'Double star',
  other: 'Other',
};

/** The kinds in chip order: what is imaged most first. */
export const KIND_ORDER: readonly TargetKind[] = TARGET_KINDS;

export function kindLabel(kind: string): string {
  return KIND_LABELS[kind as TargetKind] ?? kind;
}
