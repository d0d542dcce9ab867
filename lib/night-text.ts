import { formatClock, formatDurationHours } from '@/lib/format';
import { sunCourse } from '@/lib/night-band';
import type { Night } from '@/shared/schemas/night';

/** Text for an event instant, or a plain phrase when it does not happen in this night. */
export function eventText(instant: string | null, timeZone: string, missing = 'Not tonight'): string {
  return instant ? formatClock(instant, timeZone) : missing;
}

/** "19:02 – 05:40", or why there is no such window. */
export function darkWindowText(night: Night): string {
  if (night.darkStart && night.darkEnd) {
    return `${formatClock(night.darkStart, night.timeZone)} – ${formatClock(night.darkEnd, night.timeZone)}`;
  }
  if (night.darkHours > 0) {
    if (night.darkStart) return `From ${formatClock(night.darkStart, night.timeZone)}`;
    if (night.darkEnd) return `Until ${formatClock(night.darkEnd, night.timeZone)}`;
    return 'Dark all night';
  }
  return 'No astronomical darkness tonight';
}

export function darkDurationText(night: Night): string {
  return night.darkHours > 0 ? formatDurationHours(night.darkHours) : 'None';
}

/** One sentence for nights that are not the usual sunset-darkness-sunrise, else null. */
export function unusualNightText(night: Night): string | null {
  const course = sunCourse(night);
  if (course === 'stays-up') return 'The Sun stays above the horizon all night at this site.';
  if (course === 'stays-down') {
    return night.darkHours > 0 ? 'Polar night: the Sun does not rise in this span.' : 'The Sun does not rise, but it never gets 18° below the horizon either.';
  }
  if (night.darkHours <= 0) {
    const deepest = Math.min(...night.sunAltitudes.map((s) => s.altDeg));
    return `No astronomical darkness tonight: the Sun gets only ${Math.abs(deepest).toFixed(1)}° below the horizon.`;
  }
  return null;
}

/** What to show for a missing sun event, by how the Sun moves tonight. */
export function missingSunText(night: Night): string {
  const course = sunCourse(night);
  if (course === 'stays-up') return 'Sun stays up';
  if (course === 'stays-down') return 'Sun stays down';
  return 'Not tonight';
}
