import { useEffect, useMemo, useState } from 'react';

import type { CatalogueSearchParams } from '@/hooks/use-catalogues';
import { parseNumberText } from '@/lib/number-text';
import type { TargetKind } from '@/shared/targets/schema';

/** Typing settles for this long before a search is sent. */
export const SEARCH_DEBOUNCE_MS = 250;

export type FindForm = {
  q: string;
  kinds: TargetKind[];
  minSize: string;
  maxSize: string;
  faintestMag: string;
  wellPlaced: boolean;
};

const EMPTY: FindForm = { q: '', kinds: [], minSize: '', maxSize: '', faintestMag: '', wellPlaced: false };

/*
 * The last search, kept for this page session so that opening a target and coming back shows
 * the same results (the answer itself is still in the query cache).
 */
let remembered: FindForm = EMPTY;

/** `value`, once it has stopped changing for `ms`. */
export function useDebouncedValue<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

type NumberField = 'minSize' | 'maxSize' | 'faintestMag';

/** A number from the field, undefined when empty, null when it is not a number. */
function numberOf(text: string): number | undefined | null {
  if (text.trim() === '') return undefined;
  const n = parseNumberText(text);
  return Number.isFinite(n) ? n : null;
}

/** The Find panel's filters: text fields debounced, chips and the switch at once. */
export function useFindForm() {
  const [form, setForm] = useState<FindForm>(remembered);
  useEffect(() => {
    remembered = form;
  }, [form]);

  const { q, minSize, maxSize, faintestMag } = form;
  const typed = useMemo(() => ({ q, minSize, maxSize, faintestMag }), [q, minSize, maxSize, faintestMag]);
  const settled = useDebouncedValue(typed, SEARCH_DEBOUNCE_MS);

  const params: CatalogueSearchParams = useMemo(
    () => ({
      q: settled.q,
      kinds: form.kinds,
      minSizeArcmin: numberOf(settled.minSize) ?? undefined,
      maxSizeArcmin: numberOf(settled.maxSize) ?? undefined,
      faintestMag: numberOf(settled.faintestMag) ?? undefined,
      wellPlaced: form.wellPlaced,
    }),
    [settled, form.kinds, form.wellPlaced],
  );

  function errorFor(field: NumberField): string | undefined {
    return numberOf(form[field]) === null ? 'Enter a number' : undefined;
  }

  function update(patch: Partial<FindForm>) {
    setForm((current) => ({ ...current, ...patch }));
  }

  function toggleKind(kind: TargetKind) {
    setForm((current) => ({ ...current, kinds: current.kinds.includes(kind) ? current.kinds.filter((k) => k !== kind) : [...current.kinds, kind] }));
  }

  const hasFilters = form.kinds.length > 0 || minSize !== '' || maxSize !== '' || faintestMag !== '';
  return { form, params, update, toggleKind, errorFor, hasFilters, clearFilters: () => update({ kinds: [], minSize: '', maxSize: '', faintestMag: '' }) };
}

export type FindFormState = ReturnType<typeof useFindForm>;
