import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import type { DryRunRequest } from '@/hooks/use-dry-run';
import { formatNightDate } from '@/lib/format';
import { spacing } from '@/constants/theme';
import { addDays, currentNightDate } from '@/shared/night-date';

/** The select's value for "no rig of mine": the dry run then uses typical values. */
const TYPICAL_RIG = 'typical';

type NightControlsProps = {
  date: string | null;
  timeZone: string | null;
  siteId: string | null;
  rigId: string | null;
  sites: { id: string; name: string }[];
  rigs: { id: string; name: string }[];
  busy: boolean;
  onRun: (change: DryRunRequest) => void;
  /** One row (night, site, rig) instead of the phone's stack. */
  wide: boolean;
};

function nightTitle(date: string, timeZone: string | null): string {
  const tonight = timeZone !== null && date === currentNightDate(timeZone);
  return `${tonight ? 'Tonight · ' : ''}${formatNightDate(date)}`;
}

/** Which night, where and with what: ‹ › step a night (and run it), the pickers run at once too. */
export function NightControls({ date, timeZone, siteId, rigId, sites, rigs, busy, onRun, wide }: NightControlsProps) {
  const siteChoices = sites.map((s) => ({ value: s.id, label: s.name }));
  const rigChoices = [{ value: TYPICAL_RIG, label: 'Typical rig (defaults)' }, ...rigs.map((r) => ({ value: r.id, label: r.name }))];
  return (
    <View style={[styles.wrap, wide && styles.wrapWide]}>
      <View style={[styles.night, wide && styles.nightWide]}>
        <Button label="‹" accessibilityLabel="Previous night" variant="secondary" size="small" disabled={!date || busy} onPress={() => date && onRun({ date: addDays(date, -1) })} testID="dry-run-prev-night" />
        <AppText variant="lead" weight="semibold" tabular style={styles.date} testID="dry-run-night" numberOfLines={1}>
          {date ? nightTitle(date, timeZone) : 'Current night'}
        </AppText>
        <Button label="›" accessibilityLabel="Next night" variant="secondary" size="small" disabled={!date || busy} onPress={() => date && onRun({ date: addDays(date, 1) })} testID="dry-run-next-night" />
      </View>
      <View style={[styles.pickers, wide && styles.pickersWide]}>
        {siteChoices.length > 0 && siteId ? (
          <View style={styles.picker}>
            <SelectField label="Site" choices={siteChoices} value={siteId} onChange={(id) => onRun({ siteId: id })} testID="dry-run-site" />
          </View>
        ) : null}
        <View style={styles.picker}>
          <SelectField label="Rig" choices={rigChoices} value={rigId ?? TYPICAL_RIG} onChange={(id) => onRun({ rigId: id === TYPICAL_RIG ? null : id })} testID="dry-run-rig" />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  wrapWide: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.xl },
  night: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  nightWide: { width: 320, minHeight: 44 },
  date: { flex: 1, minWidth: 0, textAlign: 'center', paddingHorizontal: spacing.xs },
  pickers: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  pickersWide: { flex: 1, flexWrap: 'nowrap' },
  picker: { flexGrow: 1, flexBasis: 140, minWidth: 0 },
});
