import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { SeverityTag } from '@/components/dry-run/severity-icon';
import { SummaryCards } from '@/components/dry-run/summary-cards';
import { RigSitePickers } from '@/components/templates/rig-site-pickers';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { useRigsQuery } from '@/hooks/use-rigs';
import { usePreviewDryRunMutation } from '@/hooks/use-templates';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import { mapFiltersToRig } from '@/shared/recipe/filters';
import type { RecipeTree } from '@/shared/recipe/types';

/** "Preview a dry run on my rig and site": the template's bands mapped to my filters, nothing stored. */
export function TemplatePreview({ tree }: { tree: RecipeTree }) {
  const rigs = useRigsQuery();
  const [rigId, setRigId] = useState('');
  const [siteId, setSiteId] = useState('');
  const preview = usePreviewDryRunMutation();
  const rig = rigs.data?.find((r) => r.id === rigId);
  const mapped = rig ? mapFiltersToRig(tree, rig) : null;

  function run() {
    if (!mapped) return;
    preview.mutate({ tree: mapped.tree, rigId, siteId });
  }

  const result = preview.data;
  return (
    <FormSection title="Preview a dry run on my rig and site" description="The template's filter bands are matched to your filters; nothing is saved." testID="template-preview">
      <RigSitePickers rigId={rigId} onRig={setRigId} siteId={siteId} onSite={setSiteId} rigTestID="template-preview-rig" siteTestID="template-preview-site" />
      {mapped && mapped.unresolved.length > 0 ? (
        <AppText variant="small" tone="muted">{`Your rig has no filter for ${mapped.unresolved.join(', ')}; those steps keep the band name.`}</AppText>
      ) : null}
      <View style={styles.actions}>
        <Button label="Run the preview" onPress={run} disabled={!rigId || !siteId} pending={preview.isPending} testID="template-preview-run" />
      </View>
      {preview.error ? <Banner tone="danger" title="The preview did not run" message={cleanError(preview.error)} /> : null}
      {result ? (
        <View style={styles.result} testID="template-preview-result">
          <SummaryCards result={result} />
          {result.findings.length === 0 ? <AppText tone="muted">No findings.</AppText> : null}
          {result.findings.map((f, i) => (
            <View key={`${f.code}-${i}`} style={styles.finding}>
              <SeverityTag severity={f.severity} />
              <View style={styles.findingText}>
                <AppText variant="small">{f.message}</AppText>
                {f.fix ? <AppText variant="small" tone="muted">{f.fix}</AppText> : null}
              </View>
            </View>
          ))}
        </View>
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row' },
  result: { gap: spacing.md },
  finding: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
  findingText: { flex: 1, gap: 1 },
});
