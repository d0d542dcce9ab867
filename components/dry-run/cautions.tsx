import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';

const CAUTIONS = [
  { key: 'sun', title: 'Keep the Sun out of the optics.', text: 'Never aim the telescope at the Sun or close to it, and keep daytime and twilight slews well clear of it. A dry run stops on any pointing it finds too near.' },
  {
    key: 'unattended',
    title: 'An unattended rig meets the real night.',
    text: 'Rain, dew, cables winding around a rotator and a tube that can strike the pier near the meridian are not in this plan. Check them at the rig before you leave it.',
  },
  { key: 'rules', title: 'Local rules and the makers’ manuals come first.', text: 'Follow them for the mount, the power supply and the site.' },
  { key: 'estimates', title: 'Every time here is an estimate.', text: 'The figures come from models of the sky and of the rig; the night itself will differ.' },
];

/** The standing cautions beside the findings: the plan does not make a rig safe. */
export function Cautions() {
  const styles = useThemedStyles(makeStyles);
  return (
    <Card style={styles.card} testID="dry-run-cautions">
      <AppText variant="small" weight="semibold" role="heading" aria-level={2}>
        Before you trust the night to the rig
      </AppText>
      {CAUTIONS.map((c) => (
        <View key={c.key} style={styles.item}>
          <View style={styles.bullet} />
          <AppText variant="small" tone="muted" style={styles.text}>
            <AppText variant="small" weight="semibold">
              {`${c.title} `}
            </AppText>
            {c.text}
          </AppText>
        </View>
      ))}
    </Card>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { gap: spacing.sm, borderColor: c.borderStrong, backgroundColor: c.background },
    item: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
    bullet: { width: 5, height: 5, borderRadius: 3, backgroundColor: c.accent, marginTop: 7 },
    text: { flex: 1 },
  });
