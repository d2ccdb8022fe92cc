import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError } from '../errors/app-error';

type Part = 'body' | 'query' | 'params';

export function issuesToErrors(error: z.ZodError) {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(root)', message: i.message }));
}

/**
 * Parses one part of the request with a zod schema and stores the result in
 * res.locals[part] (Express 5 makes req.query read-only). 400 validation_failed otherwise.
 */
export function validate<S extends z.ZodType>(part: Part, schema: S): RequestHandler {
  return (req, res, next) => {
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) {
      throw AppError.badRequest(
        `The request ${part === 'body' ? 'body' : part} is not valid.`,
        issuesToErrors(result.error),
      );
    }
    res.locals[part] = result.data;
    next();
  };
}
