import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { TextLink } from '@/components/ui/text-link';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

export function NotFoundScreen() {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.root}>
      <AppText variant="title" role="heading" aria-level={1}>
        Nothing here
      </AppText>
      <AppText tone="muted">This page does not exist.</AppText>
      <TextLink href="/" label="Go to Tonight" />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: spacing.md, backgroundColor: c.background, padding: spacing.xl },
  });
