import { StyleSheet, View } from 'react-native';

import type { RuleDraft } from '@/components/recipes/node-editor/draft-types';
import { EditorText, FieldError, inputID } from '@/components/recipes/node-editor/editor-field';
import { newRuleDraft, RULE_LABELS, ruleFieldPath } from '@/components/recipes/node-editor/rules-draft';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { NewId } from '@/shared/recipe/ids';
import { RULE_KINDS } from '@/shared/recipe/rules';

const EVERY = [
  { value: 'minutes', label: 'Minutes' },
  { value: 'frames', label: 'Frames' },
] as const;

const FIELD_LABEL: Record<RuleDraft['kind'], string> = {
  'refocus-on-temperature': 'After a change of (°C)',
  'refocus-on-interval': 'Every',
  'recentre-on-drift': 'When drift exceeds (′)',
};

function ruleValue(rule: RuleDraft): { value: string; patch: (v: string) => Partial<RuleDraft> } {
  if (rule.kind === 'refocus-on-temperature') return { value: rule.deltaC, patch: (v) => ({ deltaC: v }) };
  if (rule.kind === 'recentre-on-drift') return { value: rule.driftArcmin, patch: (v) => ({ driftArcmin: v }) };
  return { value: rule.everyValue, patch: (v) => ({ everyValue: v }) };
}

type RuleRowProps = { ed: NodeEditorState; rule: RuleDraft; index: number };

function RuleRow({ ed, rule, index }: RuleRowProps) {
  const styles = useThemedStyles(makeStyles);
  const path = ruleFieldPath(index, rule);
  const { value, patch } = ruleValue(rule);
  const change = (next: Partial<RuleDraft>) => ed.setRules((rules) => rules.map((r) => (r.id === rule.id ? { ...r, ...next } : r)));
  const unit = rule.everyMode === 'frames' ? 'frames' : 'min';
  const label = rule.kind === 'refocus-on-interval' ? `Every (${unit})` : FIELD_LABEL[rule.kind];
  const modePath = `rules.${index}.every.mode`;
  return (
    <View style={styles.rule}>
      <View style={styles.head}>
        <AppText weight="semibold" style={styles.grow}>
          {RULE_LABELS[rule.kind]}
        </AppText>
        <Button label="Remove" accessibilityLabel={`Remove rule ${RULE_LABELS[rule.kind]}`} size="small" variant="ghost" onPress={() => ed.setRules((rules) => rules.filter((r) => r.id !== rule.id))} testID={`node-editor-rules.${index}-remove`} />
      </View>
      {rule.kind === 'refocus-on-interval' ? (
        <>
          <ChoiceGroup label="Count in" choices={EVERY} value={rule.everyMode} onChange={(m) => change({ everyMode: m })} testID={inputID(modePath)} />
          <FieldError path={modePath} message={ed.errorFor(modePath)} />
        </>
      ) : null}
      <EditorText path={path} label={label} value={value} numeric onChangeText={(v) => change(patch(v))} onBlur={() => ed.blur(path)} error={ed.errorFor(path)} />
    </View>
  );
}

/** Standing rules of a container: refocus on temperature or interval, recentre on drift. */
export function RulesSection({ ed, newId }: { ed: NodeEditorState; newId: NewId }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.section} testID="node-editor-rules">
      <AppText variant="small" weight="semibold" eyebrow tone="faint" role="heading" aria-level={3}>
        Rules while it runs
      </AppText>
      {ed.rules.length === 0 ? (
        <AppText variant="small" tone="faint">
          None. Steps inside run as listed.
        </AppText>
      ) : null}
      {ed.rules.map((rule, i) => (
        <RuleRow key={rule.id} ed={ed} rule={rule} index={i} />
      ))}
      <View style={styles.adds}>
        {RULE_KINDS.map((kind) => (
          <Button key={kind} label={`+ ${RULE_LABELS[kind]}`} size="small" variant="secondary" onPress={() => ed.setRules((rules) => [...rules, newRuleDraft(kind, newId())])} testID={`node-editor-rules-add-${kind}`} />
        ))}
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    section: { gap: spacing.sm },
    rule: { gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border, backgroundColor: c.surface },
    head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    grow: { flex: 1 },
    adds: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  });
