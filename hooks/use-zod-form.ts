import { useMemo, useState } from 'react';
import type { z } from 'zod';

import type { FieldErrors } from '@/lib/api';

type Values = Record<string, string | boolean>;

type Options<V extends Values, S extends z.ZodType> = {
  schema: S;
  initial: V;
  /** Turns the raw field values (text as typed) into the shape the schema checks. */
  toInput?: (values: V) => unknown;
};

/**
 * Form state checked by a zod schema: an error shows under a field once it is touched (or after a
 * submit attempt); server `fields` errors show the same way until that field is edited.
 */
export function useZodForm<V extends Values, S extends z.ZodType>({ schema, initial, toInput }: Options<V, S>) {
  const [values, setValues] = useState<V>(initial);
  const [touched, setTouched] = useState<Partial<Record<keyof V, boolean>>>({});
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});

  const parsed = useMemo(() => schema.safeParse(toInput ? toInput(values) : values), [schema, toInput, values]);

  const clientErrors = useMemo(() => {
    const out: Record<string, string> = {};
    if (parsed.success) return out;
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? '');
      if (key && !(key in out)) out[key] = issue.message;
    }
    return out;
  }, [parsed]);

  function errorFor(field: keyof V & string): string | undefined {
    const server = serverErrors[field]?.[0];
    if (server) return server;
    return touched[field] || submitted ? clientErrors[field] : undefined;
  }

  function setField<K extends keyof V & string>(field: K, value: V[K]) {
    setValues((current) => ({ ...current, [field]: value }));
    if (serverErrors[field]) {
      setServerErrors((current) => {
        const next = { ...current };
        delete next[field];
        return next;
      });
    }
  }

  function blur(field: keyof V & string) {
    setTouched((current) => (current[field] ? current : { ...current, [field]: true }));
  }

  /** Marks every field as touched; returns the parsed input, or null when something is invalid. */
  function validate(): z.output<S> | null {
    setSubmitted(true);
    return parsed.success ? parsed.data : null;
  }

  function reset(next: V) {
    setValues(next);
    setTouched({});
    setSubmitted(false);
    setServerErrors({});
  }

  /** The props a text input needs for a string field: value, change, blur and its error. */
  function textField<K extends keyof V & string>(field: K) {
    return {
      value: String(values[field] ?? ''),
      onChangeText: (v: string) => setField(field, v as V[K]),
      onBlur: () => blur(field),
      error: errorFor(field),
    };
  }

  return { values, setField, blur, errorFor, textField, validate, reset, setServerErrors, isValid: parsed.success };
}
