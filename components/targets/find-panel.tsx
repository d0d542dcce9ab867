import { StyleSheet, View } from 'react-native';

import { CustomTargetForm } from '@/components/targets/custom-target-form';
import { useFindForm } from '@/components/targets/find-state';
import { SearchFilters } from '@/components/targets/search-filters';
import { SearchResults } from '@/components/targets/search-results';
import { spacing } from '@/constants/theme';

/** Search the built-in list and the user's catalogues, filter, add; or type custom coordinates. */
export function FindPanel() {
  const find = useFindForm();
  return (
    <View style={styles.panel} testID="find-panel">
      <SearchFilters find={find} />
      <CustomTargetForm />
      <SearchResults params={find.params} />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: spacing.lg },
});
