import type { NightScan } from '@/components/dry-run/scan-state';

const HOUR_S = 3600;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** The plot's box in px. */
export type ScanPlot = { left: number; right: number; top: number; bottom: number };

export type ScanBar = {
  date: string;
  /** The night's slot (tap target), and the bar drawn inside it. */
  slotX: number;
  slotWidth: number;
  barX: number;
  barWidth: number;
  /** Tops of the usable and the whole integration bars, in px. */
  usableY: number;
  totalY: number;
  stop: boolean;
};

/** The top of the hours axis: whole even hours above the best night, at least 2 h. */
export function scanMaxHours(nights: readonly NightScan[]): number {
  const most = Math.max(0, ...nights.map((n) => n.integrationS / HOUR_S));
  return Math.max(2, Math.ceil(most / 2) * 2);
}

export function yOfHours(plot: ScanPlot, hours: number, maxHours: number): number {
  return plot.bottom - (Math.min(hours, maxHours) / maxHours) * (plot.bottom - plot.top);
}

/**
 * One slot per night of the range (`total`, so the axis does not stretch while a scan streams in);
 * the bar leaves a gap to its neighbours once a slot is wide enough to afford one.
 */
export function scanBars(nights: readonly NightScan[], total: number, plot: ScanPlot, maxHours: number): ScanBar[] {
  const slotWidth = (plot.right - plot.left) / Math.max(1, total, nights.length);
  const gap = slotWidth >= 6 ? Math.min(4, slotWidth * 0.25) : 0;
  return nights.map((n, i) => {
    const slotX = plot.left + i * slotWidth;
    return {
      date: n.date,
      slotX,
      slotWidth,
      barX: slotX + gap / 2,
      barWidth: Math.max(0.6, slotWidth - gap),
      usableY: yOfHours(plot, n.usableIntegrationS / HOUR_S, maxHours),
      totalY: yOfHours(plot, n.integrationS / HOUR_S, maxHours),
      stop: n.findings.stop > 0,
    };
  });
}

/** A YYYY-MM-DD date as day and month: { day: 24, month: 'Oct' }. */
function dayMonth(date: string): { day: number; month: string } {
  return { day: Number(date.slice(8, 10)), month: MONTHS[Number(date.slice(5, 7)) - 1] ?? '' };
}

/**
 * Date labels under the bars: month starts ("Nov") and, on short ranges, the 8th, 15th and 22nd
 * ("15"); the first night always gets "24 Oct". Labels closer than `minGapPx` are dropped.
 */
export function dateTicks(dates: readonly string[], total: number, plot: ScanPlot, minGapPx: number): { x: number; label: string }[] {
  const slot = (plot.right - plot.left) / Math.max(1, total, dates.length);
  const short = total <= 62;
  const ticks: { x: number; label: string }[] = [];
  dates.forEach((date, i) => {
    const { day, month } = dayMonth(date);
    const label = i === 0 ? `${day} ${month}` : day === 1 ? month : short && (day === 8 || day === 15 || day === 22) ? String(day) : null;
    if (label === null) return;
    const x = plot.left + (i + 0.5) * slot;
    const prev = ticks[ticks.length - 1];
    if (!prev || x - prev.x >= minGapPx) ticks.push({ x, label });
  });
  return ticks;
}
