import { formatDurationHours } from '@/lib/format';

const arcmin = (v: number) => `${v < 10 ? v.toFixed(1) : Math.round(v)}′`;

/** "10.5′ × 3.7′", "42′", or "—" when the catalogue gives no size. */
export function formatSizeArcmin(majorArcmin: number, minorArcmin: number | null): string {
  if (!majorArcmin) return '—';
  if (minorArcmin && minorArcmin !== majorArcmin) return `${arcmin(majorArcmin)} × ${arcmin(minorArcmin)}`;
  return arcmin(majorArcmin);
}

/** "mag 9.5", or "—". */
export function formatMagnitude(magnitude: number | null): string {
  return magnitude === null ? '—' : `mag ${magnitude.toFixed(1)}`;
}

/** "4 h 20 min dark", "not above the limit in darkness", or null when no night was asked for. */
export function formatDarkMinutes(minutes: number | null): string | null {
  if (minutes === null) return null;
  if (minutes <= 0) return 'Not above the limit in darkness';
  return `${formatDurationHours(minutes / 60)} in darkness`;
}

/** A testID-safe form of a designation: "NGC 7331" → "NGC-7331". */
export function designationSlug(designation: string): string {
  return designation.trim().replace(/[^A-Za-z0-9]+/g, '-');
}

/** Designations compare without case or spaces: "ngc7331" and "NGC 7331" are one object. */
export function sameDesignation(a: string, b: string): boolean {
  const fold = (s: string) => s.toLowerCase().replace(/\s+/g, '');
  return fold(a) === fold(b);
}
