import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type Segment<K extends string> = { key: K; label: string; testID?: string };

type SegmentedProps<K extends string> = {
  segments: Segment<K>[];
  value: K;
  onChange: (key: K) => void;
  accessibilityLabel: string;
};

/** Two or three equal tabs in one pill: the phone's switch between the parts of a screen. */
export function Segmented<K extends string>({ segments, value, onChange, accessibilityLabel }: SegmentedProps<K>) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.track} role="tablist" accessibilityLabel={accessibilityLabel}>
      {segments.map((s) => {
        const selected = s.key === value;
        return (
          <Pressable
            key={s.key}
            role="tab"
            aria-selected={selected}
            accessibilityLabel={s.label}
            accessibilityState={{ selected }}
            onPress={() => onChange(s.key)}
            testID={s.testID}
            style={({ hovered }: WebPressState) => [styles.segment, hovered && !selected && styles.hover, selected && styles.selected]}
          >
            <AppText variant="small" weight="semibold" tone={selected ? 'default' : 'muted'}>
              {s.label}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    track: {
      flexDirection: 'row',
      backgroundColor: c.surface,
      borderWidth: 1,
      borderColor: c.border,
      borderRadius: radii.md,
      padding: spacing.xxs + 1,
      gap: spacing.xxs,
    },
    segment: { flex: 1, minHeight: 36, alignItems: 'center', justifyContent: 'center', borderRadius: radii.sm },
    hover: { backgroundColor: c.surfaceRaised },
    selected: { backgroundColor: c.surfaceRaised, borderWidth: 1, borderColor: c.borderStrong },
  });
