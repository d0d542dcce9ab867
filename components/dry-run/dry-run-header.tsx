import { StyleSheet, View } from 'react-native';

import { NightControls } from '@/components/dry-run/night-controls';
import type { DryRunView } from '@/components/dry-run/use-dry-run-view';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { TextLink } from '@/components/ui/text-link';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { spacing } from '@/constants/theme';

type DryRunHeaderProps = { recipeId: string; view: DryRunView };

/** The night, site and rig a run asks for: the pending run's while it runs, else the shown result's. */
function asked(view: DryRunView) {
  const { shown, run } = view;
  const pending = run.isPending ? run.variables : undefined;
  return {
    date: pending?.date ?? shown?.nightDate ?? null,
    siteId: pending?.siteId ?? shown?.siteId ?? null,
    rigId: pending && pending.rigId !== undefined ? pending.rigId : (shown?.rigId ?? null),
  };
}

/** Recipe, night, site and rig, the run button, when the shown result was made, and whether it is stale. */
export function DryRunHeader({ recipeId, view }: DryRunHeaderProps) {
  const { isWide } = useBreakpoints();
  const { shown, run, runNight } = view;
  const { date, siteId, rigId } = asked(view);
  const runButton = <Button label={run.isPending ? 'Running…' : 'Run dry run'} pending={run.isPending} onPress={() => runNight()} testID="dry-run-run" fullWidth={!isWide} />;
  const when = shown ? `Result of ${formatLogTime(shown.createdAt)} · recipe version ${shown.recipeVersion}` : run.isPending ? 'Playing the night…' : 'No result yet';
  return (
    <View style={styles.wrap}>
      <TextLink href={`/recipes/${recipeId}`} label="‹ Recipe" variant="small" testID="dry-run-back" />
      <View style={[styles.top, isWide && styles.topWide]}>
        <View style={styles.titles}>
          <AppText eyebrow tone="faint" weight="semibold">
            Dry run
          </AppText>
          <AppText variant={isWide ? 'heading' : 'title'} role="heading" aria-level={1} numberOfLines={2} testID="dry-run-recipe-name">
            {view.recipe.data?.name ?? 'Recipe'}
          </AppText>
          <AppText variant="small" tone="muted" tabular testID="dry-run-result-time">
            {when}
          </AppText>
        </View>
        {isWide ? runButton : null}
      </View>
      <Card style={styles.controls}>
        <NightControls date={date} timeZone={shown?.result.sky.timeZone ?? null} siteId={siteId} rigId={rigId} sites={view.sites} rigs={view.rigs} busy={run.isPending} onRun={runNight} wide={isWide} />
      </Card>
      {isWide ? null : runButton}
      {shown?.stale && !run.isPending ? (
        <Banner title="The recipe changed since this dry run — run again" message="What follows is the recipe as it was at that run." testID="dry-run-stale">
          <Button label="Run again" size="small" variant="secondary" onPress={() => runNight()} testID="dry-run-stale-run" />
        </Banner>
      ) : null}
      {run.isError ? <Banner tone="danger" title="The dry run did not finish" message={cleanError(run.error)} testID="dry-run-error" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  top: { gap: spacing.md },
  topWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  titles: { gap: spacing.xxs, flexShrink: 1, minWidth: 0 },
  controls: { padding: spacing.md },
});
