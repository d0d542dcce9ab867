import { Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

export type StartKind = 'empty' | 'starter' | 'copy';

const SOURCES: { kind: StartKind; title: string; text: string }[] = [
  { kind: 'empty', title: 'Empty', text: 'A blank recipe; add steps from the palette.' },
  { kind: 'starter', title: 'Starter', text: 'Cool, one stage per target with pointing and subs, then warm and park.' },
  { kind: 'copy', title: 'Copy', text: 'Start from one of your recipes, with fresh step ids.' },
];

/** Three large radio cards: how a new recipe starts. */
export function RecipeSourcePicker({ value, onChange }: { value: StartKind; onChange: (kind: StartKind) => void }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.group} role="radiogroup" accessibilityLabel="Start from">
      {SOURCES.map((s) => {
        const selected = s.kind === value;
        return (
          <Pressable
            key={s.kind}
            role="radio"
            aria-checked={selected}
            accessibilityLabel={s.title}
            accessibilityState={{ checked: selected }}
            onPress={() => onChange(s.kind)}
            testID={`recipe-new-${s.kind}`}
            style={({ hovered }: WebPressState) => [styles.card, hovered && styles.hover, selected && styles.selected]}
          >
            <View style={[styles.dot, selected && styles.dotOn]} />
            <View style={styles.text}>
              <AppText weight="semibold" tone={selected ? 'accent' : 'default'}>
                {s.title}
              </AppText>
              <AppText variant="small" tone="muted">
                {s.text}
              </AppText>
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    group: { gap: spacing.sm },
    card: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.md, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border, backgroundColor: c.background },
    hover: { borderColor: c.borderStrong },
    selected: { borderColor: c.accent, backgroundColor: c.accentSoft },
    dot: { width: 14, height: 14, marginTop: 4, borderRadius: radii.pill, borderWidth: 1.5, borderColor: c.textFaint },
    dotOn: { borderColor: c.accent, backgroundColor: c.accent },
    text: { flex: 1, gap: spacing.xxs },
  });
