import { StyleSheet, View } from 'react-native';

import { catalogueMatch, centreText, isUnnamedObject, targetAtCentre, targetFromMatch, targetTitle } from '@/components/history/object-target';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { TextLink } from '@/components/ui/text-link';
import { useCatalogueSearchQuery } from '@/hooks/use-catalogues';
import { useObjectHistoryQuery } from '@/hooks/use-history';
import { useAddTargetMutation } from '@/hooks/use-targets';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import { LINK_RADIUS_DEG } from '@/shared/calibration/history';
import type { CatalogueSearchResult, Target } from '@/shared/schemas/target';

type AddObjectTargetProps = {
  /** The OBJECT text the lights were grouped by. */
  label: string;
  /** After the target is stored and the history reloaded (the lights now belong to it). */
  onAdded?: (target: Target) => void;
  onCancel?: () => void;
};

function sourceText(match: CatalogueSearchResult): string {
  return match.source === 'builtin' ? 'the built-in list' : (match.catalogueName ?? 'your catalogues');
}

function Lookup({ label, onAdded, onCancel }: AddObjectTargetProps) {
  const search = useCatalogueSearchQuery({ q: label, kinds: [], wellPlaced: false });
  const history = useObjectHistoryQuery(label);
  const add = useAddTargetMutation();
  // Data first: once the target exists the object's history answers 404 on the refetch, and
  // the panel keeps what it showed until the screen moves on.
  if (!search.data || !history.data) {
    const failed = search.isError ? search : history.isError ? history : null;
    if (!failed) return <LoadingView label="Looking it up in the catalogues…" />;
    return (
      <Banner tone="danger" title="Could not look it up" message={cleanError(failed.error)} testID="history-object-add-error">
        <Button label="Retry" size="small" variant="secondary" onPress={() => failed.refetch()} pending={failed.isFetching} />
      </Banner>
    );
  }
  const match = catalogueMatch(label, search.data.results);
  const input = match ? targetFromMatch(match, label) : targetAtCentre(label, history.data);
  const cancel = onCancel ? <Button label="Cancel" variant="ghost" size="small" onPress={onCancel} testID="history-object-add-cancel" /> : null;
  if (!input) {
    return (
      <View style={styles.block} testID="history-object-add">
        <AppText variant="small" tone="muted" testID="history-object-add-offer">
          {`No catalogue object is named “${label}”, and none of these lights has a plate solution, so where they point is not known. Add the target with its coordinates under Targets, named “${label}”, and the frames will join it.`}
        </AppText>
        <View style={styles.actions}>
          {cancel}
          <TextLink href="/targets" label="Targets ›" variant="small" />
        </View>
      </View>
    );
  }
  const offer = match
    ? `From ${sourceText(match)}: ${targetTitle(match)} at ${centreText(match)} (J2000).`
    : `No catalogue object is named “${label}”, so the target goes at the centre of the frames’ recorded framing, ${centreText(input)} (J2000), named “${input.designation}”.`;
  const title = targetTitle(input);
  return (
    <View style={styles.block} testID="history-object-add">
      <AppText variant="small" tone="muted" testID="history-object-add-offer">
        {offer}
      </AppText>
      {add.isError ? <Banner tone="danger" title="Could not add the target" message={cleanError(add.error)} testID="history-object-add-failed" /> : null}
      <View style={styles.actions}>
        {cancel}
        <Button
          label={`Add ${title} as a target`}
          size="small"
          onPress={() => add.mutate(input, { onSuccess: (target) => onAdded?.(target) })}
          pending={add.isPending}
          testID="history-object-add-submit"
        />
      </View>
    </View>
  );
}

/**
 * "Add as a target" for lights no target matched: the catalogue object their OBJECT names, else
 * a target at their recorded centre. History is worked out when read, so once the target exists
 * the frames are its own.
 */
export function AddObjectTarget(props: AddObjectTargetProps) {
  if (isUnnamedObject(props.label)) {
    return (
      <View style={styles.block} testID="history-object-add">
        <AppText variant="small" tone="muted">
          {`These lights recorded no OBJECT name. Add the target under Targets; plate-solved frames within ${LINK_RADIUS_DEG}° of it join it.`}
        </AppText>
        <TextLink href="/targets" label="Targets ›" variant="small" />
      </View>
    );
  }
  return <Lookup {...props} />;
}

const styles = StyleSheet.create({
  block: { gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'flex-end', alignItems: 'center', gap: spacing.sm },
});
