import { useCallback, useState } from 'react';
import type { z } from 'zod';

/**
 * Minimal form state validated by a shared zod schema (the same one the server uses).
 * Returns per-field messages keyed by the first path segment. `schema` may be a function returning it: the
 * schema (and zod) is then loaded on the first validation, not on the first render (the sign-in screen).
 */
export function useZodForm<S extends z.ZodType<unknown, Record<string, unknown>>>(schema: S | (() => S), initial: z.input<S>) {
  const [values, setValues] = useState<z.input<S>>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});

  const setField = useCallback(<K extends keyof z.input<S>>(key: K, value: z.input<S>[K]) => {
    setValues((v) => ({ ...v, [key]: value }));
    setErrors((e) => {
      if (!((key as string) in e)) return e;
      const next = { ...e };
      delete next[key as string];
      return next;
    });
  }, []);

  /** Validates; on success returns the parsed value, else sets the messages and returns null. */
  const validate = useCallback((): z.output<S> | null => {
    const result = (typeof schema === 'function' ? schema() : schema).safeParse(values);
    if (result.success) {
      setErrors({});
      return result.data;
    }
    const next: Record<string, string> = {};
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '');
      if (!next[key]) next[key] = issue.message;
    }
    setErrors(next);
    return null;
  }, [schema, values]);

  const reset = useCallback(() => {
    setValues(initial);
    setErrors({});
  }, [initial]);

  /** The props a text field needs for one key: its value, its change handler and its message. */
  const bind = <K extends keyof z.input<S> & string>(key: K) => ({
    value: String(values[key] ?? ''),
    onChangeText: (text: string) => setField(key, text as z.input<S>[K]),
    error: errors[key],
  });

  return { values, errors, setField, validate, reset, setErrors, bind };
}
