import { router } from 'expo-router';
import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';

import { ComposerBody } from '@/components/recipes/composer-body';
import { ComposerHeader } from '@/components/recipes/composer-header';
import { ConflictBanner } from '@/components/recipes/conflict-banner';
import { FindingsPanel } from '@/components/recipes/findings-panel';
import { HistoryPanel } from '@/components/recipes/history-panel';
import { useComposerScreen } from '@/components/recipes/use-composer-screen';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { spacing, type Palette } from '@/constants/theme';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

/** The recipe composer: header, the drag list of steps, palette, step editor, findings, history. */
export function Composer({ recipe, initialSelect }: { recipe: RecipeDetail; initialSelect?: string }) {
  const styles = useThemedStyles(makeStyles);
  const { isTablet } = useBreakpoints();
  const s = useComposerScreen(recipe);
  const { composer, autosave, view, setPanel } = s;
  const { doc } = composer;
  // Opened on one step (a dry-run finding): select it, scroll to it and open its editor.
  const { select } = composer.actions;
  const { isWide } = s;
  useEffect(() => {
    if (!initialSelect) return;
    select(initialSelect, true);
    if (!isWide) setPanel('editor');
    // Only on arrival: later selections are the user's.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [initialSelect]);
  return (
    <View style={[styles.screen, isTablet && styles.screenWide]} testID="composer-screen">
      <ComposerHeader
        name={doc.name}
        onRename={(name) => composer.actions.setDoc({ name })}
        rigId={doc.rigId}
        siteId={doc.siteId}
        rigs={s.rigChoices}
        sites={s.siteChoices}
        onRig={(rigId) => composer.actions.setDoc({ rigId })}
        onSite={(siteId) => composer.actions.setDoc({ siteId })}
        saveState={autosave.state}
        onRetry={autosave.retry}
        findingCount={view.findings.length}
        worst={view.worst}
        onFindings={() => setPanel('findings')}
        canUndo={composer.canUndo}
        canRedo={composer.canRedo}
        onUndo={composer.actions.undo}
        onRedo={composer.actions.redo}
        onHistory={() => setPanel('history')}
        facts={view.facts}
        onDryRun={() => router.push(`/recipes/${recipe.id}/dry-run`)}
        recipeId={recipe.id}
      />
      <ConflictBanner failure={autosave.failure} otherErrors={view.errors.other} onLoadTheirs={(current) => s.adopt(current, 'replace')} onOverwrite={autosave.overwrite} />
      <ComposerBody composer={composer} actions={s.actions} view={view} can={s.can} rig={s.rig} targets={s.targets} panel={s.panel} setPanel={setPanel} onSelectRow={s.onSelectRow} selection={s.selection} listRef={s.listRef} treeRef={s.treeRef} />
      <FindingsPanel
        open={s.panel === 'findings'}
        onClose={() => setPanel('none')}
        findings={view.findings}
        stepName={s.stepName}
        onShow={(id) => {
          composer.actions.select(id, true);
          setPanel(s.isWide ? 'none' : 'editor');
        }}
      />
      <HistoryPanel
        open={s.panel === 'history'}
        onClose={() => setPanel('none')}
        recipeId={recipe.id}
        version={autosave.version}
        canRestore={autosave.state === 'saved'}
        onRestored={(server) => {
          s.adopt(server, 'push');
          setPanel('none');
        }}
      />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    screen: { flex: 1, backgroundColor: c.background, paddingTop: spacing.md, paddingHorizontal: spacing.md },
    screenWide: { paddingTop: spacing.xl, paddingHorizontal: spacing.xl },
  });
