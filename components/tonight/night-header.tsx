import { StyleSheet, View } from 'react-native';

import { SitePicker } from '@/components/tonight/site-picker';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { formatNightDate } from '@/lib/format';
import { spacing } from '@/constants/theme';
import { addDays } from '@/shared/night-date';
import type { Site } from '@/shared/schemas/site';

type NightHeaderProps = {
  site: Site;
  date: string;
  sites: Site[];
  isCurrentNight: boolean;
  onDate: (date: string | undefined) => void;
  onSite: (id: string) => void;
};

/** Which site and which night: the title, the evening-to-morning dates and their controls. */
export function NightHeader({ site, date, sites, isCurrentNight, onDate, onSite }: NightHeaderProps) {
  const { isTablet } = useBreakpoints();
  const morning = addDays(date, 1);
  return (
    <View style={styles.header}>
      <View style={styles.titleRow}>
        <View style={styles.titles}>
          <AppText eyebrow tone="faint" weight="semibold">
            {isCurrentNight ? 'Tonight' : 'Night of'}
          </AppText>
          <AppText variant={isTablet ? 'heading' : 'title'} role="heading" aria-level={1} testID="tonight-site-name">
            {site.name}
          </AppText>
          <AppText tone="muted" tabular testID="tonight-date">
            {`${formatNightDate(date, { year: false })} → ${formatNightDate(morning)} · ${site.timeZone}`}
          </AppText>
        </View>
        <View style={styles.dateNav}>
          <Button label="‹ Previous" accessibilityLabel="Previous night" size="small" variant="secondary" onPress={() => onDate(addDays(date, -1))} testID="night-prev" />
          {isCurrentNight ? null : <Button label="Tonight" size="small" variant="secondary" onPress={() => onDate(undefined)} testID="night-current" />}
          <Button label="Next ›" accessibilityLabel="Next night" size="small" variant="secondary" onPress={() => onDate(addDays(date, 1))} testID="night-next" />
        </View>
      </View>
      {sites.length > 1 ? <SitePicker sites={sites} selectedId={site.id} onSelect={onSite} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.md },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.md },
  titles: { gap: spacing.xxs, flexShrink: 1 },
  dateNav: { flexDirection: 'row', gap: spacing.sm, alignItems: 'center' },
});
