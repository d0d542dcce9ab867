/**
 * Words and numbers of the calibration screen: frame counts by type, dark-set settings, angles.
 * Pure, so the unit tests read them without a renderer.
 */
import { formatNightDate } from '@/lib/format';
import type { BiasLibrarySet, CaptureFrameType, DarkLibrarySet, IntakeResult, IntakeSummary } from '@/shared/schemas/calibration-api';

const TYPE_WORDS: Record<CaptureFrameType, [string, string]> = {
  light: ['light', 'lights'],
  dark: ['dark', 'darks'],
  flat: ['flat', 'flats'],
  bias: ['bias frame', 'bias frames'],
};

export const FRAME_TYPE_ORDER: readonly CaptureFrameType[] = ['light', 'dark', 'flat', 'bias'];

/** "1 file", "12 files". */
export function countText(n: number, one: string, many: string): string {
  return `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;
}

/** "12 lights, 3 darks and 4 flats", or null when nothing new was recorded. */
export function recordedText(recorded: IntakeResult['recorded']): string | null {
  const parts = FRAME_TYPE_ORDER.filter((t) => recorded[t] > 0).map((t) => countText(recorded[t], ...TYPE_WORDS[t]));
  if (parts.length === 0) return null;
  if (parts.length === 1) return parts[0]!;
  return `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]!}`;
}

const importedFormat = new Map<string, Intl.DateTimeFormat>();

/** "17 Nov 2026, 21:04" in the viewer's zone (or `timeZone`): when an import was made. */
export function importedAtText(instant: string, timeZone?: string): string {
  const key = timeZone ?? '';
  let f = importedFormat.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    importedFormat.set(key, f);
  }
  return f.format(new Date(instant));
}

/** "Sat 21 Nov 2026", or "Fri 20 Nov 2026 – Sun 22 Nov 2026" when an import covers several nights. */
export function nightsText(firstNight: string, lastNight: string): string {
  const first = formatNightDate(firstNight);
  return firstNight === lastNight ? first : `${first} – ${formatNightDate(lastNight)}`;
}

/** "M 31, M 33 and NGC 891", "M 31, M 33, M 42 and 2 more", or null when no light named its object. */
export function objectsText(s: Pick<IntakeSummary, 'objects' | 'objectCount'>): string | null {
  const names = s.objects;
  if (names.length === 0) return null;
  const more = s.objectCount - names.length;
  if (more > 0) return `${names.join(', ')} and ${more} more`;
  if (names.length === 1) return names[0]!;
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]!}`;
}

/** "Reading headers 120 / 400". */
export function readingText(done: number, total: number): string {
  return `Reading headers ${done.toLocaleString('en-GB')} / ${total.toLocaleString('en-GB')}`;
}

/** "300 s", "0.5 s", "1 200 s" without trailing zeros. */
export function secondsText(s: number): string {
  return `${Number(s.toFixed(3)).toLocaleString('en-GB')} s`;
}

/** "−10 °C" with a true minus. */
export function celsiusText(c: number): string {
  const r = Number(c.toFixed(1));
  return `${r < 0 ? '−' : ''}${Math.abs(r)} °C`;
}

/** "125.0°": one decimal, 0 ≤ angle < 360. */
export function degreesText(deg: number): string {
  const norm = ((deg % 360) + 360) % 360;
  const text = norm.toFixed(1);
  return `${text === '360.0' ? '0.0' : text}°`;
}

/** "gain 100 · offset 50 · bin 1" (unset values say "as set"). */
export function cameraSettingsText(s: { gain: number | null; offset: number | null; binning: number; readoutMode?: string | null }): string {
  const parts = [`gain ${s.gain ?? 'as set'}`, `offset ${s.offset ?? 'as set'}`, `bin ${s.binning}`];
  if (s.readoutMode) parts.push(s.readoutMode);
  return parts.join(' · ');
}

/** "300 s at −10 °C": what a dark set is first known by. */
export function darkSetHeadline(s: Pick<DarkLibrarySet, 'exposureS' | 'temperatureC'>): string {
  return `${secondsText(s.exposureS)} at ${celsiusText(s.temperatureC)}`;
}

/** "Bias · gain 100 · offset 50 · bin 1 · −10 °C · 50 frames · Sat 14 Mar 2026": one bias set in a line. */
export function biasSetText(s: BiasLibrarySet): string {
  const temperature = s.temperatureC === null ? 'no temperature recorded' : celsiusText(s.temperatureC);
  return ['Bias', cameraSettingsText(s), temperature, countText(s.frames, 'frame', 'frames'), formatNightDate(s.takenOn)].join(' · ');
}

/** Library order: by temperature, then exposure, then the camera settings, newest first. */
export function sortDarkSets(sets: readonly DarkLibrarySet[]): DarkLibrarySet[] {
  return [...sets].sort(
    (a, b) =>
      a.temperatureC - b.temperatureC ||
      a.exposureS - b.exposureS ||
      (a.gain ?? -1) - (b.gain ?? -1) ||
      (a.offset ?? -1) - (b.offset ?? -1) ||
      a.binning - b.binning ||
      b.takenOn.localeCompare(a.takenOn),
  );
}

/** The viewer's calendar date, YYYY-MM-DD (a new hand-entered set defaults to it). */
export function localDateYmd(now: Date = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}

/** Choices of the validity setting: 1 to 12 months, 6 marked as common practice. */
export function validityChoices(): { value: string; label: string }[] {
  return Array.from({ length: 12 }, (_, i) => {
    const months = i + 1;
    const label = `${months} ${months === 1 ? 'month' : 'months'}${months === 6 ? ' (common practice)' : ''}`;
    return { value: String(months), label };
  });
}
