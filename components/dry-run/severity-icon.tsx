import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Path } from 'react-native-svg';

import { severityColour, severitySoft } from '@/components/dry-run/colours';
import type { Severity } from '@/components/dry-run/totals-rows';
import { useTheme } from '@/components/theme-provider';
import { AppText } from '@/components/ui/app-text';
import { radii, spacing } from '@/constants/theme';

export const SEVERITY_WORD: Record<Severity, string> = { stop: 'Stop', warn: 'Warning', info: 'Note' };
export const SEVERITY_PLURAL: Record<Severity, string> = { stop: 'Stops', warn: 'Warnings', info: 'Notes' };

/** A shape per severity, so it never rests on colour alone: octagon, triangle, circle. */
export function SeverityIcon({ severity, size = 16 }: { severity: Severity; size?: number }) {
  const { palette: c } = useTheme();
  const colour = severityColour(severity, c);
  return (
    <Svg width={size} height={size} viewBox="0 0 16 16" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {severity === 'stop' ? (
        <>
          <Path d="M5.2 1.5h5.6l3.7 3.7v5.6l-3.7 3.7H5.2l-3.7-3.7V5.2z" fill={colour} />
          <Line x1={4.8} x2={11.2} y1={8} y2={8} stroke={c.background} strokeWidth={2} strokeLinecap="round" />
        </>
      ) : severity === 'warn' ? (
        <>
          <Path d="M8 1.6l6.6 12H1.4z" fill={colour} strokeLinejoin="round" />
          <Line x1={8} x2={8} y1={6} y2={9.4} stroke={c.background} strokeWidth={1.8} strokeLinecap="round" />
          <Circle cx={8} cy={11.6} r={1} fill={c.background} />
        </>
      ) : (
        <>
          <Circle cx={8} cy={8} r={6.5} fill="none" stroke={colour} strokeWidth={1.5} />
          <Line x1={8} x2={8} y1={7.2} y2={11.4} stroke={colour} strokeWidth={1.6} strokeLinecap="round" />
          <Circle cx={8} cy={4.9} r={1} fill={colour} />
        </>
      )}
    </Svg>
  );
}

/** Icon and word in the severity's colour on its soft ground. */
export function SeverityTag({ severity, count }: { severity: Severity; count?: number }) {
  const { palette: c } = useTheme();
  const word = count === undefined ? SEVERITY_WORD[severity] : `${count} ${(count === 1 ? SEVERITY_WORD : SEVERITY_PLURAL)[severity].toLowerCase()}`;
  return (
    <View style={[styles.tag, { backgroundColor: severitySoft(severity, c), borderColor: severityColour(severity, c) }]}>
      <SeverityIcon severity={severity} size={13} />
      <AppText variant="caption" weight="semibold" tabular style={{ color: severityColour(severity, c) }}>
        {word}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  tag: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, paddingHorizontal: spacing.sm, paddingVertical: 2, borderRadius: radii.pill, borderWidth: 1, alignSelf: 'flex-start' },
});
