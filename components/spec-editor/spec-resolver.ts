/**
 * react-hook-form validation with the server's own zod schema: the typed text is turned
 * into the request body first (spec-form-values.ts), then zodResolver checks the body, so
 * a field's message is the one the API would answer. Body paths equal field names
 * ('min', 'source.title'); an issue about the whole body lands in `root`.
 */
import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldErrors, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type { SpecFormValues } from './spec-form-values';

export function bodyResolver<S extends z.ZodType>(
  schema: S,
  toBody: (v: SpecFormValues) => unknown,
): Resolver<SpecFormValues, unknown, z.output<S>> {
  const check = zodResolver(schema as never) as unknown as Resolver<Record<string, unknown>, unknown, z.output<S>>;
  return async (values, context, options) => {
    const result = await check(toBody(values) as Record<string, unknown>, context, options as never);
    const errors = result.errors as FieldErrors & { ''?: { message?: string } };
    if (errors['']) {
      const { '': whole, ...rest } = errors;
      return {
        values: {},
        errors: { ...rest, root: { type: 'custom', message: whole?.message } } as FieldErrors<SpecFormValues>,
      };
    }
    return result as Awaited<ReturnType<Resolver<SpecFormValues, unknown, z.output<S>>>>;
  };
}
