import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { cameraSettingsText, countText, darkSetHeadline } from '@/components/calibration/calibration-format';
import { darkStatus, darksToShoot, type DarkStatus } from '@/components/dry-run/darks-rows';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { TextLink } from '@/components/ui/text-link';
import { useDarksRecipeMutation } from '@/hooks/use-calibration';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { DarksNeeded } from '@/shared/dry-run/types';

const LONG_LABEL = 'Make a darks recipe for the missing and stale sets';
/** The darks-recipe route's default frames per set (calibration-api.ts). */
const DARKS_PER_SET = 30;

const STATUS_TEXT: Record<DarkStatus, string> = { fresh: 'On record', stale: 'Stale', missing: 'Missing' };

function DarkNeedRow({ d }: { d: DarksNeeded }) {
  const styles = useThemedStyles(makeStyles);
  const status = darkStatus(d);
  return (
    <View style={[styles.row, status !== 'fresh' && styles.rowWarn]} role="listitem" testID={`dry-run-dark-${status}`}>
      <View style={styles.top}>
        <AppText weight="semibold" tabular style={styles.grow}>
          {darkSetHeadline(d)}
        </AppText>
        <AppText variant="small" weight="semibold" tone={status === 'fresh' ? 'ok' : status === 'stale' ? 'accent' : 'danger'} testID="dry-run-dark-status">
          {STATUS_TEXT[status]}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {`${cameraSettingsText(d)} · for ${countText(d.lightFrames, 'light frame', 'light frames')}`}
      </AppText>
    </View>
  );
}

/**
 * The dark sets the night's lights need and whether the library holds them fresh; the missing and
 * stale ones become a recipe for a cloudy night in one press.
 */
export function DarksSection({ needed, rigId }: { needed: readonly DarksNeeded[]; rigId: string | null }) {
  const styles = useThemedStyles(makeStyles);
  const make = useDarksRecipeMutation();
  const { isPhone } = useBreakpoints();
  const toShoot = darksToShoot(needed);
  const makeRecipe = () => make.mutate({ darks: toShoot, rigId }, { onSuccess: (recipeId) => router.push({ pathname: '/recipes/[id]', params: { id: recipeId } }) });
  return (
    <FormSection title="Darks" description="The dark sets these lights need (exposure, gain, offset, binning, temperature) against your dark library." testID="dry-run-darks">
      {needed.length === 0 ? (
        <AppText tone="muted" testID="dry-run-darks-none">
          No light frames in this night, so no darks are needed.
        </AppText>
      ) : (
        <View style={styles.list} role="list">
          {needed.map((d) => (
            <DarkNeedRow key={`${d.exposureS}|${d.gain}|${d.offset}|${d.binning}|${d.readoutMode}|${d.temperatureC}`} d={d} />
          ))}
        </View>
      )}
      {toShoot.length > 0 ? (
        <>
          {make.isError ? <Banner tone="danger" title="Could not make the recipe" message={cleanError(make.error)} /> : null}
          <AppText variant="small" tone="muted">
            {`A recipe for a cloudy night: ${DARKS_PER_SET} darks for each missing or stale set, camera cooled, optics covered.`}
          </AppText>
          <View style={styles.actions}>
            <Button label={isPhone ? 'Make a darks recipe' : LONG_LABEL} accessibilityLabel={LONG_LABEL} onPress={makeRecipe} pending={make.isPending} testID="dry-run-darks-recipe" />
          </View>
        </>
      ) : needed.length > 0 ? (
        <AppText variant="small" tone="ok" testID="dry-run-darks-ok">
          Every set is in the library and fresh.
        </AppText>
      ) : null}
      <TextLink href="/calibration?part=darks" label="Dark library ›" variant="small" testID="dry-run-darks-library" />
    </FormSection>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    list: { gap: spacing.sm },
    row: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    rowWarn: { borderLeftWidth: 3, borderLeftColor: c.accent },
    top: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
    grow: { flexGrow: 1, flexShrink: 1 },
    actions: { flexDirection: 'row', flexWrap: 'wrap' },
  });
