import { StyleSheet, View } from 'react-native';

import { kindLabel } from '@/components/targets/kinds';
import { formatMagnitude, formatSizeArcmin } from '@/components/targets/target-format';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { spacing } from '@/constants/theme';
import type { Target } from '@/shared/schemas/target';
import { formatDec, formatRa } from '@/shared/targets/schema';

function Fact({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.fact}>
      <AppText eyebrow tone="faint" weight="semibold">
        {label}
      </AppText>
      <AppText variant="lead" tabular testID={testID}>
        {value}
      </AppText>
    </View>
  );
}

/** Where the object is and what it is: J2000 coordinates, kind, size and brightness. */
export function TargetFacts({ target }: { target: Target }) {
  const pa = target.positionAngleDeg === null ? '' : ` at ${Math.round(target.positionAngleDeg)}°`;
  return (
    <Card style={styles.card} testID="target-facts">
      <Fact label="RA (J2000)" value={formatRa(target.raDeg)} testID="target-ra" />
      <Fact label="Dec (J2000)" value={formatDec(target.decDeg)} testID="target-dec" />
      <Fact label="Kind" value={kindLabel(target.type)} />
      <Fact label="Size" value={`${formatSizeArcmin(target.majorArcmin, target.minorArcmin)}${target.majorArcmin ? pa : ''}`} />
      <Fact label="Brightness" value={formatMagnitude(target.magnitude)} />
      {target.aliases.length ? <Fact label="Also" value={target.aliases.slice(0, 4).join(', ')} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.xl, rowGap: spacing.md },
  fact: { gap: spacing.xxs, minWidth: 120 },
});
