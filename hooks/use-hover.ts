import { useState } from 'react';

/**
 * Hover state for pressables rendered through `Link asChild`, which drops function styles.
 * Spread the handlers onto the Pressable.
 */
export function useHover() {
  const [hovered, setHovered] = useState(false);
  return { hovered, handlers: { onHoverIn: () => setHovered(true), onHoverOut: () => setHovered(false) } };
}
