import { z } from 'zod';

/** A finite number within [min, max], with messages that name the field and its unit. */
export function between(label: string, unit: string, min: number, max: number) {
  const suffix = unit === '' || unit === '°' ? unit : ` ${unit}`;
  const range = `${label} must be between ${min} and ${max}${suffix}`;
  return z.number({ error: `${label} must be a number` }).min(min, range).max(max, range);
}

/** A whole number within [min, max], with the same messages. */
export function whole(label: string, unit: string, min: number, max: number) {
  return between(label, unit, min, max).int(`${label} must be a whole number`);
}

/** Indexes of items whose key repeats an earlier item's key. */
export function duplicateIndexes<T>(items: T[], key: (t: T) => string | number): number[] {
  const seen = new Set<string | number>();
  const dupes: number[] = [];
  items.forEach((item, i) => {
    const k = key(item);
    if (seen.has(k)) dupes.push(i);
    seen.add(k);
  });
  return dupes;
}
