import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';

import { cumulativeSeries, filterName, hoursAxis, integrationText, type CumulativeSeries, type NightIntegration } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { fonts, spacing, type Palette } from '@/constants/theme';

const PAD = { left: 40, right: 14, top: 14, bottom: 26 };
const DAY_MS = 86_400_000;
const textProps = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

/**
 * Line looks per filter: palette colours only (the red night view turns them into shades of red),
 * each with its own dash so lines still differ where the colours are close.
 */
export function seriesLook(index: number, c: Palette): { colour: string; dash: string | undefined } {
  const colours = [c.accent, c.ok, c.moon, c.skyDay, c.danger, c.textMuted];
  const dashes = [undefined, '7 3', '2 3', '9 3 2 3', '4 4', '1 3'];
  return { colour: colours[index % colours.length]!, dash: dashes[index % dashes.length] };
}

type Plot = { left: number; right: number; top: number; bottom: number; startMs: number; endMs: number; maxHours: number };

const xOf = (p: Plot, ms: number) => p.left + ((ms - p.startMs) / (p.endMs - p.startMs)) * (p.right - p.left);
const yOf = (p: Plot, seconds: number) => p.bottom - (seconds / 3600 / p.maxHours) * (p.bottom - p.top);

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Night labels under the plot: "20 Nov" (with the year when the nights span more than one), never overlapping. */
function dateTicks(p: Plot, nightsMs: number[]): { ms: number; label: string; anchor: 'start' | 'middle' | 'end' }[] {
  const years = new Set(nightsMs.map((ms) => new Date(ms).getUTCFullYear()));
  const label = (ms: number) => {
    const d = new Date(ms);
    return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}${years.size > 1 ? ` ${d.getUTCFullYear()}` : ''}`;
  };
  const gapPx = years.size > 1 ? 84 : 52;
  const chosen: number[] = [];
  for (const ms of nightsMs) {
    const prev = chosen[chosen.length - 1];
    if (prev === undefined || xOf(p, ms) - xOf(p, prev) >= gapPx) chosen.push(ms);
  }
  // The last night is always labelled: it replaces a neighbour too close to it (but not the first).
  const lastNight = nightsMs[nightsMs.length - 1];
  if (lastNight !== undefined && chosen[chosen.length - 1] !== lastNight) {
    if (chosen.length > 1 && xOf(p, lastNight) - xOf(p, chosen[chosen.length - 1]!) < gapPx) chosen.pop();
    if (chosen.length === 0 || xOf(p, lastNight) - xOf(p, chosen[chosen.length - 1]!) >= gapPx) chosen.push(lastNight);
  }
  return chosen.map((ms) => {
    const x = xOf(p, ms);
    const anchor = x - p.left < gapPx / 2 ? 'start' : p.right - x < gapPx / 2 ? 'end' : 'middle';
    return { ms, label: label(ms), anchor };
  });
}

/** A step line: flat between nights, up on each night the filter was shot. */
function stepPath(p: Plot, s: CumulativeSeries): string {
  let d = '';
  let lastY = yOf(p, 0);
  s.points.forEach((pt, i) => {
    const x = xOf(p, pt.ms).toFixed(1);
    const y = yOf(p, pt.seconds).toFixed(1);
    d += i === 0 ? `M${x} ${lastY.toFixed(1)} L${x} ${y}` : ` L${x} ${lastY.toFixed(1)} L${x} ${y}`;
    lastY = yOf(p, pt.seconds);
  });
  const last = s.points[s.points.length - 1];
  if (last) d += ` L${p.right.toFixed(1)} ${lastY.toFixed(1)}`;
  return d;
}

function Legend({ series }: { series: CumulativeSeries[] }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  return (
    <View style={styles.legend} role="list" accessibilityLabel="Filters">
      {series.map((s, i) => {
        const look = seriesLook(i, palette);
        const total = s.points[s.points.length - 1]?.seconds ?? 0;
        return (
          <View key={filterName(s.filter)} style={styles.key} role="listitem">
            <Svg width={22} height={10}>
              <Line x1={1} x2={21} y1={5} y2={5} stroke={look.colour} strokeWidth={2.2} strokeDasharray={look.dash} />
            </Svg>
            <AppText variant="small" tabular>{`${filterName(s.filter)} · ${integrationText(total)}`}</AppText>
          </View>
        );
      })}
    </View>
  );
}

/** Cumulative integration per filter over the nights: how the total grew, and what each filter still lacks. */
export function IntegrationChart({ nights }: { nights: readonly NightIntegration[] }) {
  const { palette: c } = useTheme();
  const { isWide } = useBreakpoints();
  const [width, setWidth] = useState(0);
  const series = useMemo(() => cumulativeSeries(nights), [nights]);
  const height = isWide ? 240 : 200;
  const dates = nights.map((n) => Date.parse(`${n.nightDate}T12:00:00Z`)).sort((a, b) => a - b);
  const first = dates[0] ?? 0;
  const last = dates[dates.length - 1] ?? 0;
  // A single night (or nights close together) still gets a readable span.
  const padMs = Math.max(DAY_MS, (last - first) * 0.04);
  const maxSeconds = Math.max(0, ...series.map((s) => s.points[s.points.length - 1]?.seconds ?? 0));
  const axis = hoursAxis(maxSeconds);
  const plot: Plot = { left: PAD.left, right: Math.max(PAD.left + 1, width - PAD.right), top: PAD.top, bottom: height - PAD.bottom, startMs: first - padMs, endMs: last + padMs, maxHours: axis.maxHours };
  const grid = Array.from({ length: Math.round(axis.maxHours / axis.stepHours) + 1 }, (_, i) => i * axis.stepHours);
  const ticks = dateTicks(plot, [...new Set(dates)]);
  const summary = `Integration chart: ${series.map((s) => `${filterName(s.filter)} ${integrationText(s.points[s.points.length - 1]?.seconds ?? 0)}`).join(', ')} over ${nights.length} ${nights.length === 1 ? 'night' : 'nights'}.`;
  return (
    <View style={chartStyles.wrap} testID="history-chart">
      <View onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} role="img" accessibilityLabel={summary}>
        {width > 0 ? (
          <Svg width={width} height={height}>
            {grid.map((h) => (
              <G key={h}>
                <Line x1={plot.left} x2={plot.right} y1={yOf(plot, h * 3600)} y2={yOf(plot, h * 3600)} stroke={c.text} strokeOpacity={h === 0 ? 0.35 : 0.1} />
                <SvgText {...textProps} x={plot.left - 6} y={yOf(plot, h * 3600) + 4} textAnchor="end" fill={c.textMuted}>
                  {`${h} h`}
                </SvgText>
              </G>
            ))}
            {ticks.map((t) => (
              <G key={t.ms}>
                <Line x1={xOf(plot, t.ms)} x2={xOf(plot, t.ms)} y1={plot.top} y2={plot.bottom + 4} stroke={c.text} strokeOpacity={0.08} />
                <SvgText {...textProps} x={xOf(plot, t.ms)} y={plot.bottom + 17} textAnchor={t.anchor} fill={c.textMuted}>
                  {t.label}
                </SvgText>
              </G>
            ))}
            {series.map((s, i) => {
              const look = seriesLook(i, c);
              return (
                <G key={filterName(s.filter)}>
                  <Path d={stepPath(plot, s)} stroke={look.colour} strokeWidth={2.2} strokeDasharray={look.dash} fill="none" strokeLinejoin="round" />
                  {s.points.map((pt) => (
                    <Circle key={pt.nightDate} cx={xOf(plot, pt.ms)} cy={yOf(plot, pt.seconds)} r={3} fill={look.colour} />
                  ))}
                </G>
              );
            })}
          </Svg>
        ) : (
          <View style={{ height }} />
        )}
      </View>
      <Legend series={series} />
    </View>
  );
}

const chartStyles = StyleSheet.create({ wrap: { gap: spacing.sm } });

const makeStyles = (_c: Palette) =>
  StyleSheet.create({
    legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.xs },
    key: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  });
