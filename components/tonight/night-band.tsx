import { useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { ClipPath, Defs, G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { NightBandLegend } from '@/components/tonight/night-band-legend';
import { useTheme } from '@/components/theme-provider';
import { bandSpan, hourTicks, moonUpStretches, skyStretches, type SkyKind } from '@/lib/night-band';
import { formatClock, formatDurationHours } from '@/lib/format';
import { fonts, spacing, type Palette } from '@/constants/theme';
import type { Night } from '@/shared/schemas/night';

const HEIGHT = 128;
const SIDE_PAD = 18;
const BAND_TOP = 22;
const BAND_HEIGHT = 60;
const MOON_TOP = BAND_TOP + BAND_HEIGHT + 9;
const MOON_HEIGHT = 5;
const TICK_TOP = MOON_TOP + MOON_HEIGHT + 6;
/** Below this many px between labels, ticks thin out from every 2 h to every 3 or 4 h. */
const MIN_TICK_GAP_PX = 36;

export function skyColour(kind: SkyKind, c: Palette): string {
  return { day: c.skyDay, civil: c.skyCivil, nautical: c.skyNautical, astronomical: c.skyAstronomical, dark: c.skyDark }[kind];
}

type NightBandProps = { night: Night; nowMs: number };

/**
 * The night at a glance: sky state by the Sun's altitude from sunset−1 h to sunrise+1 h, the
 * Moon's time above the horizon, local clock ticks and a "now" marker.
 */
export function NightBand({ night, nowMs }: NightBandProps) {
  const { palette: c } = useTheme();
  const [width, setWidth] = useState(0);
  const { startMs, endMs } = bandSpan(night);
  const sky = useMemo(() => skyStretches(night, startMs, endMs), [night, startMs, endMs]);
  const moon = useMemo(() => moonUpStretches(night, startMs, endMs), [night, startMs, endMs]);
  const inner = Math.max(1, width - 2 * SIDE_PAD);
  const x = (ms: number) => SIDE_PAD + ((ms - startMs) / (endMs - startMs)) * inner;
  const spanHours = (endMs - startMs) / 3_600_000;
  const every = [2, 3, 4, 6].find((h) => (inner / spanHours) * h >= MIN_TICK_GAP_PX) ?? 6;
  const ticks = useMemo(() => hourTicks(startMs, endMs, night.timeZone, every), [startMs, endMs, night.timeZone, every]);
  const showNow = nowMs >= startMs && nowMs <= endMs;
  const darkStart = night.darkStart ? Date.parse(night.darkStart) : null;
  const darkEnd = night.darkEnd ? Date.parse(night.darkEnd) : null;
  const moonOpacity = 0.35 + 0.65 * night.moonIllumination;
  const textProps = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

  const summary =
    darkStart && darkEnd
      ? `Night band: astronomical darkness from ${formatClock(darkStart, night.timeZone)} to ${formatClock(darkEnd, night.timeZone)}.`
      : 'Night band: no astronomical darkness tonight.';

  return (
    <View style={styles.wrap} testID="night-band">
      <View onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} role="img" accessibilityLabel={summary}>
        {width > 0 ? (
          <Svg width={width} height={HEIGHT}>
            <Defs>
              <ClipPath id="band-clip">
                <Rect x={SIDE_PAD} y={BAND_TOP} width={inner} height={BAND_HEIGHT} rx={8} />
              </ClipPath>
            </Defs>
            <G clipPath="url(#band-clip)">
              {sky.map((s) => (
                <Rect key={`${s.kind}-${s.startMs}`} x={x(s.startMs)} y={BAND_TOP} width={Math.max(0, x(s.endMs) - x(s.startMs)) + 0.5} height={BAND_HEIGHT} fill={skyColour(s.kind, c)} />
              ))}
              {ticks.map((t) => (
                <Line key={`g-${t.ms}`} x1={x(t.ms)} x2={x(t.ms)} y1={BAND_TOP} y2={BAND_TOP + BAND_HEIGHT} stroke={c.text} strokeOpacity={0.07} />
              ))}
            </G>
            <Rect x={SIDE_PAD} y={BAND_TOP} width={inner} height={BAND_HEIGHT} rx={8} fill="none" stroke={c.border} />
            {darkStart && darkEnd ? (
              <G>
                <Line x1={x(darkStart)} x2={x(darkEnd)} y1={BAND_TOP - 6} y2={BAND_TOP - 6} stroke={c.accent} strokeWidth={1.5} />
                <Line x1={x(darkStart)} x2={x(darkStart)} y1={BAND_TOP - 9} y2={BAND_TOP - 3} stroke={c.accent} strokeWidth={1.5} />
                <Line x1={x(darkEnd)} x2={x(darkEnd)} y1={BAND_TOP - 9} y2={BAND_TOP - 3} stroke={c.accent} strokeWidth={1.5} />
                <SvgText {...textProps} x={(x(darkStart) + x(darkEnd)) / 2} y={BAND_TOP - 10} textAnchor="middle" fill={c.accent}>
                  {`Dark ${formatDurationHours(night.darkHours)}`}
                </SvgText>
              </G>
            ) : null}
            <Rect x={SIDE_PAD} y={MOON_TOP} width={inner} height={MOON_HEIGHT} rx={2.5} fill={c.surfaceRaised} />
            {moon.map((m) => (
              <Rect key={`m-${m.startMs}`} x={x(m.startMs)} y={MOON_TOP} width={Math.max(1, x(m.endMs) - x(m.startMs))} height={MOON_HEIGHT} rx={2.5} fill={c.moon} fillOpacity={moonOpacity} />
            ))}
            {ticks.map((t) => (
              <G key={`t-${t.ms}`}>
                <Line x1={x(t.ms)} x2={x(t.ms)} y1={TICK_TOP} y2={TICK_TOP + 4} stroke={c.textFaint} />
                <SvgText {...textProps} x={x(t.ms)} y={TICK_TOP + 18} textAnchor="middle" fill={c.textMuted}>
                  {t.label}
                </SvgText>
              </G>
            ))}
            {showNow ? (
              <G>
                <Line x1={x(nowMs)} x2={x(nowMs)} y1={BAND_TOP} y2={MOON_TOP + MOON_HEIGHT + 2} stroke={c.nowMarker} strokeWidth={2} />
                <Rect x={x(nowMs) - 4} y={MOON_TOP + MOON_HEIGHT} width={8} height={8} rx={4} fill={c.nowMarker} />
                <SvgText
                  {...textProps}
                  x={x(nowMs) + (x(nowMs) > SIDE_PAD + inner - 40 ? -6 : 6)}
                  y={BAND_TOP + 16}
                  textAnchor={x(nowMs) > SIDE_PAD + inner - 40 ? 'end' : 'start'}
                  fill={c.nowMarker}
                >
                  Now
                </SvgText>
              </G>
            ) : null}
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
