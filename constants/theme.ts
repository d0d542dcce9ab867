/**
 * Design tokens. Two palettes with the same keys: the default low-glare dark theme and the
 * red-only night view (every colour a shade of red on black, to keep dark-adapted eyes intact).
 */
export type Palette = {
  background: string;
  surface: string;
  surfaceRaised: string;
  border: string;
  borderStrong: string;
  text: string;
  textMuted: string;
  textFaint: string;
  accent: string;
  accentSoft: string;
  onAccent: string;
  danger: string;
  dangerSoft: string;
  ok: string;
  okSoft: string;
  /** Night band: the Sun's altitude bands, brightest to darkest. */
  skyDay: string;
  skyCivil: string;
  skyNautical: string;
  skyAstronomical: string;
  skyDark: string;
  moon: string;
  nowMarker: string;
  scrim: string;
};

const darkPalette: Palette = {
  background: '#070b14',
  surface: '#0c1320',
  surfaceRaised: '#121b2c',
  border: '#1c2638',
  borderStrong: '#2a3750',
  text: '#d9dee8',
  textMuted: '#8c96aa',
  textFaint: '#5c6679',
  accent: '#e3a352',
  accentSoft: 'rgba(227, 163, 82, 0.14)',
  onAccent: '#1b1207',
  danger: '#e2705f',
  dangerSoft: 'rgba(226, 112, 95, 0.13)',
  ok: '#7cc49a',
  okSoft: 'rgba(124, 196, 154, 0.13)',
  skyDay: '#4d6588',
  skyCivil: '#35496b',
  skyNautical: '#233251',
  skyAstronomical: '#151f37',
  skyDark: '#05080f',
  moon: '#cfc8b2',
  nowMarker: '#e3a352',
  scrim: 'rgba(3, 5, 10, 0.7)',
};

const nightPalette: Palette = {
  background: '#000000',
  surface: '#0c0000',
  surfaceRaised: '#150101',
  border: '#2a0503',
  borderStrong: '#420a06',
  text: '#e0321f',
  textMuted: '#a82416',
  textFaint: '#6c170e',
  accent: '#ff3a22',
  accentSoft: 'rgba(255, 40, 20, 0.14)',
  onAccent: '#000000',
  danger: '#ff5a3c',
  dangerSoft: 'rgba(255, 60, 30, 0.16)',
  ok: '#c42a18',
  okSoft: 'rgba(196, 42, 24, 0.14)',
  skyDay: '#5e0f07',
  skyCivil: '#470b05',
  skyNautical: '#300703',
  skyAstronomical: '#1c0402',
  skyDark: '#000000',
  moon: '#b8301d',
  nowMarker: '#ff3a22',
  scrim: 'rgba(0, 0, 0, 0.75)',
};

export const palettes = { dark: darkPalette, night: nightPalette } as const;

export const spacing = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radii = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

export const fonts = {
  regular: 'Inter_400Regular',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
} as const;

export const typeScale = {
  caption: { fontSize: 12, lineHeight: 16 },
  small: { fontSize: 13, lineHeight: 18 },
  body: { fontSize: 15, lineHeight: 22 },
  lead: { fontSize: 17, lineHeight: 24 },
  title: { fontSize: 20, lineHeight: 26 },
  heading: { fontSize: 26, lineHeight: 32 },
  display: { fontSize: 32, lineHeight: 38 },
} as const;
export type TypeVariant = keyof typeof typeScale;

/** Widest the readable content gets on large screens. */
export const maxContentWidth = 1080;
/** Forms stay narrow even on wide screens. */
export const maxFormWidth = 560;
/** Width of the side rail on wide screens. */
export const railWidth = 224;
/** Height of the bottom tab bar, without the safe-area inset. */
export const tabBarHeight = 60;
