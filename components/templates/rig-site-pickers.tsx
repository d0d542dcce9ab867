import { StyleSheet, View } from 'react-native';

import { SelectField } from '@/components/ui/select-field';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useSitesQuery } from '@/hooks/use-sites';
import { spacing } from '@/constants/theme';

type Props = {
  rigId: string;
  onRig: (id: string) => void;
  siteId?: string;
  onSite?: (id: string) => void;
  rigTestID?: string;
  siteTestID?: string;
};

/** My rigs and (optionally) sites as pickers; the first of each is chosen until the user picks. */
export function RigSitePickers({ rigId, onRig, siteId, onSite, rigTestID, siteTestID }: Props) {
  const rigs = useRigsQuery();
  const sites = useSitesQuery();
  const rigChoices = [{ value: '', label: rigs.isPending ? 'Loading rigs…' : 'Choose a rig' }, ...(rigs.data ?? []).map((r) => ({ value: r.id, label: r.name }))];
  const siteChoices = [{ value: '', label: sites.isPending ? 'Loading sites…' : 'Choose a site' }, ...(sites.data ?? []).map((s) => ({ value: s.id, label: s.name }))];
  return (
    <View style={styles.row}>
      <View style={styles.cell}>
        <SelectField label="My rig" value={rigId} onChange={onRig} choices={rigChoices} testID={rigTestID} />
      </View>
      {onSite ? (
        <View style={styles.cell}>
          <SelectField label="My site" value={siteId ?? ''} onChange={onSite} choices={siteChoices} testID={siteTestID} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 200 },
});
