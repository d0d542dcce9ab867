import { StyleSheet } from 'react-native';

import { framingChoices, pickFraming, targetChoices } from '@/components/recipes/node-editor/choices';
import { DraftChoice, DraftText, FieldGrid } from '@/components/recipes/node-editor/editor-field';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';
import { WhenField } from '@/components/recipes/node-editor/forms-timing';
import { AppText } from '@/components/ui/app-text';
import { spacing } from '@/constants/theme';
import { formatNumber } from '@/shared/recipe/format';

function SubHeading({ title }: { title: string }) {
  return (
    <AppText variant="small" weight="semibold" eyebrow tone="faint" role="heading" aria-level={3} style={styles.heading}>
      {title}
    </AppText>
  );
}

/** Target and framing of a stage. */
function StageTarget({ ed, targets }: KindFormProps) {
  const targetId = typeof ed.values.targetId === 'string' ? ed.values.targetId : '';
  const target = targets.find((t) => t.id === targetId);
  const framings = target?.framings ?? [];
  const mode = ed.values['framing.mode'];
  const recorded = framings.find((f) => f.id === mode);
  const chooseTarget = (id: string) =>
    ed.setValues((v) => {
      // A recorded framing belongs to the old target; its values stay as typed ones.
      const mode = v['framing.mode'] ?? 'none';
      return { ...v, targetId: id, 'framing.mode': mode === 'none' || mode === 'custom' ? mode : 'custom' };
    });
  return (
    <>
      <DraftChoice ed={ed} path="targetId" label="Target" choices={targetChoices(targets, targetId)} onChange={chooseTarget} select />
      <DraftChoice ed={ed} path="framing.mode" label="Framing" choices={framingChoices(target)} onChange={(c) => ed.setValues((v) => pickFraming(v, c, framings))} />
      {recorded ? (
        <AppText variant="small" tone="muted" tabular>
          {`RA ${formatNumber(recorded.raDeg)}°, Dec ${formatNumber(recorded.decDeg)}°, PA ${formatNumber(recorded.positionAngleDeg)}°`}
        </AppText>
      ) : null}
      {mode === 'custom' ? (
        <FieldGrid>
          <DraftText ed={ed} path="framing.raDeg" label="Centre RA (°)" inputMode="decimal" hint="Degrees, or hours as 05:35:17." />
          <DraftText ed={ed} path="framing.decDeg" label="Centre Dec (°)" inputMode="decimal" hint="Degrees, or −05:23:28." />
          <DraftText ed={ed} path="framing.positionAngleDeg" label="Position angle (°)" numeric hint="East of north, 0–360." />
        </FieldGrid>
      ) : null}
    </>
  );
}

export function StageForm(props: KindFormProps) {
  const { ed } = props;
  return (
    <>
      <StageTarget {...props} />
      <SubHeading title="Window" />
      <WhenField ed={ed} path="window.notBefore" label="Not before" defaultEvent="astronomical-dusk" />
      <WhenField ed={ed} path="window.endBy" label="End by" defaultEvent="astronomical-dawn" />
      <FieldGrid>
        <DraftText ed={ed} path="window.minAltitudeDeg" label="Min altitude (°)" numeric placeholder="Site's" hint="Blank: the site's limit." />
        <DraftText ed={ed} path="window.maxMoonIlluminationPct" label="Max Moon illumination (%)" numeric placeholder="Any" />
        <DraftText ed={ed} path="window.minMoonSeparationDeg" label="Min Moon separation (°)" numeric placeholder="Any" />
      </FieldGrid>
    </>
  );
}

const styles = StyleSheet.create({ heading: { marginTop: spacing.xs } });
