import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

/** The standing caution under the night: the product plans, it does not make a rig safe. */
export function SafetyNote() {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.note} testID="safety-note">
      <AppText variant="small" tone="faint">
        Nightloom plans; it does not make a rig safe. Never point optics at or near the Sun. Follow local rules and the makers&apos; manuals.
      </AppText>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    note: { borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: c.border, paddingTop: spacing.md },
  });
