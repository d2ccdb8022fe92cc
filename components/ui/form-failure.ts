/**
 * What a failed request means for a form: one sentence for the whole form, plus the
 * messages the server gave for named fields (RFC 9457 `errors[].path`), which
 * `useServerErrors` puts under those fields.
 */
import { useEffect } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';

export type FieldErrors = Partial<Record<string, string>>;
export type FormFailure = { message: string; fields: FieldErrors };

// Answers whose problem detail is written for the person at the form.
const SPOKEN_CODES = new Set([
  'invalid_credentials',
  'email_not_verified',
  'account_disabled',
  'invalid_token',
  'token_used',
  'token_expired',
]);

/**
 * A failed request as the form shows it. `rename` maps server field paths to form fields
 * (the password check names `password` even when the form calls it `newPassword`).
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

/**
 * Puts the server's field messages (keyed by form field) under the form's fields, once per
 * failure: a change to the field re-validates it and clears the message.
 */
export function useServerErrors<V extends FieldValues>(setError: UseFormSetError<V>, fields: FieldErrors | undefined) {
  // The failure object is rebuilt on every render; its content says whether it is new.
  const key = JSON.stringify(fields ?? {});
  useEffect(() => {
    for (const [path, message] of Object.entries(JSON.parse(key) as FieldErrors))
      if (message) setError(path as Path<V>, { type: 'server', message });
  }, [key, setError]);
}
