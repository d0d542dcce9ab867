import { formatLogTime } from '@/lib/format';

/** Planned shutter time as hours and minutes: "0 m", "45 m", "3 h 20 m". */
export function formatExposureHm(seconds: number): string {
  const minutes = Math.max(0, Math.round(seconds / 60));
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h === 0 ? `${m} m` : `${h} h ${String(m).padStart(2, '0')} m`;
}

/** When a recipe was last changed, in the viewer's zone: "3 Dec, 21:04". */
export function formatUpdated(iso: string): string {
  return formatLogTime(iso);
}

/** The end of the last dry run's plan, or an em dash while none was made; marked when the recipe changed since. */
export function formatDryRunEnd(iso: string | null, stale: boolean | null = null): string {
  if (!iso) return '—';
  return stale ? `${formatLogTime(iso)} · edited since` : formatLogTime(iso);
}

export const targetCountText = (n: number) => (n === 0 ? 'No targets' : n === 1 ? '1 target' : `${n} targets`);
export const stepCountText = (n: number) => (n === 1 ? '1 step' : `${n} steps`);
