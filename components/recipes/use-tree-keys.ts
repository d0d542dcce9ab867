import type { RefObject } from 'react';

import type { TreeKeyActions } from '@/components/recipes/tree-keys';

/** Native has no hardware-keyboard shortcuts in the composer; the row buttons do everything. */
export function useTreeKeys(_treeRef: RefObject<unknown>, _actions: TreeKeyActions, _hasSelection: boolean): void {}
