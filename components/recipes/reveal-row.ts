type ScrollableList = { scrollToIndex: (params: { index: number; viewPosition?: number; animated?: boolean }) => void } | null;

/** Brings a row into view (native: centre it; rows have a fixed height, so any index works). */
export function revealRow(_id: string, index: number, list: ScrollableList): void {
  if (index >= 0) list?.scrollToIndex({ index, viewPosition: 0.5, animated: true });
}
