import { useWindowDimensions } from 'react-native';

/** Widths in px where the layout changes. */
export const breakpoints = { tablet: 600, wide: 900, extraWide: 1280 } as const;

/** Named layout booleans; phone first, so everything below `tablet` is a phone. */
export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return {
    width,
    isPhone: width < breakpoints.tablet,
    isTablet: width >= breakpoints.tablet,
    isWide: width >= breakpoints.wide,
    isExtraWide: width >= breakpoints.extraWide,
  };
}
