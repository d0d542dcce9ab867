import type { ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type CardProps = { children: ReactNode; style?: StyleProp<ViewStyle>; testID?: string; padded?: boolean };

/** A quiet raised surface for grouping content. */
export function Card({ children, style, testID, padded = true }: CardProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={[styles.card, padded && styles.padded, style]} testID={testID}>
      {children}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { backgroundColor: c.surface, borderColor: c.border, borderWidth: 1, borderRadius: radii.lg },
    padded: { padding: spacing.lg, gap: spacing.md },
  });
