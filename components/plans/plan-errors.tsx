import { Platform, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { PlanIssue } from '@/shared/plan/yaml-read';

type PlanErrorsProps = { issues: PlanIssue[]; text: string };

const CONTEXT_LINES = 2;
const EXCERPTS_SHOWN = 3;
export const codeFont = Platform.select({ web: 'ui-monospace, SFMono-Regular, Menlo, Consolas, monospace', default: 'monospace' });

/** Lines `line ± CONTEXT_LINES` of the text, numbered from 1. */
function excerpt(lines: string[], line: number): { n: number; text: string }[] {
  const from = Math.max(1, line - CONTEXT_LINES);
  const to = Math.min(lines.length, line + CONTEXT_LINES);
  return Array.from({ length: Math.max(0, to - from + 1) }, (_, i) => ({ n: from + i, text: lines[from + i - 1] ?? '' }));
}

/** Why a plan was refused: every problem by line, column and path, and the offending lines of the text highlighted. */
export function PlanErrors({ issues, text }: PlanErrorsProps) {
  const styles = useThemedStyles(makeStyles);
  const lines = text.split(/\r?\n/);
  const located = [...new Set(issues.map((i) => i.line).filter((l): l is number => l !== null && l <= lines.length))].slice(0, EXCERPTS_SHOWN);
  return (
    <View style={styles.box} testID="plan-import-errors" role="alert">
      <AppText weight="semibold" tone="danger">
        {issues.length === 1 ? 'The plan has a problem' : `The plan has ${issues.length} problems`}
      </AppText>
      {issues.map((issue, i) => (
        <View key={`${i}-${issue.path}`} style={styles.issue} testID="plan-import-issue">
          <AppText variant="small" tone="muted" tabular>
            {issue.line !== null ? `Line ${issue.line}, column ${issue.column ?? 1}` : 'Whole file'}
            {issue.path ? ` · ${issue.path}` : ''}
          </AppText>
          <AppText variant="small">{issue.message}</AppText>
        </View>
      ))}
      {located.map((line) => (
        <View key={line} style={styles.code} testID={`plan-import-excerpt-${line}`}>
          {excerpt(lines, line).map((row) => (
            <View key={row.n} style={[styles.row, row.n === line && styles.hit]} testID={row.n === line ? 'plan-import-highlight' : undefined}>
              <AppText variant="small" tone={row.n === line ? 'danger' : 'faint'} tabular style={styles.number}>
                {String(row.n)}
              </AppText>
              <AppText variant="small" style={styles.source} selectable>
                {row.text === '' ? ' ' : row.text.replace(/ /g, '\u00a0')}
              </AppText>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    box: { gap: spacing.sm, borderWidth: 1, borderColor: c.danger, backgroundColor: c.dangerSoft, borderRadius: radii.md, padding: spacing.md },
    issue: { gap: spacing.xxs },
    code: { borderRadius: radii.sm, backgroundColor: c.background, paddingVertical: spacing.xs, overflow: 'hidden' },
    row: { flexDirection: 'row', gap: spacing.sm, paddingHorizontal: spacing.sm },
    hit: { backgroundColor: c.dangerSoft, borderLeftWidth: 3, borderLeftColor: c.danger },
    number: { width: 40, textAlign: 'right' },
    source: { flex: 1, fontFamily: codeFont },
  });
