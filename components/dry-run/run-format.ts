/**
 * Numbers of the dry-run screen in words. Clock times are in the site's zone (24 h), durations
 * never carry seconds past ten minutes, and every figure is meant for tabular numerals.
 */
import type { TimelineEvent } from '@/shared/dry-run/types';
import { formatClock } from '@/lib/format';

const MINUTE_S = 60;

/** "7:05" (hours:minutes) from seconds, for the totals table; rounds to the minute. */
export function formatHm(seconds: number): string {
  const total = Math.max(0, Math.round(seconds / MINUTE_S));
  return `${Math.floor(total / 60)}:${String(total % 60).padStart(2, '0')}`;
}

/** "45 s", "6 min 20 s", "16 min", "2 h 05 min" from seconds. */
export function formatSpanS(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < MINUTE_S) return `${s} s`;
  if (s < 10 * MINUTE_S) {
    const rest = s % MINUTE_S;
    return rest === 0 ? `${Math.floor(s / MINUTE_S)} min` : `${Math.floor(s / MINUTE_S)} min ${rest} s`;
  }
  const minutes = Math.round(s / MINUTE_S);
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** "3 min", "1 h 05 min": to the nearest minute, for times set against each other. */
export function formatMinutes(seconds: number): string {
  const minutes = Math.max(1, Math.round(Math.abs(seconds) / MINUTE_S));
  return minutes < 60 ? `${minutes} min` : `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** "18:34–18:50" in the site's zone. */
export function formatClockRange(startMs: number, endMs: number, timeZone: string): string {
  return `${formatClock(startMs, timeZone)}–${formatClock(endMs, timeZone)}`;
}

/** "−0.28 h", with a true minus sign. */
export function formatSigned(value: number, digits: number, unit: string): string {
  const text = Math.abs(value).toFixed(digits);
  return `${value < 0 ? '\u2212' : ''}${text}${unit}`;
}

export type EndVsDawn = { tone: 'ok' | 'late' | 'none'; text: string };

/** How the night's end sits against astronomical dawn: "12 min before dawn" or "3 min after dawn". */
export function endVsDawn(nightEnd: string | null, dawn: string | null): EndVsDawn {
  if (!nightEnd) return { tone: 'none', text: 'Nothing runs on this night' };
  if (!dawn) return { tone: 'none', text: 'No astronomical dawn on this night' };
  const diffS = (Date.parse(nightEnd) - Date.parse(dawn)) / 1000;
  if (Math.abs(diffS) < 30) return { tone: 'ok', text: 'Ends at dawn' };
  return diffS < 0 ? { tone: 'ok', text: `${formatMinutes(-diffS)} before dawn` } : { tone: 'late', text: `${formatMinutes(diffS)} after dawn` };
}

/** Slack before a fixed-time step as signed h:mm: "+1:34" to spare, "−0:12" late. */
export function formatSlack(slackS: number): string {
  if (Math.abs(slackS) < 30) return '0:00';
  return `${slackS > 0 ? '+' : '\u2212'}${formatHm(Math.abs(slackS))}`;
}

/** "2 stop · 1 warning · 0 notes" style counts, in words for screen readers. */
export function countsText(counts: { stop: number; warn: number; info: number }): string {
  const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  return `${plural(counts.stop, 'stop', 'stops')}, ${plural(counts.warn, 'warning', 'warnings')}, ${plural(counts.info, 'note', 'notes')}`;
}

/** Where the telescope points during a block, in the trade's figures; nulls are left out. */
export function pointingFacts(e: TimelineEvent): { label: string; value: string }[] {
  const facts: { label: string; value: string | null }[] = [
    { label: 'Altitude', value: e.altDeg === null ? null : `${e.altDeg.toFixed(1)}°` },
    { label: 'Airmass', value: e.airmass === null ? null : e.airmass.toFixed(2) },
    { label: 'Moon', value: e.moonSepDeg === null ? null : `${Math.round(e.moonSepDeg)}° away` },
    { label: 'Pier side', value: e.pierSide === null ? null : e.pierSide === 'east' ? 'East' : 'West' },
    { label: 'Hour angle', value: e.hourAngleH === null ? null : formatSigned(e.hourAngleH, 2, ' h') },
    { label: 'Sky PA', value: e.skyPaDeg === null ? null : `${Math.round(e.skyPaDeg)}°` },
    { label: 'Filter', value: e.filter ?? null },
    { label: 'Frames', value: e.frames === undefined ? null : String(e.frames) },
  ];
  return facts.filter((f): f is { label: string; value: string } => f.value !== null);
}
