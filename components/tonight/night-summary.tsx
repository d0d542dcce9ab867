import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { formatClock, formatPercent } from '@/lib/format';
import { moonPhaseName } from '@/lib/night-band';
import { darkDurationText, darkWindowText } from '@/lib/night-text';
import { spacing } from '@/constants/theme';
import type { Night } from '@/shared/schemas/night';

function moonLine(night: Night): string {
  const phase = moonPhaseName(night.moonPhaseDeg);
  if (night.moonrise && night.moonset) {
    const rise = Date.parse(night.moonrise);
    const set = Date.parse(night.moonset);
    return rise < set
      ? `${phase} · up ${formatClock(rise, night.timeZone)}–${formatClock(set, night.timeZone)}`
      : `${phase} · sets ${formatClock(set, night.timeZone)}, rises ${formatClock(rise, night.timeZone)}`;
  }
  if (night.moonrise) return `${phase} · rises ${formatClock(night.moonrise, night.timeZone)}`;
  if (night.moonset) return `${phase} · sets ${formatClock(night.moonset, night.timeZone)}`;
  return phase;
}

/** Two tiles with what matters first: the dark window and the Moon. */
export function NightSummary({ night }: { night: Night }) {
  const hasDark = night.darkHours > 0;
  return (
    <View style={styles.row}>
      <Card style={styles.tile} testID="tonight-dark-window">
        <AppText eyebrow tone="faint" weight="semibold">
          Astronomical darkness
        </AppText>
        <AppText variant={hasDark ? 'heading' : 'lead'} weight="semibold" tone={hasDark ? 'default' : 'muted'} tabular>
          {darkWindowText(night)}
        </AppText>
        {hasDark ? (
          <AppText tone="accent" tabular>
            {darkDurationText(night)}
          </AppText>
        ) : null}
      </Card>
      <Card style={styles.tile}>
        <AppText eyebrow tone="faint" weight="semibold">
          Moon
        </AppText>
        <AppText variant="heading" weight="semibold" tabular>
          {formatPercent(night.moonIllumination)}
        </AppText>
        <AppText tone="muted" tabular>
          {moonLine(night)}
        </AppText>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  tile: { flexGrow: 1, flexBasis: 220, gap: spacing.xs },
});
