import type { Request } from 'express';
import type { z } from 'zod';
import { AppError } from '../errors/app-error';

export type RequestPart = 'body' | 'query' | 'params';

export function issuesToErrors(error: z.ZodError) {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(root)', message: i.message }));
}

/**
 * Parses one part of the request with a zod schema and returns the typed result (Express 5
 * makes req.query read-only, so nothing is written back). 400 validation_failed otherwise.
 * Routes use it through `route()` in server/http/handler.ts.
 */
export function parsePart<S extends z.ZodType>(req: Request, part: RequestPart, schema: S): z.output<S> {
  const result = schema.safeParse(req[part] ?? {});
  if (!result.success) {
    throw AppError.badRequest(
      `The request ${part === 'body' ? 'body' : part} is not valid.`,
      issuesToErrors(result.error),
    );
  }
  return result.data;
}
