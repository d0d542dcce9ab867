/**
 * A pure undo/redo history: the present value with the values before it (`past`, oldest first)
 * and the undone values after it (`future`, next redo first). Every function returns a new
 * history and leaves its argument untouched, so a reducer can hold one.
 */
export interface History<T> {
  past: readonly T[];
  present: T;
  future: readonly T[];
  /** Most undo steps kept; the oldest fall off. */
  limit: number;
}

/** Undo steps the composer keeps (older edits fall off the bottom). */
export const HISTORY_LIMIT = 200;

/** A history holding only `present`: nothing to undo or redo. */
export function createHistory<T>(present: T, limit = HISTORY_LIMIT): History<T> {
  return { past: [], present, future: [], limit: Math.max(0, Math.trunc(limit)) };
}

/**
 * Records a new present. The old present becomes undoable and the redo stack is dropped (a new
 * branch); pushing the very same value changes nothing.
 */
export function push<T>(history: History<T>, next: T): History<T> {
  if (Object.is(next, history.present)) return history;
  const past = [...history.past, history.present];
  const overflow = past.length - history.limit;
  return { ...history, past: overflow > 0 ? past.slice(overflow) : past, present: next, future: [] };
}

/** Steps back one value; unchanged when there is nothing to undo. */
export function undo<T>(history: History<T>): History<T> {
  if (history.past.length === 0) return history;
  const previous = history.past[history.past.length - 1] as T;
  return { ...history, past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future] };
}

/** Steps forward one undone value; unchanged when there is nothing to redo. */
export function redo<T>(history: History<T>): History<T> {
  if (history.future.length === 0) return history;
  const [next, ...rest] = history.future as [T, ...T[]];
  return { ...history, past: [...history.past, history.present], present: next, future: rest };
}

/** Swaps the present in place without an undo step (e.g. the server's copy after a save). */
export function replacePresent<T>(history: History<T>, present: T): History<T> {
  return Object.is(present, history.present) ? history : { ...history, present };
}

export const canUndo = (history: History<unknown>): boolean => history.past.length > 0;
export const canRedo = (history: History<unknown>): boolean => history.future.length > 0;
