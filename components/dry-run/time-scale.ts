/** A linear time axis: instants in ms to px between `left` and `right`. */
export type TimeScale = { startMs: number; endMs: number; left: number; right: number };

export function xAt(scale: TimeScale, ms: number): number {
  const span = scale.endMs - scale.startMs || 1;
  return scale.left + ((ms - scale.startMs) / span) * (scale.right - scale.left);
}

export function msAt(scale: TimeScale, x: number): number {
  const width = scale.right - scale.left || 1;
  return scale.startMs + ((x - scale.left) / width) * (scale.endMs - scale.startMs);
}

/**
 * Width of a time chart: the space there is, or more (then it scrolls sideways) so an hour
 * never gets fewer than `minPxPerHour`.
 */
export function chartWidth(spanMs: number, availablePx: number, minPxPerHour: number): number {
  const hours = spanMs / 3_600_000;
  return Math.max(Math.round(availablePx), Math.ceil(hours * minPxPerHour));
}

/** The tick spacing in whole hours that keeps labels at least `minGapPx` apart. */
export function tickEveryHours(spanMs: number, widthPx: number, minGapPx: number): number {
  const pxPerHour = widthPx / Math.max(1e-9, spanMs / 3_600_000);
  return [1, 2, 3, 4, 6, 12].find((h) => pxPerHour * h >= minGapPx) ?? 12;
}

/**
 * A block's drawn rectangle: at least `minPx` wide (centred on the event) so a 20-second slew
 * still shows, and clamped to the axis.
 */
export function blockBox(scale: TimeScale, startMs: number, endMs: number, minPx: number): { x: number; width: number } {
  const x1 = xAt(scale, startMs);
  const x2 = xAt(scale, endMs);
  const width = Math.max(minPx, x2 - x1);
  const x = Math.min(Math.max(scale.left, (x1 + x2) / 2 - width / 2), scale.right - width);
  return { x, width };
}

/**
 * Rows for labels along an axis: a label closer than `minGapPx` to the previous one on the
 * same row moves to the next row (up to `rows`), so close marks (dawn and the recipe's end) stay readable.
 */
export function labelRows(xs: readonly number[], minGapPx: number, rows = 2): number[] {
  const lastX: number[] = Array.from({ length: rows }, () => Number.NEGATIVE_INFINITY);
  return xs.map((x) => {
    const row = lastX.findIndex((prev) => x - prev >= minGapPx);
    const chosen = row === -1 ? rows - 1 : row;
    lastX[chosen] = x;
    return chosen;
  });
}
