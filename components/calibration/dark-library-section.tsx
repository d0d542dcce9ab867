import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { countText, localDateYmd, sortDarkSets, validityChoices } from '@/components/calibration/calibration-format';
import { DarkSetForm, darkSetValues } from '@/components/calibration/dark-set-form';
import { BiasSetRow } from '@/components/calibration/bias-set-row';
import { DarkSetRow } from '@/components/calibration/dark-set-row';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { SelectField } from '@/components/ui/select-field';
import { useAddDarkSetMutation, useDarkLibraryQuery, useDarkValidityMutation } from '@/hooks/use-calibration';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

function ValiditySetting({ months }: { months: number }) {
  const save = useDarkValidityMutation();
  const shown = save.isPending && save.variables !== undefined ? save.variables : months;
  return (
    <View style={styles.validity}>
      <SelectField label="Darks stay fresh for" choices={validityChoices()} value={String(shown)} onChange={(v) => save.mutate(Number(v))} testID="dark-validity" />
      <AppText variant="small" tone="faint">
        Older sets are marked stale and the dry run asks for new ones. Six months is common practice; retake darks after a camera firmware change whatever their age.
      </AppText>
      {save.isError ? <Banner tone="danger" title="Could not save the setting" message={cleanError(save.error)} /> : null}
    </View>
  );
}

function AddSet({ onDone }: { onDone: () => void }) {
  const add = useAddDarkSetMutation();
  return (
    <DarkSetForm
      initial={darkSetValues(null, localDateYmd())}
      submitLabel="Add set"
      pending={add.isPending}
      testID="dark-set-add"
      onCancel={onDone}
      banner={add.isError ? <Banner tone="danger" title="Could not add the set" message={cleanError(add.error)} /> : null}
      onSubmit={(input, form) =>
        add.mutate(input, {
          onSuccess: onDone,
          onError: (e) => {
            if (isApiError(e) && e.fields) form.setServerErrors(e.fields);
          },
        })
      }
    />
  );
}

/** The dark library: sets recorded from dark frames and sets typed in by hand, then bias sets recorded from bias frames, with their age against the validity. */
export function DarkLibrarySection() {
  const library = useDarkLibraryQuery();
  const [adding, setAdding] = useState(false);
  const addButton = adding ? null : <Button label="Add a set by hand" size="small" variant="secondary" onPress={() => setAdding(true)} testID="dark-set-add-open" />;
  const stale = library.data?.sets.filter((s) => s.stale).length ?? 0;
  const description = library.data
    ? `${countText(library.data.sets.length, 'set', 'sets')}${stale ? `, ${stale} stale` : ''}. A set matches lights by exposure, gain, offset, binning, readout mode and temperature (±1 °C).`
    : 'Which darks you have, and how old they are.';
  return (
    <FormSection title="Dark library" description={description} actions={addButton} testID="dark-library">
      {adding ? <AddSet onDone={() => setAdding(false)} /> : null}
      {library.isPending ? <LoadingView label="Loading the dark library…" /> : null}
      {library.isError ? <ErrorView error={library.error} onRetry={() => library.refetch()} retrying={library.isFetching} title="Could not load the dark library" /> : null}
      {library.data ? (
        <>
          {library.data.sets.length === 0 ? (
            <AppText tone="muted" testID="dark-library-empty">
              No dark sets yet. Add a night&apos;s frames above (dark frames become sets by themselves), or add a set you shot earlier by hand.
            </AppText>
          ) : (
            <View style={styles.list} role="list" testID="dark-library-list">
              {sortDarkSets(library.data.sets).map((set) => (
                <DarkSetRow key={set.id} set={set} today={localDateYmd()} />
              ))}
            </View>
          )}
          {library.data.biasSets.length > 0 ? (
            <View style={styles.list} testID="bias-library">
              <AppText weight="semibold" role="heading" aria-level={3}>
                Bias
              </AppText>
              <AppText variant="small" tone="faint">
                Bias frames calibrate flats at the same gain, offset and binning; they go stale with the darks.
              </AppText>
              <View style={styles.list} role="list" testID="bias-library-list">
                {library.data.biasSets.map((set) => (
                  <BiasSetRow key={set.id} set={set} />
                ))}
              </View>
            </View>
          ) : null}
          <ValiditySetting months={library.data.validityMonths} />
        </>
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  validity: { gap: spacing.xs },
});
