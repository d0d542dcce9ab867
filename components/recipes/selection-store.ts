import { useSyncExternalStore, type ReactNode } from 'react';

/**
 * The selected row id outside React state, so a selection change re-renders only the two rows
 * whose "selected" flips (not every row of a 500-step list).
 */
export interface ValueStore<T> {
  get: () => T;
  set: (value: T) => void;
  subscribe: (listener: () => void) => () => void;
}

/** What the selected row shows inline on wide screens (its action buttons). */
export type SelectionStore = ValueStore<string | null> & { extras: ValueStore<ReactNode> };

function createValueStore<T>(initial: T): ValueStore<T> {
  let current = initial;
  const listeners = new Set<() => void>();
  return {
    get: () => current,
    set(id) {
      if (id === current) return;
      current = id;
      listeners.forEach((l) => l());
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => void listeners.delete(listener);
    },
  };
}

export function createSelectionStore(): SelectionStore {
  return { ...createValueStore<string | null>(null), extras: createValueStore<ReactNode>(null) };
}

/** True while `rowId` is the selected row. */
export function useIsSelected(store: SelectionStore, rowId: string): boolean {
  return useSyncExternalStore(store.subscribe, () => store.get() === rowId);
}

/** The selected row's extras; a store rather than a context, so a change reaches only that row. */
export function useSelectedRowExtras(store: SelectionStore): ReactNode {
  return useSyncExternalStore(store.extras.subscribe, store.extras.get);
}
