import { StyleSheet, Text, type TextProps } from 'react-native';

import { useThemedStyles } from '@/hooks/use-themed-styles';
import { fonts, typeScale, type Palette, type TypeVariant } from '@/constants/theme';

export type TextTone = 'default' | 'muted' | 'faint' | 'accent' | 'danger' | 'ok';
type Weight = 'regular' | 'semibold' | 'bold';

type AppTextProps = TextProps & {
  variant?: TypeVariant;
  tone?: TextTone;
  weight?: Weight;
  /** Tabular figures: for times, durations and coordinates that must line up. */
  tabular?: boolean;
  /** Small capitals-style label: uppercase with a little tracking. */
  eyebrow?: boolean;
};

/** Text in the app's type scale and palette. Weights map to the shipped Inter faces. */
export function AppText({ variant = 'body', tone = 'default', weight, tabular, eyebrow, style, ...rest }: AppTextProps) {
  const styles = useThemedStyles(makeStyles);
  const resolvedWeight: Weight = weight ?? (variant === 'title' || variant === 'heading' || variant === 'display' ? 'semibold' : 'regular');
  return (
    <Text
      {...rest}
      style={[
        styles.base,
        typeScale[variant],
        styles[tone],
        { fontFamily: fonts[resolvedWeight] },
        tabular && styles.tabular,
        eyebrow && styles.eyebrow,
        style,
      ]}
    />
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    base: { color: c.text },
    default: { color: c.text },
    muted: { color: c.textMuted },
    faint: { color: c.textFaint },
    accent: { color: c.accent },
    danger: { color: c.danger },
    ok: { color: c.ok },
    tabular: { fontVariant: ['tabular-nums'] },
    eyebrow: { textTransform: 'uppercase', letterSpacing: 0.8, fontSize: 11, lineHeight: 16 },
  });
