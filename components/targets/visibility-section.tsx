import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AltitudeChart } from '@/components/charts/altitude-chart';
import { SitePicker } from '@/components/tonight/site-picker';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { useNow } from '@/hooks/use-now';
import { useSitesQuery } from '@/hooks/use-sites';
import { isNoSiteError } from '@/hooks/use-tonight';
import { useVisibilityQuery, type VisibilityResponse } from '@/hooks/use-visibility';
import { formatClock, formatDurationHours, formatNightDate } from '@/lib/format';
import { spacing } from '@/constants/theme';
import { addDays, currentNightDate } from '@/shared/night-date';

type VisibilitySectionProps = { raDeg: number; decDeg: number };

/** "Usable in darkness 4 h 10 min, 21:40–01:50 · closest Moon 48°", or why it is not usable. */
function usableText({ night, visibility: v }: VisibilityResponse): string {
  if (v.neverRises) return 'Does not rise at this site on this night.';
  if (v.usableDarkMinutes <= 0 || !v.firstUsable || !v.lastUsable) return 'Not above its limit during astronomical darkness on this night.';
  const from = Date.parse(v.firstUsable);
  const to = Date.parse(v.lastUsable);
  const seps = v.samples.filter((s) => Date.parse(s.t) >= from && Date.parse(s.t) <= to).map((s) => s.moonSepDeg);
  const moon = seps.length ? ` · closest Moon ${Math.round(Math.min(...seps))}°` : '';
  return `Usable in darkness ${formatDurationHours(v.usableDarkMinutes / 60)}, ${formatClock(from, night.timeZone)}–${formatClock(to, night.timeZone)}${moon}`;
}

function NightNav({ data, onDate }: { data: VisibilityResponse; onDate: (date: string | undefined) => void }) {
  const { site, night } = data;
  const isCurrent = night.date === currentNightDate(site.timeZone);
  return (
    <View style={styles.navRow}>
      <AppText tone="muted" tabular style={styles.grow} testID="visibility-night">
        {`${isCurrent ? 'Tonight' : 'Night of'} ${formatNightDate(night.date, { year: false })} · ${site.name}`}
      </AppText>
      <View style={styles.buttons}>
        <Button label="‹ Previous" accessibilityLabel="Previous night" size="small" variant="secondary" onPress={() => onDate(addDays(night.date, -1))} testID="visibility-prev" />
        {isCurrent ? null : <Button label="Tonight" size="small" variant="secondary" onPress={() => onDate(undefined)} testID="visibility-current" />}
        <Button label="Next ›" accessibilityLabel="Next night" size="small" variant="secondary" onPress={() => onDate(addDays(night.date, 1))} testID="visibility-next" />
      </View>
    </View>
  );
}

/** When the target is well placed: the altitude chart for a chosen night and site. */
export function VisibilitySection({ raDeg, decDeg }: VisibilitySectionProps) {
  const [date, setDate] = useState<string | undefined>(undefined);
  const [siteId, setSiteId] = useState<string | undefined>(undefined);
  const visibility = useVisibilityQuery({ siteId, date, raDeg, decDeg });
  const sites = useSitesQuery();
  const nowMs = useNow();

  let body;
  if (visibility.isPending) body = <LoadingView label="Working out the night…" />;
  else if (visibility.isError && isNoSiteError(visibility.error)) {
    body = (
      <Banner title="Add a site to see when this target is well placed" testID="visibility-no-site">
        <Button label="Add a site" size="small" variant="secondary" onPress={() => router.push('/sites/new')} />
      </Banner>
    );
  } else if (visibility.isError) {
    body = <ErrorView error={visibility.error} onRetry={() => visibility.refetch()} retrying={visibility.isFetching} title="Could not work out the night" />;
  } else {
    const data = visibility.data;
    body = (
      <View style={[styles.body, visibility.isPlaceholderData && styles.stale]}>
        <NightNav data={data} onDate={setDate} />
        {sites.data && sites.data.length > 1 ? <SitePicker sites={sites.data} selectedId={data.site.id} onSelect={setSiteId} /> : null}
        <AltitudeChart night={data.night} visibility={data.visibility} nowMs={nowMs} />
        <AppText tabular tone={data.visibility.usableDarkMinutes > 0 ? 'default' : 'muted'} testID="visibility-usable">
          {usableText(data)}
        </AppText>
      </View>
    );
  }
  return (
    <FormSection title="Visibility" description="Altitude through the night; times in the site’s zone." testID="visibility-section">
      {body}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.md },
  stale: { opacity: 0.6 },
  navRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grow: { flexGrow: 1, flexShrink: 1 },
  buttons: { flexDirection: 'row', gap: spacing.sm },
});
