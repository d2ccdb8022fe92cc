/**
 * Form plumbing shared by the account forms: field values, the zod messages shown under
 * each field on submit, and what a failed request means for the form (a sentence for
 * the whole form plus messages under the fields the server named).
 */
import { useState } from 'react';
import type { z } from 'zod';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';

export type FieldErrors = Partial<Record<string, string>>;
export type FormFailure = { message: string; fields: FieldErrors };

/** The first message for each top-level field of a failed parse. */
export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = String(issue.path[0] ?? '(root)');
    out[key] ??= issue.message;
  }
  return out;
}

// Account answers whose problem detail is written for the person at the form.
const SPOKEN_CODES = new Set([
  'invalid_credentials',
  'email_not_verified',
  'account_disabled',
  'invalid_token',
  'token_used',
  'token_expired',
]);

/**
 * A failed account request as the form shows it. `rename` maps server field paths to
 * form fields (the password check names `password` even when the form calls it `newPassword`).
 */
export function formFailure(err: unknown, rename: Record<string, string> = {}): FormFailure | null {
  if (!err) return null;
  if (!(err instanceof ApiError)) return { message: describeError(err), fields: {} };
  const fields: FieldErrors = {};
  for (const e of err.errors) {
    const key = rename[e.path] ?? e.path;
    fields[key] ??= e.message;
  }
  if (err.code === 'validation_failed') return { message: 'Check the fields marked below.', fields };
  const message = SPOKEN_CODES.has(err.code) || err.status === 422 ? err.message : describeError(err);
  return { message, fields };
}

/** Values of a form's text fields and the messages under them. */
export function useFormState<K extends string>(initial: Record<K, string>) {
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const field = (name: K) => ({
    value: values[name],
    onChangeText: (v: string) => {
      setValues((old) => ({ ...old, [name]: v }));
      // A message about the old text would be wrong about the new one.
      setErrors((old) => (old[name] ? { ...old, [name]: undefined } : old));
    },
  });
  /** Parses `input`; shows its messages (and `extra`) under the fields, or returns the data. */
  function check<T>(schema: z.ZodType<T>, input: unknown, extra: FieldErrors = {}): T | null {
    const parsed = schema.safeParse(input);
    const found = { ...(parsed.success ? {} : zodFieldErrors(parsed.error)), ...extra };
    setErrors(found);
    return parsed.success && !Object.values(found).some(Boolean) ? parsed.data : null;
  }
  return { values, field, errors, check };
}
