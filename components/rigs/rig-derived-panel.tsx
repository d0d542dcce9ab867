import { StyleSheet, View } from 'react-native';

import { deriveRig } from '@/components/rigs/rig-derived';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import type { RigFormState } from '@/hooks/use-rig-form';
import { spacing, type Palette } from '@/constants/theme';

/**
 * What the rig's numbers mean on the sky, recomputed on every keystroke from the shared optics
 * formulas. A value needing an input that is not valid yet shows a dash.
 */
export function RigDerivedPanel({ form }: { form: RigFormState }) {
  const styles = useThemedStyles(makeStyles);
  const items = deriveRig(form.input, form.clientErrors);
  return (
    <Card testID="rig-derived" style={styles.card}>
      <AppText eyebrow tone="faint" weight="semibold" role="heading" aria-level={2}>
        Derived
      </AppText>
      {items.map((item) => (
        <View key={item.key} style={styles.item}>
          <View style={styles.line}>
            <AppText variant="small" tone="muted" style={styles.label}>
              {item.label}
            </AppText>
            <AppText weight="semibold" tabular testID={`rig-derived-${item.key}`} style={styles.value}>
              {item.value ?? '—'}
            </AppText>
          </View>
          {item.detail ? (
            <AppText variant="small" tone="muted" tabular style={styles.detail}>
              {item.detail}
            </AppText>
          ) : null}
          <AppText variant="caption" tone="faint">
            {item.source}
          </AppText>
        </View>
      ))}
    </Card>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { gap: spacing.md },
    item: { gap: spacing.xxs, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: c.border },
    line: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
    label: { flex: 1, minWidth: 120 },
    value: { textAlign: 'right' },
    detail: { textAlign: 'right' },
  });
