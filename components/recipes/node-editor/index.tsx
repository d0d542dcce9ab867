import { StyleSheet, View } from 'react-native';

import { DraftSwitch, DraftText } from '@/components/recipes/node-editor/editor-field';
import type { EditorTarget } from '@/components/recipes/node-editor/editor-types';
import { KindForm } from '@/components/recipes/node-editor/kind-form';
import { NODE_KIND_HINTS, NODE_KIND_LABELS } from '@/components/recipes/node-editor/kind-text';
import { RulesSection } from '@/components/recipes/node-editor/rules-section';
import { useNodeEditor, type NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import { NodeIcon } from '@/components/recipes/node-icon';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import { defaultNewId, type NewId } from '@/shared/recipe/ids';
import type { NodeKind, RecipeNode } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';

export type { EditorFraming, EditorTarget } from '@/components/recipes/node-editor/editor-types';

export type NodeEditorProps = {
  node: RecipeNode;
  /** The recipe's rig: filter slots, gain and offset presets, the camera's cooling rate. */
  rig?: RigInput;
  targets: readonly EditorTarget[];
  /** Called only with a node `nodeSchema` accepts: same id, kind and children. */
  onApply(next: RecipeNode): void;
  onCancel(): void;
  testID?: string;
  /** Leave out the icon and kind title when the host already shows them (a sheet's title). */
  hideTitle?: boolean;
  /** Ids for new rules; `crypto.randomUUID` unless given. */
  newId?: NewId;
};

const CAUTION_KINDS: ReadonlySet<NodeKind> = new Set(['slew', 'centre', 'flats']);
const CAUTION = "Slews in twilight must keep clear of the Sun; follow the mount maker's manual.";

type HeaderProps = { ed: NodeEditorState; onApply: () => void; onCancel: () => void; hideTitle?: boolean };

/*
 * The actions sit in the header, above every field: an error that appears when a field loses
 * focus grows the form below them, so it can never move Apply away from a press in progress.
 */
function EditorHeader({ ed, onApply, onCancel, hideTitle }: HeaderProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const invalid = ed.submitted && Object.keys(ed.errors).length > 0;
  return (
    <View style={styles.headerBox}>
      <View style={styles.header}>
        {hideTitle ? (
          <View style={styles.title} />
        ) : (
          <>
            <View style={styles.icon}>
              <NodeIcon kind={ed.kind} size={20} color={palette.accent} />
            </View>
            <AppText variant="lead" weight="semibold" role="heading" aria-level={2} style={styles.title} numberOfLines={1}>
              {NODE_KIND_LABELS[ed.kind]}
            </AppText>
          </>
        )}
        <Button label="Cancel" variant="ghost" size="small" onPress={onCancel} testID="node-editor-cancel" />
        <Button label="Apply" size="small" onPress={onApply} testID="node-editor-apply" />
      </View>
      <AppText variant="small" tone={ed.summary ? 'accent' : 'faint'} numberOfLines={2} testID="node-editor-summary">
        {ed.summary ?? 'Finish the fields below to see the summary.'}
      </AppText>
      {invalid ? (
        <AppText variant="small" tone="danger" role="alert" testID="node-editor-invalid">
          Fix the marked fields to apply.
        </AppText>
      ) : null}
    </View>
  );
}

/** Edits one recipe node's parameters, label, enabled flag and (containers) rules. */
export function NodeEditor({ node, rig, targets, onApply, onCancel, testID, hideTitle, newId = defaultNewId }: NodeEditorProps) {
  const styles = useThemedStyles(makeStyles);
  const ed = useNodeEditor(node, targets);
  const apply = () => {
    const next = ed.apply();
    if (next) onApply(next);
  };
  const isContainer = node.kind === 'stage' || node.kind === 'repeat' || node.kind === 'group';
  return (
    <View style={styles.editor} testID={testID ?? 'node-editor'}>
      <EditorHeader ed={ed} onApply={apply} onCancel={onCancel} hideTitle={hideTitle} />
      <AppText variant="small" tone="muted">
        {NODE_KIND_HINTS[node.kind]}
      </AppText>
      {ed.submitted && ed.errors._ ? <Banner tone="danger" title="This step cannot be applied yet" message={ed.errors._} testID="node-editor-form-error" /> : null}
      <DraftText ed={ed} path="label" label="Label" placeholder={NODE_KIND_LABELS[node.kind]} />
      <KindForm ed={ed} rig={rig} targets={targets} />
      {CAUTION_KINDS.has(node.kind) ? (
        <AppText variant="small" tone="accent" style={styles.caution} testID="node-editor-caution">
          {CAUTION}
        </AppText>
      ) : null}
      {isContainer ? <RulesSection ed={ed} newId={newId} /> : null}
      <DraftSwitch ed={ed} path="enabled" label="Enabled" description="A disabled step stays in the recipe but does not run." />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    editor: { gap: spacing.md },
    headerBox: { gap: spacing.xs },
    header: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    icon: { width: 34, height: 34, borderRadius: radii.md, alignItems: 'center', justifyContent: 'center', backgroundColor: c.accentSoft },
    title: { flex: 1, minWidth: 0 },
    caution: { borderLeftWidth: 2, borderLeftColor: c.accent, paddingLeft: spacing.sm },
  });
