/**
 * react-hook-form validation with a request's own zod schema when the form's values are
 * not the body (text typed for numbers, nested parts shown as flat fields): the values
 * are turned into the body first, zodResolver checks it, and each message lands under
 * the field it is about, so the form says what the API would answer.
 */
import { zodResolver } from '@hookform/resolvers/zod';
import { get, set, type FieldErrors, type FieldValues, type Resolver } from 'react-hook-form';
import type { z } from 'zod';

export type BodyResolverOptions<V> = {
  /** The form field a body path is shown under ('citation.title' → 'title'); the path itself by default. */
  field?: (path: string) => string;
  /** Rules of the form beyond the body's schema, as messages by field. */
  extra?: (values: V) => Partial<Record<string, string>>;
  /** Hand the body as built (the server runs the schema's transforms itself) instead of the parsed one. */
  raw?: boolean;
};

type Leaf = { message?: string; type?: string };

/** Every message of a nested error object, by dotted path ('' for the whole body). */
function leaves(errors: object, prefix = ''): [string, Leaf][] {
  return Object.entries(errors).flatMap(([key, value]) => {
    const path = prefix ? `${prefix}.${key}` : key;
    if (value && typeof value === 'object' && 'message' in value) return [[path, value as Leaf]];
    return value && typeof value === 'object' ? leaves(value, path) : [];
  });
}

export function bodyResolver<V extends FieldValues, S extends z.ZodType>(
  schema: S,
  toBody: (values: V) => unknown,
  { field = (p) => p, extra, raw = false }: BodyResolverOptions<V> = {},
): Resolver<V, unknown, z.output<S>> {
  const check = (raw
    ? zodResolver(schema as never, undefined, { raw: true })
    : zodResolver(schema as never)) as unknown as Resolver<FieldValues, unknown>;
  return async (values, context, options) => {
    const result = await check(toBody(values) as FieldValues, context, options as never);
    // The form's own rules first: they say more than the schema about the fields they name.
    const found: [string, Leaf][] = [
      ...Object.entries(extra?.(values) ?? {}).map(([p, message]): [string, Leaf] => [p, { message, type: 'form' }]),
      ...leaves(result.errors),
    ];
    if (found.length === 0) return { values: result.values as z.output<S>, errors: {} };
    const errors: FieldErrors<V> = {};
    for (const [path, leaf] of found) {
      if (!leaf.message) continue;
      const name = path === '' ? 'root' : field(path);
      if (!get(errors, name)) set(errors, name, { type: leaf.type ?? 'validate', message: leaf.message });
    }
    return { values: {}, errors };
  };
}
