import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { RigSitePickers } from '@/components/templates/rig-site-pickers';
import { chosenTargets, TemplateTargetPickers } from '@/components/templates/template-target-pickers';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useTargetsQuery } from '@/hooks/use-targets';
import { isTemplateRetiredError, unmappedBandsOf, useUseTemplateMutation, type TemplateDetail } from '@/hooks/use-templates';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

/** "Use this template": a copy in my recipes on my rig; bands without a filter are asked for. */
export function TemplateUseForm({ template }: { template: TemplateDetail }) {
  const rigs = useRigsQuery();
  const targets = useTargetsQuery();
  const [targetPicks, setTargetPicks] = useState<Record<string, string | null>>({});
  const [open, setOpen] = useState(false);
  const [rigId, setRigId] = useState('');
  const [name, setName] = useState(template.title);
  const [bandMap, setBandMap] = useState<Record<string, string>>({});
  const use = useUseTemplateMutation(template.clubId, template.id);
  // Kept after the failed try, so the pickers stay while the retry runs.
  const [unmapped, setUnmapped] = useState<string[] | null>(null);
  const rig = rigs.data?.find((r) => r.id === rigId);
  const filterChoices = [{ value: '', label: 'Choose a filter' }, ...(rig?.filterWheel.slots ?? []).map((s) => ({ value: s.name, label: s.name }))];
  const missing = (unmapped ?? []).filter((b) => !bandMap[b]);

  function confirm() {
    if (!rigId) return;
    const map = unmapped ? bandMap : undefined;
    const targetIds = chosenTargets(template.tree, template.suggestedTargets, targetPicks, targets.data ?? []);
    use.mutate({ rigId, name: name.trim() || undefined, bandMap: map, targetIds }, { onSuccess: (recipe) => router.push({ pathname: '/recipes/[id]', params: { id: recipe.id } }), onError: (e) => setUnmapped(unmappedBandsOf(e) ?? unmapped) });
  }

  // Retired after this page loaded (another tab, another admin): the server answers 409 `template-retired`.
  const retiredMeanwhile = isTemplateRetiredError(use.error);
  if (!open || retiredMeanwhile || template.retired) {
    return (
      <View style={styles.start}>
        {retiredMeanwhile ? (
          <View style={styles.wide}>
            <Banner tone="danger" title="Could not make your copy" message={cleanError(use.error)} testID="template-use-retired" />
          </View>
        ) : null}
        <Button label="Use this template" onPress={() => setOpen(true)} disabled={template.retired || retiredMeanwhile} testID="template-use" />
        {template.retired && !retiredMeanwhile ? <AppText variant="small" tone="muted">Retired: members can no longer use it.</AppText> : null}
        {template.myUses.length > 0 ? <AppText variant="small" tone="muted">{`You have used it ${template.myUses.length === 1 ? 'once' : `${template.myUses.length} times`}.`}</AppText> : null}
      </View>
    );
  }
  return (
    <FormSection title="Use this template" description={`Version ${template.latestVersion} becomes a recipe of yours; later versions do not change it.`} testID="template-use-form">
      <RigSitePickers rigId={rigId} onRig={(id) => (setRigId(id), setBandMap({}), setUnmapped(null), use.reset())} rigTestID="template-use-rig" />
      <TextField label="Recipe name" value={name} onChangeText={setName} maxLength={80} testID="template-use-name" />
      <TemplateTargetPickers tree={template.tree} suggested={template.suggestedTargets} value={targetPicks} onChange={setTargetPicks} />
      {unmapped ? (
        <View style={styles.bands} testID="template-bands">
          <AppText tone="muted">Your rig has no filter for these bands. Pick the one to use for each:</AppText>
          {unmapped.map((band) => (
            <SelectField key={band} label={`Filter for ${band}`} value={bandMap[band] ?? ''} choices={filterChoices} onChange={(v) => setBandMap((m) => ({ ...m, [band]: v }))} testID={`template-band-${band}`} />
          ))}
        </View>
      ) : null}
      {use.error && !unmappedBandsOf(use.error) ? (
        <Banner tone="danger" title="Could not make your copy" message={cleanError(use.error)} />
      ) : null}
      <View style={styles.actions}>
        <Button label="Make my copy" onPress={confirm} disabled={!rigId || missing.length > 0} pending={use.isPending} testID="template-use-confirm" />
        <Button label="Cancel" variant="ghost" onPress={() => setOpen(false)} />
      </View>
    </FormSection>
  );
}

const styles = StyleSheet.create({
  start: { gap: spacing.xs, alignItems: 'flex-start' },
  wide: { alignSelf: 'stretch' },
  bands: { gap: spacing.md },
  actions: { flexDirection: 'row', gap: spacing.sm },
});
