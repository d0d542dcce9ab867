import { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { labelRows, xAt, type TimeScale } from '@/components/dry-run/time-scale';
import type { TimedEvent } from '@/components/dry-run/timeline-rows';
import type { Stretch, SkyKind } from '@/lib/night-band';
import { skyColour } from '@/components/tonight/night-band';
import { fonts, type Palette } from '@/constants/theme';

export const ganttText = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

export type GanttMarker = { key: string; ms: number; label: string; tone: 'now' | 'dawn' | 'end' };

type Box = { top: number; bottom: number };

/** The sky's state behind the lanes, faint, so each block sits in its twilight. */
export function SkyShading({ scale, sky, box, c }: { scale: TimeScale; sky: Stretch<SkyKind>[]; box: Box; c: Palette }) {
  return (
    <G>
      {sky.map((s) => (
        <Rect key={`${s.kind}-${s.startMs}`} x={xAt(scale, s.startMs)} y={box.top} width={Math.max(0, xAt(scale, s.endMs) - xAt(scale, s.startMs)) + 0.5} height={box.bottom - box.top} fill={skyColour(s.kind, c)} fillOpacity={0.6} />
      ))}
    </G>
  );
}

/** Hour lines through the lanes and their labels under them, in the site's zone. */
export function HourAxis({ scale, ticks, box, c }: { scale: TimeScale; ticks: { ms: number; label: string }[]; box: Box; c: Palette }) {
  return (
    <G>
      {ticks.map((t) => (
        <G key={t.ms}>
          <Line x1={xAt(scale, t.ms)} x2={xAt(scale, t.ms)} y1={box.top} y2={box.bottom + 4} stroke={c.text} strokeOpacity={0.09} />
          <SvgText {...ganttText} x={xAt(scale, t.ms)} y={box.bottom + 17} textAnchor="middle" fill={c.textMuted}>
            {t.label}
          </SvgText>
        </G>
      ))}
    </G>
  );
}

/** Vertical marks across every lane with a label on top: now, astronomical dawn, the recipe's end. */
export function TimeMarkers({ scale, markers, box, c }: { scale: TimeScale; markers: GanttMarker[]; box: Box; c: Palette }) {
  const colour = { now: c.nowMarker, dawn: c.text, end: c.accent };
  const rows = labelRows(markers.map((m) => xAt(scale, m.ms)), 78);
  return (
    <G>
      {markers.map((m, i) => {
        const x = xAt(scale, m.ms);
        const nearRight = x > scale.right - 70;
        // Labels of marks close together take the upper line so they do not overlap.
        const y = box.top - 6 - (rows[i] ?? 0) * 13;
        return (
          <G key={m.key}>
            <Line x1={x} x2={x} y1={y + 3} y2={box.bottom} stroke={colour[m.tone]} strokeWidth={m.tone === 'now' ? 2 : 1.2} strokeDasharray={m.tone === 'dawn' ? '4 3' : undefined} strokeOpacity={m.tone === 'dawn' ? 0.7 : 1} />
            <SvgText {...ganttText} x={x + (nearRight ? -4 : 4)} y={y} textAnchor={nearRight ? 'end' : 'start'} fill={colour[m.tone]}>
              {m.label}
            </SvgText>
          </G>
        );
      })}
    </G>
  );
}

/** A small diamond above the lane where a meridian flip begins, and a thin line through the lane. */
export function FlipMarks({ scale, flips, laneTop, laneHeight, c }: { scale: TimeScale; flips: TimedEvent[]; laneTop: number; laneHeight: number; c: Palette }) {
  return (
    <G>
      {flips.map((f) => {
        const x = xAt(scale, f.startMs);
        const y = laneTop + 4;
        return (
          <G key={`flip-${f.index}`}>
            <Line x1={x} x2={x} y1={y} y2={laneTop + laneHeight - 3} stroke={c.moon} strokeWidth={1} />
            <Path d={`M${x} ${y - 4} L${x + 4} ${y} L${x} ${y + 4} L${x - 4} ${y} Z`} fill={c.moon} stroke={c.surface} strokeWidth={1} />
          </G>
        );
      })}
    </G>
  );
}
