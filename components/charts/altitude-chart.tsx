import { useId, useMemo, useState, type ReactNode } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { ClipPath, Defs, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { curveRuns, limitPaths, moonPath, pathOf, xOf, yOf, type Plot } from '@/components/charts/altitude-geometry';
import { AltitudeLegend } from '@/components/charts/altitude-legend';
import { skyColour } from '@/components/tonight/night-band';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { bandSpan, hourTicks, skyStretches } from '@/lib/night-band';
import { formatClock, formatDurationHours } from '@/lib/format';
import { fonts, spacing, type Palette } from '@/constants/theme';
import type { TargetVisibility } from '@/shared/ephemeris/visibility';
import type { Night } from '@/shared/schemas/night';

const PAD = { left: 34, right: 12, top: 26, bottom: 26 };
const ALT_GRID_DEG = [0, 30, 60, 90];
const MIN_TICK_GAP_PX = 40;

type AltitudeChartProps = {
  night: Night;
  visibility: TargetVisibility;
  nowMs?: number;
  /** Drawn over the curve inside the plot (clipped to it), in the chart's own geometry: e.g. a dry run's blocks. */
  overlay?: (plot: Plot) => ReactNode;
  /** Off where several charts share one key. */
  showLegend?: boolean;
};

const textProps = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

function Grid({ plot, c }: { plot: Plot; c: Palette }) {
  return (
    <G>
      {ALT_GRID_DEG.map((alt) => (
        <G key={alt}>
          <Line x1={plot.left} x2={plot.right} y1={yOf(plot, alt)} y2={yOf(plot, alt)} stroke={c.text} strokeOpacity={alt === 0 ? 0.35 : 0.1} />
          <SvgText {...textProps} x={plot.left - 6} y={yOf(plot, alt) + 4} textAnchor="end" fill={c.textMuted}>
            {`${alt}°`}
          </SvgText>
        </G>
      ))}
    </G>
  );
}

function TimeAxis({ plot, night, c }: { plot: Plot; night: Night; c: Palette }) {
  const spanHours = (plot.endMs - plot.startMs) / 3_600_000;
  const every = [1, 2, 3, 4, 6].find((h) => ((plot.right - plot.left) / spanHours) * h >= MIN_TICK_GAP_PX) ?? 6;
  const ticks = hourTicks(plot.startMs, plot.endMs, night.timeZone, every);
  return (
    <G>
      {ticks.map((t) => (
        <G key={t.ms}>
          <Line x1={xOf(plot, t.ms)} x2={xOf(plot, t.ms)} y1={plot.top} y2={plot.bottom + 4} stroke={c.text} strokeOpacity={0.08} />
          <SvgText {...textProps} x={xOf(plot, t.ms)} y={plot.bottom + 17} textAnchor="middle" fill={c.textMuted}>
            {t.label}
          </SvgText>
        </G>
      ))}
    </G>
  );
}

function TransitMarker({ plot, visibility, timeZone, c }: { plot: Plot; visibility: TargetVisibility; timeZone: string; c: Palette }) {
  if (!visibility.transit) return null;
  const ms = Date.parse(visibility.transit);
  if (ms < plot.startMs || ms > plot.endMs) return null;
  const x = xOf(plot, ms);
  const nearRight = x > plot.right - 90;
  const nearLeft = x < plot.left + 90;
  return (
    <G>
      <Line x1={x} x2={x} y1={plot.top - 4} y2={plot.bottom} stroke={c.text} strokeOpacity={0.55} strokeDasharray="2 3" />
      <SvgText {...textProps} x={x} y={plot.top - 9} textAnchor={nearRight ? 'end' : nearLeft ? 'start' : 'middle'} fill={c.text}>
        {`Transit ${formatClock(ms, timeZone)} · ${Math.round(visibility.transitAltDeg)}°`}
      </SvgText>
    </G>
  );
}

function NowMarker({ plot, ms, c }: { plot: Plot; ms: number; c: Palette }) {
  const x = xOf(plot, ms);
  const atRight = x > plot.right - 36;
  return (
    <G>
      <Line x1={x} x2={x} y1={plot.top} y2={plot.bottom} stroke={c.nowMarker} strokeWidth={1.5} strokeOpacity={0.8} />
      <SvgText {...textProps} x={x + (atRight ? -5 : 5)} y={plot.bottom - 6} textAnchor={atRight ? 'end' : 'start'} fill={c.nowMarker}>
        Now
      </SvgText>
    </G>
  );
}

function summaryOf(night: Night, v: TargetVisibility): string {
  if (v.neverRises) return 'Altitude chart: the target does not rise above the horizon this night.';
  const transit = v.transit ? ` Transit at ${formatClock(v.transit, night.timeZone)}, ${Math.round(v.transitAltDeg)}° high.` : '';
  const usable = v.usableDarkMinutes > 0 && v.firstUsable && v.lastUsable
    ? `usable in darkness for ${formatDurationHours(v.usableDarkMinutes / 60)}, ${formatClock(v.firstUsable, night.timeZone)} to ${formatClock(v.lastUsable, night.timeZone)}.`
    : 'not above its limit during darkness.';
  return `Altitude chart: ${usable}${transit}`;
}

/**
 * Altitude through the night (sunset − 1 h to sunrise + 1 h): twilight shading from the Sun's
 * samples, the limit the target must clear (horizon profile or minimum altitude), the target's
 * curve (solid where usable, faint elsewhere), the Moon (dashed) and the transit.
 */
export function AltitudeChart({ night, visibility, nowMs, overlay, showLegend = true }: AltitudeChartProps) {
  const { palette: c } = useTheme();
  // Several charts may share a page: each clip path needs its own id.
  const clipId = `altitude-plot-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { isWide } = useBreakpoints();
  const [width, setWidth] = useState(0);
  const height = isWide ? 280 : 230;
  const { startMs, endMs } = bandSpan(night);
  const plot: Plot = { left: PAD.left, right: Math.max(PAD.left + 1, width - PAD.right), top: PAD.top, bottom: height - PAD.bottom, startMs, endMs };
  const sky = useMemo(() => skyStretches(night, startMs, endMs), [night, startMs, endMs]);
  const runs = useMemo(() => curveRuns(visibility, night, startMs, endMs), [visibility, night, startMs, endMs]);
  const limit = limitPaths(plot, visibility);
  const showNow = nowMs !== undefined && nowMs >= startMs && nowMs <= endMs;

  return (
    <View style={styles.wrap} testID="target-visibility-chart">
      <View onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} role="img" accessibilityLabel={summaryOf(night, visibility)}>
        {width > 0 ? (
          <Svg width={width} height={height}>
            <Defs>
              <ClipPath id={clipId}>
                <Rect x={plot.left} y={plot.top} width={plot.right - plot.left} height={plot.bottom - plot.top} />
              </ClipPath>
            </Defs>
            <G clipPath={`url(#${clipId})`}>
              {sky.map((s) => (
                <Rect key={`${s.kind}-${s.startMs}`} x={xOf(plot, s.startMs)} y={plot.top} width={Math.max(0, xOf(plot, s.endMs) - xOf(plot, s.startMs)) + 0.5} height={plot.bottom - plot.top} fill={skyColour(s.kind, c)} />
              ))}
              <Path d={limit.area} fill={c.danger} fillOpacity={0.12} />
              <Path d={limit.line} stroke={c.danger} strokeWidth={1.3} fill="none" />
              <Path d={moonPath(plot, night)} stroke={c.moon} strokeWidth={1.5} strokeDasharray="5 4" fill="none" />
              {runs.map((r) => (
                <Path key={`run-${r.points[0]?.ms}`} d={pathOf(plot, r.points)} stroke={c.accent} strokeWidth={r.usable ? 2.6 : 1.6} strokeOpacity={r.usable ? 1 : 0.4} fill="none" strokeLinejoin="round" />
              ))}
              {overlay?.(plot)}
            </G>
            <Grid plot={plot} c={c} />
            <TimeAxis plot={plot} night={night} c={c} />
            <TransitMarker plot={plot} visibility={visibility} timeZone={night.timeZone} c={c} />
            {showNow ? <NowMarker plot={plot} ms={nowMs} c={c} /> : null}
          </Svg>
        ) : (
          <View style={{ height }} />
        )}
      </View>
      {showLegend ? <AltitudeLegend /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
});
