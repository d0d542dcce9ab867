/*
 * Event search: the dry run finds when a condition starts to hold (a target sinking below its
 * limit, the Sun crossing an altitude) by scanning at a coarse step and bisecting, instead of
 * stepping the night second by second (dry-run.md "Ephemeris").
 */

/** Bisection stops when the bracket is this narrow, milliseconds. */
export const SEARCH_TOLERANCE_MS = 250;

/**
 * The first instant in [fromMs, toMs] at which `holds` is true, within `SEARCH_TOLERANCE_MS`
 * (the returned instant is at or just after the true change), or null. Scans every `stepMs`
 * and bisects the first bracket that changes; a condition that holds and lets go again within
 * one step can be missed, so the step must be short against the phenomenon.
 */
export function firstWhere(fromMs: number, toMs: number, stepMs: number, holds: (ms: number) => boolean): number | null {
  if (holds(fromMs)) return fromMs;
  let a = fromMs;
  while (a < toMs) {
    const b = Math.min(a + stepMs, toMs);
    if (holds(b)) return bisect(a, b, holds);
    a = b;
  }
  return null;
}

function bisect(falseAt: number, trueAt: number, holds: (ms: number) => boolean): number {
  let lo = falseAt;
  let hi = trueAt;
  while (hi - lo > SEARCH_TOLERANCE_MS) {
    const mid = (lo + hi) / 2;
    if (holds(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}
