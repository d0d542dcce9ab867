import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { useCataloguesQuery, useDeleteCatalogueMutation } from '@/hooks/use-catalogues';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { CatalogueSummary } from '@/shared/schemas/target';

function CatalogueRow({ catalogue }: { catalogue: CatalogueSummary }) {
  const styles = useThemedStyles(makeStyles);
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteCatalogueMutation();
  const owner = catalogue.clubName ? `Shared with ${catalogue.clubName}` : 'Personal';
  return (
    <View style={styles.row} testID="catalogue-item">
      <View style={styles.text}>
        <AppText weight="semibold">{catalogue.name}</AppText>
        <AppText variant="small" tone="muted" tabular>
          {`${catalogue.objectCount.toLocaleString('en-GB')} objects · ${owner}${catalogue.ownedByMe ? '' : ' · imported by another member'}`}
        </AppText>
        {remove.isError ? <AppText variant="small" tone="danger">{cleanError(remove.error)}</AppText> : null}
      </View>
      {confirming ? (
        <View style={styles.actions} role="alert">
          <AppText variant="small" tone="muted">{`Delete “${catalogue.name}”?`}</AppText>
          <Button label="Cancel" size="small" variant="ghost" onPress={() => setConfirming(false)} testID="catalogue-delete-cancel" />
          <Button label="Delete catalogue" size="small" variant="danger" pending={remove.isPending} onPress={() => remove.mutate(catalogue.id)} testID="catalogue-delete-confirm" />
        </View>
      ) : (
        <Button label="Delete…" accessibilityLabel={`Delete ${catalogue.name}`} size="small" variant="secondary" onPress={() => setConfirming(true)} testID="catalogue-delete" />
      )}
    </View>
  );
}

/** Catalogues the user can search: their own and their clubs'; targets already added stay. */
export function CatalogueList() {
  const catalogues = useCataloguesQuery();
  let body;
  if (catalogues.isPending) body = <LoadingView label="Loading catalogues…" />;
  else if (catalogues.isError) body = <ErrorView error={catalogues.error} onRetry={() => catalogues.refetch()} retrying={catalogues.isFetching} title="Could not load the catalogues" />;
  else if (catalogues.data.length === 0) body = <AppText tone="muted">None yet. Only the built-in list is searched.</AppText>;
  else body = catalogues.data.map((c) => <CatalogueRow key={c.id} catalogue={c} />);
  return (
    <FormSection title="Your catalogues" description="Searched in Find beside the built-in list. Deleting one keeps the targets you added from it." testID="catalogue-list">
      {body}
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border },
    text: { flex: 1, minWidth: 180, gap: spacing.xxs },
    actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  });
