import { useEffect } from 'react';
import type { UseFormSetError } from 'react-hook-form';
import type { FieldError } from '@/lib/api/client';
import { formPath, type SpecFormValues } from './spec-form-values';

/** Puts the API's `errors[].path` messages under the matching form fields (others on the form's root). */
export function useServerErrors(setError: UseFormSetError<SpecFormValues>, errors: FieldError[] | undefined) {
  useEffect(() => {
    for (const e of errors ?? []) setError(formPath(e.path) as 'root.server', { type: 'server', message: e.message });
  }, [errors, setError]);
}
