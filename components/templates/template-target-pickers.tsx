import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { SelectField } from '@/components/ui/select-field';
import { useTargetsQuery } from '@/hooks/use-targets';
import { spacing } from '@/constants/theme';
import { walk } from '@/shared/recipe/tree';
import type { RecipeTree } from '@/shared/recipe/types';
import type { SuggestedTarget } from '@/shared/recipe/template';

/** The template's stages in order, with the publisher's suggested target of each. */
export function templateStages(tree: RecipeTree, suggested: Record<string, SuggestedTarget>) {
  const stages: { id: string; label: string; suggestion: SuggestedTarget | undefined }[] = [];
  walk(tree, (node) => {
    if (node.kind === 'stage') stages.push({ id: node.id, label: node.label ?? `Stage ${stages.length + 1}`, suggestion: suggested[node.id] });
  });
  return stages;
}

/**
 * One target picker per stage of the template: the user's own targets, preselected where one
 * has the suggested designation; "Leave open" keeps the stage without a target.
 */
export function TemplateTargetPickers({ tree, suggested, value, onChange }: { tree: RecipeTree; suggested: Record<string, SuggestedTarget>; value: Record<string, string | null>; onChange: (next: Record<string, string | null>) => void }) {
  const targets = useTargetsQuery();
  const stages = templateStages(tree, suggested);
  if (stages.length === 0) return null;
  const choices = [{ value: '', label: 'Leave open' }, ...(targets.data ?? []).map((t) => ({ value: t.id, label: t.name ? `${t.designation} · ${t.name}` : t.designation }))];
  const pick = (stageId: string, suggestion: SuggestedTarget | undefined) => {
    if (stageId in value) return value[stageId] ?? '';
    return (targets.data ?? []).find((t) => suggestion && t.designation === suggestion.designation)?.id ?? '';
  };
  return (
    <View style={styles.wrap} testID="template-targets">
      <AppText tone="muted">Choose the target of each stage from your list.</AppText>
      {stages.map((s) => (
        <SelectField
          key={s.id}
          label={s.suggestion ? `${s.label} (suggested: ${s.suggestion.designation})` : s.label}
          value={pick(s.id, s.suggestion)}
          choices={choices}
          onChange={(v) => onChange({ ...value, [s.id]: v || null })}
          testID={`template-target-${s.id}`}
        />
      ))}
    </View>
  );
}

/** The stage → target choices to send: explicit picks, else the preselected suggestion. */
export function chosenTargets(tree: RecipeTree, suggested: Record<string, SuggestedTarget>, picks: Record<string, string | null>, mine: { id: string; designation: string }[]) {
  const out: Record<string, string | null> = {};
  for (const s of templateStages(tree, suggested)) {
    out[s.id] = s.id in picks ? (picks[s.id] ?? null) : (mine.find((t) => s.suggestion && t.designation === s.suggestion.designation)?.id ?? null);
  }
  return out;
}

const styles = StyleSheet.create({ wrap: { gap: spacing.md } });
