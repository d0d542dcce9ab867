import { useMemo } from 'react';

import { useTheme } from '@/components/theme-provider';
import type { Palette } from '@/constants/theme';

/**
 * Builds a file's styles from the active palette. Each file keeps its
 * `makeStyles = (c: Palette) => StyleSheet.create(...)` at the bottom; this memoises it per palette.
 */
export function useThemedStyles<T>(factory: (palette: Palette) => T): T {
  const { palette } = useTheme();
  return useMemo(() => factory(palette), [factory, palette]);
}
