import type { RequestHandler } from 'express';
import { AppError } from '../errors/app-error';

/**
 * 415 for a request body that is not JSON (a form post, text), instead of the misleading
 * "field is required" that an unparsed body would give. A request without a body passes.
 */
export const requireJson: RequestHandler = (req, _res, next) => {
  const hasBody = req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;
  if (hasBody && !req.is('application/json')) {
    return next(
      new AppError(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'),
    );
  }
  next();
};
