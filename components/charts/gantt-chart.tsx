import { useMemo, useRef, useState } from 'react';
import { ScrollView, StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Rect } from 'react-native-svg';

import { FlipMarks, HourAxis, SkyShading, TimeMarkers, type GanttMarker } from '@/components/charts/gantt-markers';
import { groupFill } from '@/components/dry-run/colours';
import { blockBox, chartWidth, tickEveryHours, xAt, type TimeScale } from '@/components/dry-run/time-scale';
import { EVENT_GROUP, flipStarts, type GanttRow, type TimedEvent } from '@/components/dry-run/timeline-rows';
import { useTheme } from '@/components/theme-provider';
import { AppText } from '@/components/ui/app-text';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { hourTicks, skyStretches } from '@/lib/night-band';
import { spacing, type Palette } from '@/constants/theme';
import type { Night } from '@/shared/schemas/night';

const TOP = 34;
const LANE = 36;
const BLOCK = 20;
const BOTTOM = 26;
const SIDE = 20;
const MIN_BLOCK_PX = 2;
/** Tap targets never narrower than this, so a 20-second slew can still be picked by a finger. */
const MIN_HIT_PX = 14;

type GanttChartProps = {
  rows: GanttRow[];
  span: { startMs: number; endMs: number };
  night: Night;
  markers: GanttMarker[];
  selected: number | null;
  onSelect: (eventIndex: number) => void;
  summary: string;
  /** The instant a scrolling chart opens at (a little in from the left edge). */
  focusMs: number;
};

function Blocks({ events, scale, laneTop, selected, c }: { events: TimedEvent[]; scale: TimeScale; laneTop: number; selected: number | null; c: Palette }) {
  const y = laneTop + (LANE - BLOCK) / 2;
  return (
    <G>
      {events.map((e) => {
        const { x, width } = blockBox(scale, e.startMs, e.endMs, MIN_BLOCK_PX);
        const group = EVENT_GROUP[e.kind];
        const idle = group === 'idle';
        return (
          <Rect
            key={e.index}
            x={x}
            y={idle ? y + 3 : y}
            width={width}
            height={idle ? BLOCK - 6 : BLOCK}
            rx={2}
            fill={groupFill(group, c)}
            fillOpacity={group === 'rig' ? 0.9 : 1}
            stroke={e.index === selected ? c.text : idle ? c.textFaint : c.surface}
            strokeWidth={e.index === selected ? 2 : idle ? 1 : 0.6}
            strokeDasharray={idle && e.index !== selected ? '3 2' : undefined}
          />
        );
      })}
    </G>
  );
}

function HitTargets({ events, scale, laneTop, onSelect }: { events: TimedEvent[]; scale: TimeScale; laneTop: number; onSelect: (i: number) => void }) {
  return (
    <G>
      {events.map((e) => {
        const { x, width } = blockBox(scale, e.startMs, e.endMs, MIN_HIT_PX);
        return <Rect key={`hit-${e.index}`} x={x} y={laneTop + 2} width={width} height={LANE - 4} fill="transparent" onPress={() => onSelect(e.index)} />;
      })}
    </G>
  );
}

/**
 * The night as stage lanes on a time axis (site zone): one lane per stage, blocks coloured by what
 * the rig does, meridian flips marked, dawn, the recipe's end and now across all lanes. Wider
 * than the phone when an hour would get too narrow; it then scrolls sideways beside fixed labels.
 */
export function GanttChart({ rows, span, night, markers, selected, onSelect, summary, focusMs }: GanttChartProps) {
  const { palette: c } = useTheme();
  const { isWide } = useBreakpoints();
  const [available, setAvailable] = useState(0);
  const labelWidth = isWide ? 168 : 92;
  const width = chartWidth(span.endMs - span.startMs, Math.max(0, available - labelWidth), isWide ? 44 : 52);
  const height = TOP + rows.length * LANE + BOTTOM;
  const scale: TimeScale = { ...span, left: SIDE, right: Math.max(SIDE + 1, width - SIDE) };
  const box = { top: TOP, bottom: TOP + rows.length * LANE };
  const sky = useMemo(() => skyStretches(night, span.startMs, span.endMs), [night, span.startMs, span.endMs]);
  const every = tickEveryHours(span.endMs - span.startMs, scale.right - scale.left, 44);
  const ticks = useMemo(() => hourTicks(span.startMs, span.endMs, night.timeZone, every), [span.startMs, span.endMs, night.timeZone, every]);
  const scroller = useRef<ScrollView>(null);
  const opened = useRef(false);
  const viewport = available - labelWidth;
  // Once, when the chart is first laid out wider than the screen: open at the focus, not at the span's start.
  const openAtFocus = () => {
    if (opened.current || width <= viewport || viewport <= 0) return;
    opened.current = true;
    scroller.current?.scrollTo({ x: Math.max(0, xAt(scale, focusMs) - viewport * 0.2), animated: false });
  };

  return (
    <View style={styles.row} onLayout={(e: LayoutChangeEvent) => setAvailable(e.nativeEvent.layout.width)}>
      <View style={[styles.labels, { width: labelWidth, paddingTop: TOP }]}>
        {rows.map((r) => (
          <View key={r.key} style={styles.label} testID={`dry-run-gantt-row-${r.key}`}>
            <AppText variant="small" weight="semibold" numberOfLines={1}>
              {r.label}
            </AppText>
            <AppText variant="caption" tone={r.skipped ? 'danger' : 'faint'} numberOfLines={1}>
              {r.skipped ? 'Skipped' : r.detail}
            </AppText>
          </View>
        ))}
      </View>
      {available > 0 ? (
        <ScrollView ref={scroller} horizontal showsHorizontalScrollIndicator style={styles.scroll} onContentSizeChange={openAtFocus} testID="dry-run-gantt-scroll">
          <View role="img" accessibilityLabel={summary}>
            <Svg width={width} height={height}>
              <SkyShading scale={scale} sky={sky} box={box} c={c} />
              {rows.map((r, i) => (
                <Line key={`lane-${r.key}`} x1={0} x2={width} y1={TOP + (i + 1) * LANE} y2={TOP + (i + 1) * LANE} stroke={c.border} />
              ))}
              <Line x1={0} x2={width} y1={TOP} y2={TOP} stroke={c.border} />
              <HourAxis scale={scale} ticks={ticks} box={box} c={c} />
              {rows.map((r, i) => (
                <G key={`blocks-${r.key}`}>
                  <Blocks events={r.events} scale={scale} laneTop={TOP + i * LANE} selected={selected} c={c} />
                  <FlipMarks scale={scale} flips={flipStarts(r.events)} laneTop={TOP + i * LANE} laneHeight={LANE} c={c} />
                </G>
              ))}
              <TimeMarkers scale={scale} markers={markers} box={box} c={c} />
              {rows.map((r, i) => (
                <HitTargets key={`hits-${r.key}`} events={r.events} scale={scale} laneTop={TOP + i * LANE} onSelect={onSelect} />
              ))}
            </Svg>
          </View>
        </ScrollView>
      ) : (
        <View style={{ height }} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  labels: { flexShrink: 0, paddingRight: spacing.sm },
  label: { height: LANE, justifyContent: 'center' },
  scroll: { flex: 1 },
});
