import AsyncStorage from '@react-native-async-storage/async-storage';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { Platform } from 'react-native';

import { palettes, type Palette } from '@/constants/theme';

const NIGHT_VIEW_KEY = 'nightloom.nightView';

type ThemeContextValue = {
  palette: Palette;
  nightView: boolean;
  setNightView: (on: boolean) => void;
  toggleNightView: () => void;
};

const ThemeContext = createContext<ThemeContextValue | null>(null);

/**
 * Holds the active palette and the red-only night view, persisted across visits.
 * Renders nothing until the stored choice is read, so a night-view user never sees a
 * flash of the brighter theme at the telescope.
 */
export function ThemeProvider({ children }: { children: ReactNode }) {
  const [nightView, setNightViewState] = useState(false);
  const [loaded, setLoaded] = useState(false);

  useEffect(() => {
    let cancelled = false;
    AsyncStorage.getItem(NIGHT_VIEW_KEY)
      .then((stored) => {
        if (!cancelled) setNightViewState(stored === 'true');
      })
      .catch(() => undefined)
      .finally(() => {
        if (!cancelled) setLoaded(true);
      });
    return () => {
      cancelled = true;
    };
  }, []);

  const setNightView = useCallback((on: boolean) => {
    setNightViewState(on);
    AsyncStorage.setItem(NIGHT_VIEW_KEY, on ? 'true' : 'false').catch(() => undefined);
  }, []);

  const toggleNightView = useCallback(() => {
    setNightViewState((current) => {
      const next = !current;
      AsyncStorage.setItem(NIGHT_VIEW_KEY, next ? 'true' : 'false').catch(() => undefined);
      return next;
    });
  }, []);

  const palette = nightView ? palettes.night : palettes.dark;

  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    // The page behind the app (overscroll, browser chrome) follows the palette too.
    document.body.style.backgroundColor = palette.background;
    document.documentElement.style.colorScheme = 'dark';
    document.querySelector('meta[name="theme-color"]')?.setAttribute('content', palette.background);
  }, [palette]);

  const value = useMemo(
    () => ({ palette, nightView, setNightView, toggleNightView }),
    [palette, nightView, setNightView, toggleNightView],
  );

  if (!loaded) return null;
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useTheme(): ThemeContextValue {
  const context = useContext(ThemeContext);
  if (!context) throw new Error('useTheme must be used inside ThemeProvider');
  return context;
}
