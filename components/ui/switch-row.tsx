import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type SwitchRowProps = {
  label: string;
  description?: string;
  value: boolean;
  onValueChange: (next: boolean) => void;
  testID?: string;
  disabled?: boolean;
};

/** A whole-row switch (role "switch", name = label) drawn in the palette, also in the night view. */
export function SwitchRow({ label, description, value, onValueChange, testID, disabled }: SwitchRowProps) {
  const styles = useThemedStyles(makeStyles);
  return (
    <Pressable
      role="switch"
      aria-checked={value}
      accessibilityLabel={label}
      accessibilityState={{ checked: value, disabled: !!disabled }}
      disabled={disabled}
      onPress={() => onValueChange(!value)}
      testID={testID}
      style={({ hovered }: WebPressState) => [styles.row, hovered && styles.rowHover]}
    >
      <View style={styles.text}>
        <AppText weight="semibold">{label}</AppText>
        {description ? (
          <AppText variant="small" tone="muted">
            {description}
          </AppText>
        ) : null}
      </View>
      <View style={[styles.track, value && styles.trackOn]}>
        <View style={[styles.thumb, value && styles.thumbOn]} />
      </View>
    </Pressable>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: {
      flexDirection: 'row',
      alignItems: 'center',
      gap: spacing.lg,
      paddingVertical: spacing.sm,
      paddingHorizontal: spacing.sm,
      marginHorizontal: -spacing.sm,
      borderRadius: radii.md,
    },
    rowHover: { backgroundColor: c.surfaceRaised },
    text: { flex: 1, gap: spacing.xxs },
    track: {
      width: 44,
      height: 26,
      borderRadius: radii.pill,
      backgroundColor: c.surfaceRaised,
      borderWidth: 1,
      borderColor: c.borderStrong,
      padding: 2,
      justifyContent: 'center',
    },
    trackOn: { backgroundColor: c.accentSoft, borderColor: c.accent },
    thumb: { width: 20, height: 20, borderRadius: radii.pill, backgroundColor: c.textMuted },
    thumbOn: { backgroundColor: c.accent, transform: [{ translateX: 18 }] },
  });
