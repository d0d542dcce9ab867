import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { ClipPath, Defs, G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { formatClockRange } from '@/components/dry-run/run-format';
import { xAt, tickEveryHours, type TimeScale } from '@/components/dry-run/time-scale';
import { bandSpanWithRun, runExtent, timedEvents } from '@/components/dry-run/timeline-rows';
import { useTheme } from '@/components/theme-provider';
import { NightBandLegend } from '@/components/tonight/night-band-legend';
import { skyColour } from '@/components/tonight/night-band';
import { bandSpan, hourTicks, moonUpStretches, skyStretches } from '@/lib/night-band';
import { fonts, spacing } from '@/constants/theme';
import type { DryRunResult } from '@/shared/dry-run/types';

const HEIGHT = 118;
const SIDE = 14;
const BRACKET_Y = 22;
const BAND_TOP = 30;
const BAND_H = 44;
const MOON_TOP = BAND_TOP + BAND_H + 8;
const TICK_TOP = MOON_TOP + 10;
const text = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

/** The night's sky (twilight, darkness, the Moon) across the run, with the recipe's start and end marked. */
export function RunBand({ result, nowMs }: { result: DryRunResult; nowMs: number }) {
  const { palette: c } = useTheme();
  const [width, setWidth] = useState(0);
  const night = result.sky;
  const run = useMemo(() => runExtent(timedEvents(result), result.totals.nightEnd), [result]);
  const span = bandSpanWithRun(bandSpan(night), run);
  const scale: TimeScale = { ...span, left: SIDE, right: Math.max(SIDE + 1, width - SIDE) };
  const x = (ms: number) => xAt(scale, ms);
  const sky = useMemo(() => skyStretches(night, span.startMs, span.endMs), [night, span.startMs, span.endMs]);
  const moon = useMemo(() => moonUpStretches(night, span.startMs, span.endMs), [night, span.startMs, span.endMs]);
  const every = tickEveryHours(span.endMs - span.startMs, scale.right - scale.left, 40);
  const ticks = hourTicks(span.startMs, span.endMs, night.timeZone, every);
  const runLabel = run ? `Recipe ${formatClockRange(run.startMs, run.endMs, night.timeZone)}` : 'Nothing runs';
  const runMid = run ? (x(run.startMs) + x(run.endMs)) / 2 : 0;
  const showNow = nowMs > span.startMs && nowMs < span.endMs;

  return (
    <View style={styles.wrap} testID="dry-run-band">
      <View onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} role="img" accessibilityLabel={`Night band: ${runLabel}, in the night's twilight and moonlight.`}>
        {width > 0 ? (
          <Svg width={width} height={HEIGHT}>
            <Defs>
              <ClipPath id="run-band-clip">
                <Rect x={SIDE} y={BAND_TOP} width={scale.right - SIDE} height={BAND_H} rx={7} />
              </ClipPath>
            </Defs>
            <G clipPath="url(#run-band-clip)">
              {sky.map((s) => (
                <Rect key={`${s.kind}-${s.startMs}`} x={x(s.startMs)} y={BAND_TOP} width={Math.max(0, x(s.endMs) - x(s.startMs)) + 0.5} height={BAND_H} fill={skyColour(s.kind, c)} />
              ))}
            </G>
            <Rect x={SIDE} y={BAND_TOP} width={scale.right - SIDE} height={BAND_H} rx={7} fill="none" stroke={c.border} />
            {run ? (
              <G>
                {[run.startMs, run.endMs].map((ms) => (
                  <Line key={ms} x1={x(ms)} x2={x(ms)} y1={BRACKET_Y - 3} y2={BAND_TOP + BAND_H} stroke={c.accent} strokeWidth={1.5} />
                ))}
                <Line x1={x(run.startMs)} x2={x(run.endMs)} y1={BRACKET_Y} y2={BRACKET_Y} stroke={c.accent} strokeWidth={1.5} />
                <SvgText {...text} x={Math.min(Math.max(runMid, SIDE + 60), scale.right - 60)} y={BRACKET_Y - 7} textAnchor="middle" fill={c.accent}>
                  {runLabel}
                </SvgText>
              </G>
            ) : null}
            <Rect x={SIDE} y={MOON_TOP} width={scale.right - SIDE} height={4} rx={2} fill={c.surfaceRaised} />
            {moon.map((m) => (
              <Rect key={`m-${m.startMs}`} x={x(m.startMs)} y={MOON_TOP} width={Math.max(1, x(m.endMs) - x(m.startMs))} height={4} rx={2} fill={c.moon} fillOpacity={0.35 + 0.65 * night.moonIllumination} />
            ))}
            {ticks.map((t) => (
              <G key={t.ms}>
                <Line x1={x(t.ms)} x2={x(t.ms)} y1={TICK_TOP} y2={TICK_TOP + 4} stroke={c.textFaint} />
                <SvgText {...text} x={x(t.ms)} y={TICK_TOP + 17} textAnchor="middle" fill={c.textMuted}>
                  {t.label}
                </SvgText>
              </G>
            ))}
            {showNow ? <Line x1={x(nowMs)} x2={x(nowMs)} y1={BAND_TOP - 2} y2={MOON_TOP + 6} stroke={c.nowMarker} strokeWidth={2} strokeDasharray="3 2" /> : null}
          </Svg>
        ) : (
          <View style={{ height: HEIGHT }} />
        )}
      </View>
      <NightBandLegend illumination={night.moonIllumination} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
});
