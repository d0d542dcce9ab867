import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { formatPercent } from '@/lib/format';
import { moonPhaseName } from '@/lib/night-band';
import { darkDurationText, darkWindowText, eventText, missingSunText } from '@/lib/night-text';
import { spacing, type Palette } from '@/constants/theme';
import type { Night } from '@/shared/schemas/night';

type Row = { label: string; value: string; strong?: boolean; testID?: string };

function Section({ title, rows }: { title: string; rows: Row[] }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.section}>
      <AppText eyebrow tone="faint" weight="semibold" role="heading" aria-level={2}>
        {title}
      </AppText>
      {rows.map((row) => (
        <View key={row.label} style={styles.row} testID={row.testID}>
          <AppText tone="muted">{row.label}</AppText>
          <AppText tabular weight={row.strong ? 'semibold' : 'regular'} tone={row.strong ? 'accent' : 'default'} style={styles.value}>
            {row.value}
          </AppText>
        </View>
      ))}
    </View>
  );
}

/** The night's event times in the site's zone, in the order they happen. */
export function NightTimes({ night }: { night: Night }) {
  const styles = useThemedStyles(makeStyles);
  const { isWide } = useBreakpoints();
  const tz = night.timeZone;
  const sunMissing = missingSunText(night);
  const sun: Row[] = [
    { label: 'Sunset', value: eventText(night.sunset, tz, sunMissing), testID: 'time-sunset' },
    { label: 'Civil dusk', value: eventText(night.civilDusk, tz) },
    { label: 'Nautical dusk', value: eventText(night.nauticalDusk, tz) },
    { label: 'Astronomical dusk', value: eventText(night.astronomicalDusk, tz) },
    { label: 'Astronomical dawn', value: eventText(night.astronomicalDawn, tz) },
    { label: 'Nautical dawn', value: eventText(night.nauticalDawn, tz) },
    { label: 'Civil dawn', value: eventText(night.civilDawn, tz) },
    { label: 'Sunrise', value: eventText(night.sunrise, tz, sunMissing), testID: 'time-sunrise' },
  ];
  const dark: Row[] = [
    { label: 'Dark window', value: darkWindowText(night), strong: night.darkHours > 0, testID: 'time-dark-window' },
    { label: 'Duration', value: darkDurationText(night), testID: 'time-dark-duration' },
  ];
  const moon: Row[] = [
    { label: 'Moonrise', value: eventText(night.moonrise, tz, 'No moonrise') },
    { label: 'Moonset', value: eventText(night.moonset, tz, 'No moonset') },
    { label: 'Illumination', value: formatPercent(night.moonIllumination), testID: 'time-moon-illumination' },
    { label: 'Phase', value: moonPhaseName(night.moonPhaseDeg) },
  ];
  return (
    <Card testID="tonight-times" style={[styles.card, isWide && styles.cardWide]}>
      <View style={[styles.column, isWide && styles.columnWide]}>
        <Section title="Sun" rows={sun} />
      </View>
      <View style={[styles.column, isWide && styles.columnWide]}>
        <Section title="Darkness" rows={dark} />
        <Section title="Moon" rows={moon} />
      </View>
    </Card>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { gap: spacing.xl },
    cardWide: { flexDirection: 'row', gap: spacing.xxl },
    column: { gap: spacing.xl },
    columnWide: { flex: 1 },
    section: { gap: spacing.xxs },
    row: {
      flexDirection: 'row',
      justifyContent: 'space-between',
      alignItems: 'baseline',
      gap: spacing.md,
      paddingVertical: spacing.sm,
      borderBottomWidth: StyleSheet.hairlineWidth,
      borderBottomColor: c.border,
    },
    value: { textAlign: 'right', flexShrink: 1 },
  });
