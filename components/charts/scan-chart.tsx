import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { dateTicks, scanBars, scanMaxHours, yOfHours, type ScanPlot } from '@/components/dry-run/scan-geometry';
import type { NightScan } from '@/components/dry-run/scan-state';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { fonts, type Palette } from '@/constants/theme';

type ScanChartProps = {
  nights: NightScan[];
  /** Nights asked for: the axis is laid out for all of them from the start. */
  total: number;
  best: ReadonlySet<string>;
  selectedDate: string | null;
  onSelect: (date: string) => void;
  summary: string;
};

const PAD = { left: 44, right: 8, top: 12, bottom: 44 };
const STOP_ROW = 10;
const text = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

function HoursGrid({ plot, maxHours, c }: { plot: ScanPlot; maxHours: number; c: Palette }) {
  const steps = [0, maxHours / 2, maxHours];
  return (
    <G>
      {steps.map((h) => (
        <G key={h}>
          <Line x1={plot.left} x2={plot.right} y1={yOfHours(plot, h, maxHours)} y2={yOfHours(plot, h, maxHours)} stroke={c.text} strokeOpacity={h === 0 ? 0.3 : 0.08} />
          <SvgText {...text} x={plot.left - 6} y={yOfHours(plot, h, maxHours) + 4} textAnchor="end" fill={c.textMuted}>
            {`${h} h`}
          </SvgText>
        </G>
      ))}
    </G>
  );
}

/**
 * Usable integration per night (solid), over all integration (faint), with a row of marks under
 * the axis for nights that have a stop finding. The five best nights are drawn brighter; tap a
 * night to dry-run it.
 */
export function ScanChart({ nights, total, best, selectedDate, onSelect, summary }: ScanChartProps) {
  const { palette: c } = useTheme();
  const { isWide } = useBreakpoints();
  const [width, setWidth] = useState(0);
  const height = isWide ? 230 : 190;
  const plot: ScanPlot = { left: PAD.left, right: Math.max(PAD.left + 1, width - PAD.right), top: PAD.top, bottom: height - PAD.bottom };
  const maxHours = scanMaxHours(nights);
  const bars = scanBars(nights, total, plot, maxHours);
  const ticks = dateTicks(nights.map((n) => n.date), total, plot, 34);
  const stopY = plot.bottom + 6;

  return (
    <View onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} role="img" accessibilityLabel={summary} testID="scan-chart">
      {width > 0 ? (
        <Svg width={width} height={height}>
          <HoursGrid plot={plot} maxHours={maxHours} c={c} />
          {bars.map((b) => {
            const strong = best.has(b.date) || b.date === selectedDate;
            return (
              <G key={b.date}>
                <Rect x={b.barX} y={b.totalY} width={b.barWidth} height={plot.bottom - b.totalY} fill={c.accent} fillOpacity={0.22} />
                <Rect x={b.barX} y={b.usableY} width={b.barWidth} height={plot.bottom - b.usableY} fill={c.accent} fillOpacity={strong ? 1 : 0.62} />
                {b.date === selectedDate ? <Rect x={b.slotX} y={plot.top} width={b.slotWidth} height={plot.bottom - plot.top} fill="none" stroke={c.text} strokeWidth={1.5} /> : null}
                {b.stop ? <Rect x={b.barX} y={stopY} width={Math.max(1.5, b.barWidth)} height={STOP_ROW - 2} rx={1} fill={c.danger} /> : null}
              </G>
            );
          })}
          <SvgText {...text} x={plot.left - 6} y={stopY + 8} textAnchor="end" fill={c.danger}>
            Stop
          </SvgText>
          {ticks.map((t) => (
            <SvgText key={`${t.x}-${t.label}`} {...text} x={t.x} y={plot.bottom + STOP_ROW + 24} textAnchor="middle" fill={c.textMuted}>
              {t.label}
            </SvgText>
          ))}
          {bars.map((b) => (
            <Rect key={`hit-${b.date}`} x={b.slotX} y={plot.top} width={Math.max(1, b.slotWidth)} height={plot.bottom - plot.top + STOP_ROW + 6} fill="transparent" onPress={() => onSelect(b.date)} />
          ))}
        </Svg>
      ) : (
        <View style={[styles.placeholder, { height }]} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  placeholder: { width: '100%' },
});
