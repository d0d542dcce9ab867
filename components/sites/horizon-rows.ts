import { parseNumberText } from '@/lib/number-text';
import { HORIZON_MAX_POINTS, horizonPointSchema, horizonProfileSchema, type HorizonPoint } from '@/shared/horizon/profile';

/** One editable row of the horizon table: the text as typed, with a stable key. */
export type HorizonRow = { key: string; azDeg: string; altDeg: string };
export type RowErrors = { azDeg?: string; altDeg?: string };

export type HorizonCheck = {
  /** The profile to save (sorted by azimuth), or null while any row is invalid. */
  points: HorizonPoint[] | null;
  /** Valid rows' points, sorted and unique by azimuth: what the preview draws while editing. */
  preview: HorizonPoint[];
  /** Row keys in azimuth order (blank rows dropped), the order the table takes on save. */
  sortedKeys: string[];
  errors: Record<string, RowErrors>;
  /** A problem of the whole profile (too many points). */
  listError?: string;
};

let nextKey = 0;
export function newHorizonRow(point?: HorizonPoint): HorizonRow {
  nextKey += 1;
  return { key: `h-${nextKey}`, azDeg: point ? String(point.azDeg) : '', altDeg: point ? String(point.altDeg) : '' };
}

const isBlank = (row: HorizonRow) => row.azDeg.trim() === '' && row.altDeg.trim() === '';

/**
 * Checks the table against the shared horizon schemas: each row as a point, then the rows sorted
 * by azimuth as a profile (so a repeated azimuth is reported on the later row). Blank rows are
 * ignored, so "Add point" never blocks a save by itself.
 */
export function checkHorizonRows(rows: HorizonRow[]): HorizonCheck {
  const errors: Record<string, RowErrors> = {};
  const valid: { key: string; point: HorizonPoint }[] = [];
  for (const row of rows) {
    if (isBlank(row)) continue;
    const parsed = horizonPointSchema.safeParse({ azDeg: parseNumberText(row.azDeg), altDeg: parseNumberText(row.altDeg) });
    if (parsed.success) {
      valid.push({ key: row.key, point: parsed.data });
      continue;
    }
    const rowErrors: RowErrors = {};
    for (const issue of parsed.error.issues) {
      const field = issue.path[0];
      if ((field === 'azDeg' || field === 'altDeg') && !rowErrors[field]) rowErrors[field] = issue.message;
    }
    errors[row.key] = rowErrors;
  }
  valid.sort((a, b) => a.point.azDeg - b.point.azDeg);
  const profile = horizonProfileSchema.safeParse({ points: valid.map((v) => v.point) });
  const repeated = new Set<number>();
  if (!profile.success) {
    for (const issue of profile.error.issues) {
      const [, index, field] = issue.path;
      const row = typeof index === 'number' ? valid[index] : undefined;
      if (row && field === 'azDeg') {
        errors[row.key] = { ...errors[row.key], azDeg: issue.message };
        repeated.add(index as number);
      }
    }
  }
  const preview = valid.filter((_, i) => !repeated.has(i)).map((v) => v.point);
  const count = rows.filter((r) => !isBlank(r)).length;
  const listError = count > HORIZON_MAX_POINTS ? `A horizon profile holds at most ${HORIZON_MAX_POINTS} points (this one has ${count})` : undefined;
  const ok = Object.keys(errors).length === 0 && !listError;
  return { points: ok ? preview : null, preview, sortedKeys: valid.map((v) => v.key), errors, listError };
}
