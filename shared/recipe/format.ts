import { isSunEvent } from '@/shared/recipe/fields';

/** A number as people write it: at most two decimals, trailing zeros dropped, a true minus sign. */
export function formatNumber(n: number): string {
  const text = String(Math.round(n * 100) / 100);
  return text.startsWith('-') ? `\u2212${text.slice(1)}` : text;
}

/** A duration in the largest sensible unit: "90 s", "10 min", "1 h 30 min". */
export function formatDurationS(s: number): string {
  if (s < 120 || s % 60 !== 0) return `${formatNumber(s)} s`;
  const minutes = s / 60;
  if (minutes < 60) return `${minutes} min`;
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

/** "astronomical-dusk" → "astronomical dusk"; "21:30" as is; an ISO time → "2025-03-01 21:30". */
export function formatWhen(when: string): string {
  if (isSunEvent(when)) return when.replace('-', ' ');
  if (when.length === 5) return when;
  return `${when.slice(0, 10)} ${when.slice(11, 16)}`;
}

/** A list in prose: "L, R, G and B". */
export function formatList(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
