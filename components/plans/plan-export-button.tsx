import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { SwitchRow } from '@/components/ui/switch-row';
import { usePlanExportMutation } from '@/hooks/use-plans';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { downloadText } from '@/lib/files';
import { planFileName } from '@/shared/plan/file-name';
import { radii, spacing, type Palette } from '@/constants/theme';

type PlanExportButtonProps = { recipeId: string; recipeName: string };

/** The server's name for the download: the recipe's name and the plan's night. */
const fileName = (recipeName: string, text: string) => planFileName(recipeName, /^ {2}date: "?(\d{4}-\d{2}-\d{2})"?$/m.exec(text)?.[1]);

async function copyText(text: string): Promise<void> {
  if (typeof navigator === 'undefined' || !navigator.clipboard) throw new Error('Copying needs a browser with clipboard access; download the file instead');
  await navigator.clipboard.writeText(text);
}

/**
 * Export of a saved recipe as an open YAML plan: download the file or copy it, optionally with
 * the dry run's estimate (timeline summary and findings for the plan's night).
 */
export function PlanExportButton({ recipeId, recipeName }: PlanExportButtonProps) {
  const styles = useThemedStyles(makeStyles);
  const [open, setOpen] = useState(false);
  const [estimate, setEstimate] = useState(false);
  const [status, setStatus] = useState<{ tone: 'ok' | 'danger'; text: string } | null>(null);
  const plan = usePlanExportMutation();

  const run = (deliver: (text: string) => Promise<void> | void, done: string) => {
    setStatus(null);
    plan.mutate(
      { recipeId, estimate },
      {
        onSuccess: async (text) => {
          try {
            await deliver(text);
            setStatus({ tone: 'ok', text: done });
          } catch (err) {
            setStatus({ tone: 'danger', text: cleanError(err) });
          }
        },
        onError: (err) => setStatus({ tone: 'danger', text: cleanError(err) }),
      },
    );
  };

  return (
    <View style={styles.wrap}>
      <Button label={open ? 'Plan (.yaml) ▴' : 'Plan (.yaml) ▾'} variant="secondary" size="small" onPress={() => setOpen(!open)} testID="plan-export" accessibilityLabel="Export the plan" />
      {open ? (
        <View style={styles.panel}>
          <SwitchRow label="Include the dry-run estimate" description="The timeline summary and findings for the plan’s night." value={estimate} onValueChange={setEstimate} testID="plan-export-estimate" />
          <View style={styles.row}>
            <Button label="Download plan (.yaml)" size="small" pending={plan.isPending} onPress={() => run((text) => downloadText(fileName(recipeName, text), text, 'text/yaml'), 'Downloaded')} testID="plan-export-download" />
            <Button label="Copy to clipboard" size="small" variant="secondary" disabled={plan.isPending} onPress={() => run(copyText, 'Copied')} testID="plan-export-copy" />
          </View>
          {status ? (
            <AppText variant="small" tone={status.tone} role={status.tone === 'danger' ? 'alert' : 'status'} testID="plan-export-status">
              {status.text}
            </AppText>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    wrap: { gap: spacing.sm },
    panel: { gap: spacing.sm, borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, backgroundColor: c.surface },
    row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  });
