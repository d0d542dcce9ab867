import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { countText, degreesText } from '@/components/calibration/calibration-format';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { SelectField } from '@/components/ui/select-field';
import { useFlatsPlanQuery, useFlatsRecipeMutation } from '@/hooks/use-calibration';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { formatNightDate } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { FlatCombo } from '@/shared/schemas/calibration-api';

type Source = 'panel' | 'sky';
const SOURCES = [
  { value: 'panel' as const, label: 'Panel' },
  { value: 'sky' as const, label: 'Twilight sky' },
];

const BIAS_CAUTION = 'Flats need bias frames (or darks at the flats’ exposure) at the same gain, offset and binning to calibrate them.';

function ComboRow({ combo }: { combo: FlatCombo }) {
  const styles = useThemedStyles(makeStyles);
  const has = combo.flatFrames > 0;
  const parts = [
    combo.rotatorAngleDeg === null ? 'rotator not recorded' : `rotator ${degreesText(combo.rotatorAngleDeg)}`,
    combo.focuserPositionSteps === null ? 'focus not recorded' : `focus ${combo.focuserPositionSteps.toLocaleString('en-GB')}`,
    countText(combo.lightFrames, 'light', 'lights'),
  ];
  return (
    <View style={[styles.combo, !has && styles.comboMissing]} role="listitem" testID="flats-combo">
      <View style={styles.comboTop}>
        <AppText weight="semibold" style={styles.grow}>
          {combo.filter ?? 'No filter'}
        </AppText>
        <AppText variant="small" weight="semibold" tone={has ? 'ok' : 'danger'} testID="flats-combo-status">
          {has ? `${countText(combo.flatFrames, 'flat', 'flats')} on record` : 'No flats on record'}
        </AppText>
        <AppText variant="small" tone={combo.biasOnRecord ? 'ok' : 'muted'} testID="flats-combo-bias">
          {combo.biasOnRecord ? 'bias on record' : 'no bias on record'}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {parts.join(' · ')}
      </AppText>
    </View>
  );
}

/** Flats for one night's lights: each (filter, rotator angle, focus position) they used, and a recipe that returns to each. */
export function FlatsSection() {
  const styles = useThemedStyles(makeStyles);
  const [night, setNight] = useState<string | null>(null);
  const [source, setSource] = useState<Source>('panel');
  const [rigChoice, setRigChoice] = useState<string | null>(null);
  const plan = useFlatsPlanQuery(night);
  const rigs = useRigsQuery();
  const make = useFlatsRecipeMutation();
  const rigList = rigs.data ?? [];
  const rigId = rigChoice ?? rigList[0]?.id ?? null;
  const data = plan.data;
  const shownNight = data?.nightDate ?? null;

  function makeRecipe() {
    if (!shownNight) return;
    make.mutate({ nightDate: shownNight, source, rigId }, { onSuccess: (recipeId) => router.push({ pathname: '/recipes/[id]', params: { id: recipeId } }) });
  }

  return (
    <FormSection title="Flats for a night" description="Flats match lights only with the same filter, rotation and focus. Pick a night with lights to see what its flats must match." testID="flats-section">
      {plan.isPending ? <LoadingView label="Loading the night's lights…" /> : null}
      {plan.isError ? <ErrorView error={plan.error} onRetry={() => plan.refetch()} retrying={plan.isFetching} title="Could not load the flats" /> : null}
      {data && data.nights.length === 0 ? (
        <AppText tone="muted" testID="flats-empty">
          No lights on record yet. Add a night&apos;s frames and its combinations show here.
        </AppText>
      ) : null}
      {data && shownNight && data.nights.length > 0 ? (
        <>
          <SelectField label="Night" choices={data.nights.map((n) => ({ value: n, label: formatNightDate(n) }))} value={shownNight} onChange={setNight} testID="flats-night" />
          <View style={styles.list} role="list" testID="flats-combos">
            {data.combos.map((c, i) => (
              <ComboRow key={`${c.filter}-${c.rotatorAngleDeg}-${c.focuserPositionSteps}-${i}`} combo={c} />
            ))}
          </View>
          <ChoiceGroup label="Light source" choices={SOURCES} value={source} onChange={setSource} testID="flats-source" />
          {rigList.length > 1 ? (
            <SelectField label="For the rig" choices={rigList.map((r) => ({ value: r.id, label: r.name }))} value={rigId ?? ''} onChange={setRigChoice} testID="flats-rig" />
          ) : null}
          <AppText variant="small" tone="faint" testID="flats-caution">
            {source === 'sky'
              ? `Shoot flats before anything in the optical train moves: same camera angle, focus and filters. Sky flats need the twilight window; the dry run checks the recipe fits in it. ${BIAS_CAUTION}`
              : `Shoot flats before anything in the optical train moves: same camera angle, focus and filters, with the panel evenly lit over the aperture. ${BIAS_CAUTION}`}
          </AppText>
          {make.isError ? <Banner tone="danger" title="Could not make the recipe" message={cleanError(make.error)} /> : null}
          <View style={styles.actions}>
            <Button label="Make a flats recipe" onPress={makeRecipe} pending={make.isPending} disabled={data.combos.length === 0} testID="flats-make-recipe" />
          </View>
        </>
      ) : null}
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    list: { gap: spacing.sm },
    combo: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    comboMissing: { borderLeftWidth: 3, borderLeftColor: c.danger },
    comboTop: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
    grow: { flexGrow: 1, flexShrink: 1 },
    actions: { flexDirection: 'row', justifyContent: 'flex-end' },
  });
