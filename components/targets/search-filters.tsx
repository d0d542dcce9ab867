import { ScrollView, StyleSheet, View } from 'react-native';

import { Chip } from '@/components/ui/chip';
import type { FindFormState } from '@/components/targets/find-state';
import { KIND_LABELS, KIND_ORDER } from '@/components/targets/kinds';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { SwitchRow } from '@/components/ui/switch-row';
import { TextField } from '@/components/ui/text-field';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { spacing } from '@/constants/theme';

function KindChips({ find }: { find: FindFormState }) {
  const { isTablet } = useBreakpoints();
  const chips = KIND_ORDER.map((kind) => (
    <Chip key={kind} role="checkbox" label={KIND_LABELS[kind]} selected={find.form.kinds.includes(kind)} onPress={() => find.toggleKind(kind)} testID={`kind-chip-${kind}`} />
  ));
  // Phones scroll the row sideways; wider screens wrap it.
  if (!isTablet) {
    return (
      <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.chipRow} role="group" accessibilityLabel="Kinds">
        {chips}
      </ScrollView>
    );
  }
  return (
    <View style={[styles.chipRow, styles.wrap]} role="group" accessibilityLabel="Kinds">
      {chips}
    </View>
  );
}

/** Search box, kind chips, size and brightness limits and the "well placed tonight" switch. */
export function SearchFilters({ find }: { find: FindFormState }) {
  const numeric = { inputMode: 'decimal' as const, tabular: true, autoCorrect: false };
  return (
    <View style={styles.box}>
      <TextField
        label="Search"
        placeholder="Designation or name: M 42, NGC 7000, Veil"
        value={find.form.q}
        onChangeText={(q) => find.update({ q })}
        autoCapitalize="none"
        autoCorrect={false}
        role="searchbox"
        testID="target-search-input"
      />
      <KindChips find={find} />
      <View style={styles.numbers}>
        <View style={styles.number}>
          <TextField label="Min size (′)" placeholder="0" value={find.form.minSize} onChangeText={(minSize) => find.update({ minSize })} error={find.errorFor('minSize')} testID="search-min-size" {...numeric} />
        </View>
        <View style={styles.number}>
          <TextField label="Max size (′)" placeholder="any" value={find.form.maxSize} onChangeText={(maxSize) => find.update({ maxSize })} error={find.errorFor('maxSize')} testID="search-max-size" {...numeric} />
        </View>
        <View style={styles.number}>
          <TextField label="Faintest mag" placeholder="any" value={find.form.faintestMag} onChangeText={(faintestMag) => find.update({ faintestMag })} error={find.errorFor('faintestMag')} testID="search-faintest-mag" {...numeric} />
        </View>
      </View>
      <SwitchRow
        label="Well placed tonight"
        description="At least an hour of darkness above your default site's limit, best placed first."
        value={find.form.wellPlaced}
        onValueChange={(wellPlaced) => find.update({ wellPlaced })}
        testID="well-placed-switch"
      />
      {find.hasFilters ? (
        <View style={styles.clear}>
          <AppText variant="small" tone="faint">
            Filters are on.
          </AppText>
          <Button label="Clear filters" size="small" variant="ghost" onPress={find.clearFilters} testID="search-clear-filters" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  chipRow: { gap: spacing.sm, paddingVertical: spacing.xxs },
  wrap: { flexDirection: 'row', flexWrap: 'wrap' },
  numbers: { flexDirection: 'row', gap: spacing.sm },
  number: { flex: 1, minWidth: 0 },
  clear: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
});
