import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { degreesText } from '@/components/calibration/calibration-format';
import { flippedAngle, integrationText } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { SelectField } from '@/components/ui/select-field';
import { useContinueTargetMutation } from '@/hooks/use-history';
import { useRecipesQuery } from '@/hooks/use-recipes';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import type { RecordedFraming } from '@/shared/schemas/calibration-api';

type Destination = 'new' | 'existing';
const DESTINATIONS = [
  { value: 'new' as const, label: 'A new recipe' },
  { value: 'existing' as const, label: 'Add to a recipe' },
];

/** "Earlier frames were taken at 125.0° and at 305.0°": the angle to go on with, when both were used. */
function FlipQuestion({ framing, angle, onAngle }: { framing: RecordedFraming; angle: number; onAngle: (deg: number) => void }) {
  const main = framing.positionAngleDeg;
  const other = flippedAngle(main);
  const choices = [
    { value: String(main), label: `${degreesText(main)} · ${integrationText(framing.seconds)}` },
    { value: String(other), label: `${degreesText(other)} · ${integrationText(framing.flippedSeconds)}` },
  ];
  return (
    <View style={styles.block} testID="history-flip">
      <AppText testID="history-flip-question">
        {`Earlier frames were taken at ${degreesText(main)} and at ${degreesText(other)} — the camera turned with a meridian flip. Which one do you want to continue?`}
      </AppText>
      <ChoiceGroup label="Position angle to continue at" choices={choices} value={String(angle)} onChange={(v) => onAngle(Number(v))} testID="history-flip-angle" />
    </View>
  );
}

/** The stage to image next: at the chosen recorded framing and angle, in a new recipe or added to one. */
export function ContinuePanel({ targetId, framing }: { targetId: string; framing: RecordedFraming }) {
  const [angle, setAngle] = useState(framing.positionAngleDeg);
  const [destination, setDestination] = useState<Destination>('new');
  const [recipeId, setRecipeId] = useState<string | null>(null);
  const [skipped, setSkipped] = useState<{ recipeId: string; filters: string[] } | null>(null);
  const recipes = useRecipesQuery({ q: '', sort: 'updated' });
  const go = useContinueTargetMutation(targetId);
  const list = recipes.data ?? [];
  const chosen = list.find((r) => r.id === recipeId) ?? list[0];
  const open = (id: string) => router.push({ pathname: '/recipes/[id]', params: { id } });

  function submit() {
    const into = destination === 'existing' && chosen ? { recipeId: chosen.id, version: chosen.version } : {};
    go.mutate(
      { framingKey: framing.key, positionAngleDeg: angle, ...into },
      {
        onSuccess: (r) => {
          if (r.skippedFilters.length > 0) setSkipped({ recipeId: r.recipeId, filters: r.skippedFilters });
          else open(r.recipeId);
        },
      },
    );
  }

  const conflict = isApiError(go.error, 409);
  return (
    <View style={styles.block} testID="history-continue">
      {framing.flippedFrames > 0 ? <FlipQuestion framing={framing} angle={angle} onAngle={setAngle} /> : null}
      <ChoiceGroup label="Put the stage in" choices={DESTINATIONS} value={destination} onChange={setDestination} testID="history-continue-into" />
      {destination === 'existing' ? (
        list.length > 0 ? (
          <SelectField label="Recipe" choices={list.map((r) => ({ value: r.id, label: r.name }))} value={chosen?.id ?? ''} onChange={setRecipeId} testID="history-continue-recipe" />
        ) : (
          <AppText variant="small" tone="muted">
            You have no recipes yet; continue into a new one.
          </AppText>
        )
      ) : null}
      <AppText variant="small" tone="faint">
        {`The stage slews to this framing’s centre, turns the camera to ${degreesText(angle)} and exposes each recorded filter at its most used exposure.`}
      </AppText>
      {go.isError ? (
        <Banner
          tone="danger"
          title={conflict ? 'The recipe changed in the meantime' : 'Could not continue this target'}
          message={conflict ? `${cleanError(go.error)} The list was reloaded; try again.` : cleanError(go.error)}
          testID="history-continue-error"
        />
      ) : null}
      {skipped ? (
        <Banner tone="info" title="Some filters were left out" message={`Your rig has no ${skipped.filters.join(', ')} filter, so the stage does not expose through ${skipped.filters.length === 1 ? 'it' : 'them'}.`} testID="history-continue-skipped">
          <Button label="Open the recipe" size="small" onPress={() => open(skipped.recipeId)} testID="history-continue-open" />
        </Banner>
      ) : (
        <View style={styles.actions}>
          <Button label="Continue this target" onPress={submit} pending={go.isPending} disabled={destination === 'existing' && !chosen} testID="history-continue-submit" />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: spacing.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end' },
});
