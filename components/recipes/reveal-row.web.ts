type ScrollableList = { scrollToIndex: (params: { index: number; viewPosition?: number; animated?: boolean }) => void } | null;

/**
 * Brings a row into view only when it is not already: the browser's `scrollIntoView` with
 * "nearest" leaves a visible row alone; a row outside the rendered window is scrolled to.
 */
export function revealRow(id: string, index: number, list: ScrollableList): void {
  const el = document.getElementById(`step-${id}`);
  if (el) el.scrollIntoView({ block: 'nearest' });
  else if (index >= 0) list?.scrollToIndex({ index, viewPosition: 0.5, animated: false });
}
