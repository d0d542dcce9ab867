import { useMemo, useState } from 'react';

import { draftToInput, getIn, rigToDraft, setIn, type RigDraft, type RigListPath } from '@/components/rigs/rig-draft';
import type { FieldErrors } from '@/lib/api';
import { rigInputSchema, type RigInput } from '@/shared/rig/schema';
import { unusualRigValues } from '@/shared/rig/typical-ranges';

/** First message per dotted path ("optics.focalLengthMm", "filterWheel.slots.1.name"). */
function messagesByPath(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.') || '_';
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

function withoutKeys(errors: FieldErrors, drop: (key: string) => boolean): FieldErrors {
  const entries = Object.entries(errors).filter(([key]) => !drop(key));
  return entries.length === Object.keys(errors).length ? errors : Object.fromEntries(entries);
}

/**
 * The rig editor's state, checked by the shared `rigInputSchema` as the user types. Errors show
 * under a field once it is touched (or after a submit attempt); server `fields` errors, keyed by
 * the same dotted paths, show the same way until that field is edited. Values outside the usual
 * ranges of trade-defaults.md come back as hints, never as errors.
 */
export function useRigForm(initial: RigInput) {
  const [draft, setDraft] = useState<RigDraft>(() => rigToDraft(initial));
  const [touched, setTouched] = useState<Record<string, true>>({});
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});

  const input = useMemo(() => draftToInput(draft), [draft]);
  const parsed = useMemo(() => rigInputSchema.safeParse(input), [input]);
  const clientErrors = useMemo(() => (parsed.success ? {} : messagesByPath(parsed.error.issues)), [parsed]);
  const hints = useMemo(() => {
    const out: Record<string, string> = {};
    for (const u of unusualRigValues(input)) if (Number.isFinite(u.value) && !clientErrors[u.path]) out[u.path] = u.message;
    return out;
  }, [input, clientErrors]);

  /** The error to show under `path`; `parent` also reports a union's error (e.g. `camera.link`). */
  function errorFor(path: string, parent?: string): string | undefined {
    const server = serverErrors[path]?.[0] ?? (parent ? serverErrors[parent]?.[0] : undefined);
    if (server) return server;
    if (!touched[path] && !submitted) return undefined;
    return clientErrors[path] ?? (parent ? clientErrors[parent] : undefined);
  }

  function set(path: string, value: string | boolean) {
    setDraft((current) => setIn(current, path, value));
    if (serverErrors[path]) setServerErrors((current) => withoutKeys(current, (key) => key === path));
  }

  function blur(path: string) {
    setTouched((current) => (current[path] ? current : { ...current, [path]: true }));
  }

  /** Replaces a whole list (add, remove, reorder); server errors inside it no longer line up. */
  function setList<T>(list: RigListPath, next: (rows: T[]) => T[]) {
    setDraft((current) => setIn(current, list, next(getIn(current, list) as T[])));
    setServerErrors((current) => withoutKeys(current, (key) => key === list || key.startsWith(`${list}.`)));
  }

  /** Marks every field as touched; returns the checked rig, or null when something is invalid. */
  function validate(): RigInput | null {
    setSubmitted(true);
    return parsed.success ? parsed.data : null;
  }

  function reset(rig: RigInput) {
    setDraft(rigToDraft(rig));
    setTouched({});
    setSubmitted(false);
    setServerErrors({});
  }

  /** Every error to list beside the save button after a failed attempt (some have no field). */
  const summary = submitted ? Object.entries({ ...clientErrors, ...Object.fromEntries(Object.entries(serverErrors).map(([k, v]) => [k, v[0] ?? ''])) }) : [];

  return {
    draft,
    input,
    isValid: parsed.success,
    clientErrors,
    summary,
    value: (path: string) => getIn(draft, path),
    errorFor,
    hintFor: (path: string) => hints[path],
    set,
    blur,
    setList,
    validate,
    reset,
    setServerErrors,
  };
}

export type RigFormState = ReturnType<typeof useRigForm>;
