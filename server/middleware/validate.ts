import type { Request } from 'express';
import type { z } from 'zod';
import { AppError } from '../errors/app-error';

export type RequestPart = 'body' | 'query' | 'params';

export function issuesToErrors(error: z.ZodError) {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(root)', message: i.message }));
}

/**
 * Parses one part of the request with a zod schema and returns the typed result (Express 5
 * makes req.query read-only, so nothing is written back). 400 validation_failed otherwise,
 * or 422 unprocessable when every issue is marked so (lib/contracts/verdicts.ts UNPROCESSABLE).
 * Routes use it through `route()` in server/http/handler.ts.
 */
export function parsePart<S extends z.ZodType>(req: Request, part: RequestPart, schema: S): z.output<S> {
  const result = schema.safeParse(req[part] ?? {});
  if (!result.success) {
    const errors = issuesToErrors(result.error);
    // Well-formed, but a value the request cannot have (e.g. a verdict's number out of range).
    if (result.error.issues.every(isUnprocessable))
      throw AppError.unprocessable(`${errors[0].path}: ${errors[0].message}.`, errors);
    throw AppError.badRequest(`The request ${part === 'body' ? 'body' : part} is not valid.`, errors);
  }
  return result.data;
}

const isUnprocessable = (issue: z.core.$ZodIssue) =>
  issue.code === 'custom' && (issue.params as { status?: number } | undefined)?.status === 422;
