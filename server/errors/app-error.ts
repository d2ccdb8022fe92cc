/** The one error type services throw; the error handler turns it into RFC 9457 problem details. */
import type { FieldError } from '@/lib/contracts/enums';

export type { FieldError };

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extras: { errors?: FieldError[]; [key: string]: unknown } = {},
  ) {
    super(message);
    this.name = 'AppError';
  }

  static notFound(what: string, id?: string | number) {
    return new AppError(404, 'not_found', id === undefined ? `No such ${what}.` : `No ${what} with id ${id}.`);
  }
  static badRequest(message: string, errors?: FieldError[]) {
    return new AppError(400, 'validation_failed', message, errors ? { errors } : {});
  }
  static unprocessable(message: string, errors?: FieldError[]) {
    return new AppError(422, 'unprocessable', message, errors ? { errors } : {});
  }
  static conflict(message: string, extras: Record<string, unknown> = {}) {
    return new AppError(409, 'conflict', message, extras);
  }
  static unauthorized(message = 'Sign in to do this.') {
    return new AppError(401, 'unauthorized', message);
  }
  static forbidden(message = 'Your role does not allow this.') {
    return new AppError(403, 'forbidden', message);
  }
  static unavailable(message = 'The database is not reachable right now. Try again in a moment.') {
    return new AppError(503, 'unavailable', message);
  }
}
