import { useMemo, useState } from 'react';

import { checkHorizonRows, newHorizonRow, type HorizonRow } from '@/components/sites/horizon-rows';
import type { FieldErrors } from '@/lib/api';
import { parseHorizonCsv, type HorizonCsvError, type HorizonPoint } from '@/shared/horizon/profile';

/** A CSV file the user chose: its rows' errors, or how many points it gave the table. */
export type CsvOutcome = { fileName: string; text: string } & ({ errors: HorizonCsvError[] } | { count: number });

/**
 * The horizon table of the site form: rows as typed, checked by the shared horizon schemas.
 * Errors show per row once a cell was left (or after a save attempt); server errors keyed
 * `horizon.<i>.azDeg` show on row i of the sorted table that was sent.
 */
export function useHorizonTable(initial: HorizonPoint[]) {
  const [rows, setRows] = useState<HorizonRow[]>(() => initial.map((p) => newHorizonRow(p)));
  const [touched, setTouched] = useState<Record<string, true>>({});
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});
  const [csv, setCsv] = useState<CsvOutcome | null>(null);
  const check = useMemo(() => checkHorizonRows(rows), [rows]);

  function errorsFor(index: number): { azDeg?: string; altDeg?: string } {
    const row = rows[index];
    if (!row) return {};
    const client = check.errors[row.key] ?? {};
    const shown = (field: 'azDeg' | 'altDeg') => serverErrors[`horizon.${index}.${field}`]?.[0] ?? (touched[`${row.key}.${field}`] || submitted ? client[field] : undefined);
    return { azDeg: shown('azDeg'), altDeg: shown('altDeg') };
  }

  function setCell(key: string, field: 'azDeg' | 'altDeg', value: string) {
    setRows((current) => current.map((r) => (r.key === key ? { ...r, [field]: value } : r)));
    setServerErrors({});
  }

  function replaceRows(next: HorizonRow[]) {
    setRows(next);
    setTouched({});
    setServerErrors({});
  }

  /** Reads a chosen CSV file; a file with any bad row leaves the table as it was. */
  function loadCsv(fileName: string, text: string) {
    const parsed = parseHorizonCsv(text);
    if ('errors' in parsed) {
      setCsv({ fileName, text, errors: parsed.errors });
      return;
    }
    replaceRows(parsed.points.map((p) => newHorizonRow(p)));
    setCsv({ fileName, text, count: parsed.points.length });
  }

  /** The sorted profile to save, or null (marking every row) when a row is invalid. */
  function validate(): HorizonPoint[] | null {
    setSubmitted(true);
    if (!check.points) return null;
    // Saved sorted by azimuth; the table takes that order so server errors line up by index.
    const byKey = new Map(rows.map((r) => [r.key, r]));
    setRows(check.sortedKeys.map((k) => byKey.get(k)).filter((r): r is HorizonRow => !!r));
    return check.points;
  }

  function reset(points: HorizonPoint[]) {
    replaceRows(points.map((p) => newHorizonRow(p)));
    setSubmitted(false);
    setCsv(null);
  }

  return {
    rows,
    preview: check.preview,
    listError: submitted ? check.listError : undefined,
    hasErrors: !check.points,
    errorsFor,
    setCell,
    blur: (key: string, field: 'azDeg' | 'altDeg') => setTouched((t) => ({ ...t, [`${key}.${field}`]: true })),
    addRow: () => setRows((current) => [...current, newHorizonRow()]),
    removeRow: (key: string) => replaceRows(rows.filter((r) => r.key !== key)),
    csv,
    loadCsv,
    /** Shows the server's per-line errors for a file it refused. */
    setCsvErrors: (fileName: string, text: string, errors: HorizonCsvError[]) => setCsv({ fileName, text, errors }),
    clearCsv: () => setCsv(null),
    validate,
    reset,
    setServerErrors,
  };
}

export type HorizonTableState = ReturnType<typeof useHorizonTable>;
