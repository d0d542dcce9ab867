import { fonts, typeScale, type Palette } from '@/constants/theme';

/**
 * The look every text input shares (type, colours, border, focus outline). Each input adds its
 * own size: a form field, a compact editor field, a table cell.
 */
export const inputSurface = (c: Palette) =>
  ({
    ...typeScale.body,
    fontFamily: fonts.regular,
    color: c.text,
    backgroundColor: c.surface,
    borderWidth: 1,
    borderColor: c.borderStrong,
    outlineColor: c.accent,
  }) as const;
