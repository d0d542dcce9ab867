import type { NodeKind } from '@/shared/recipe/types';

/** The palette, in the order a night runs. */
export const PALETTE_GROUPS: { key: string; label: string; kinds: NodeKind[] }[] = [
  { key: 'setup', label: 'Set-up', kinds: ['cool', 'guide', 'wait', 'note'] },
  { key: 'pointing', label: 'Pointing', kinds: ['slew', 'centre', 'rotate', 'focus', 'meridian'] },
  { key: 'capture', label: 'Capture', kinds: ['stage', 'repeat', 'group', 'expose'] },
  { key: 'calibration', label: 'Calibration', kinds: ['flats', 'darks'] },
  { key: 'end', label: 'End of night', kinds: ['warm', 'park'] },
];
