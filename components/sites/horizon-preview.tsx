import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Defs, Line, LinearGradient, Path, Rect, Stop, Text as SvgText } from 'react-native-svg';

import { useTheme } from '@/components/theme-provider';
import { fonts } from '@/constants/theme';
import { horizonAltitudeAt, type HorizonPoint } from '@/shared/horizon/profile';

type HorizonPreviewProps = { points: HorizonPoint[]; minAltitudeDeg: number; height?: number };

const PAD = { left: 30, right: 8, top: 8, bottom: 22 };
const COMPASS = [
  { az: 0, label: 'N' },
  { az: 90, label: 'E' },
  { az: 180, label: 'S' },
  { az: 270, label: 'W' },
  { az: 360, label: 'N' },
];

/** Azimuths to draw the skyline through: every degree plus each point's own azimuth. */
function sampleAzimuths(points: HorizonPoint[]): number[] {
  const set = new Set<number>(Array.from({ length: 361 }, (_, i) => i));
  for (const p of points) set.add(p.azDeg);
  return [...set].sort((a, b) => a - b);
}

/** Words for screen readers: how many points, the highest, and the minimum altitude. */
function describe(points: HorizonPoint[], minAltitudeDeg: number): string {
  const min = Number.isFinite(minAltitudeDeg) ? `; minimum altitude ${minAltitudeDeg}°` : '';
  if (points.length === 0) return `Horizon silhouette: flat horizon${min}.`;
  const top = points.reduce((a, b) => (b.altDeg > a.altDeg ? b : a));
  return `Horizon silhouette: ${points.length} points, highest ${top.altDeg}° at azimuth ${top.azDeg}°${min}.`;
}

/**
 * The site's skyline: azimuth 0–360° across (north at both ends), altitude 0–90° up, the land
 * below the horizon filled dark and the minimum imaging altitude as a dashed line.
 */
export function HorizonPreview({ points, minAltitudeDeg, height = 160 }: HorizonPreviewProps) {
  const { palette } = useTheme();
  const [width, setWidth] = useState(0);
  const plotW = Math.max(0, width - PAD.left - PAD.right);
  const plotH = height - PAD.top - PAD.bottom;
  const x = (az: number) => PAD.left + (az / 360) * plotW;
  const y = (alt: number) => PAD.top + (1 - Math.min(90, Math.max(0, alt)) / 90) * plotH;
  const profile = { points };
  const skyline = sampleAzimuths(points)
    .map((az) => `L${x(az).toFixed(1)},${y(horizonAltitudeAt(profile, az)).toFixed(1)}`)
    .join('');
  const land = `M${x(0)},${y(0)}${skyline}L${x(360)},${y(0)}Z`;
  const showMin = Number.isFinite(minAltitudeDeg) && minAltitudeDeg >= 0 && minAltitudeDeg <= 90;
  const label = { fontFamily: fonts.regular, fontSize: 11, fill: palette.textMuted };

  return (
    <View style={[styles.box, { height }]} onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} testID="site-horizon-preview" role="img" accessibilityLabel={describe(points, minAltitudeDeg)}>
      {width > 0 ? (
        <Svg width={width} height={height}>
          <Defs>
            <LinearGradient id="horizon-sky" x1="0" y1="0" x2="0" y2="1">
              <Stop offset="0" stopColor={palette.skyDark} />
              <Stop offset="1" stopColor={palette.skyNautical} />
            </LinearGradient>
          </Defs>
          <Rect x={PAD.left} y={PAD.top} width={plotW} height={plotH} fill="url(#horizon-sky)" />
          {[30, 60].map((alt) => (
            <Line key={alt} x1={PAD.left} x2={PAD.left + plotW} y1={y(alt)} y2={y(alt)} stroke={palette.border} strokeWidth={1} />
          ))}
          {[0, 30, 60, 90].map((alt) => (
            <SvgText key={alt} x={PAD.left - 5} y={y(alt) + 4} textAnchor="end" {...label}>{`${alt}°`}</SvgText>
          ))}
          <Path d={land} fill={palette.background} stroke={palette.textFaint} strokeWidth={1.25} strokeLinejoin="round" testID="site-horizon-land" />
          {showMin ? (
            <>
              <Line x1={PAD.left} x2={PAD.left + plotW} y1={y(minAltitudeDeg)} y2={y(minAltitudeDeg)} stroke={palette.accent} strokeWidth={1.25} strokeDasharray="6 4" />
              <SvgText x={PAD.left + plotW - 4} y={y(minAltitudeDeg) - 4} textAnchor="end" {...label} fill={palette.accent}>{`min ${minAltitudeDeg}°`}</SvgText>
            </>
          ) : null}
          {COMPASS.map((c) => (
            <SvgText key={c.az} x={x(c.az)} y={height - 6} textAnchor={c.az === 0 ? 'start' : c.az === 360 ? 'end' : 'middle'} {...label} fontFamily={fonts.semibold}>
              {c.label}
            </SvgText>
          ))}
          {COMPASS.map((c) => (
            <Line key={`t${c.az}`} x1={x(c.az)} x2={x(c.az)} y1={y(0)} y2={y(0) + 4} stroke={palette.textFaint} strokeWidth={1} />
          ))}
        </Svg>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ box: { width: '100%' } });
