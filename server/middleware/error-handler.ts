import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../errors/app-error';
import { isLockContention } from '../db/deadlock-retry';
import { requestIdOf } from '../http/logging';

const TITLES: Record<number, string> = {
  400: 'Bad request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not found',
  409: 'Conflict',
  413: 'Payload too large',
  405: 'Method not allowed',
  415: 'Unsupported media type',
  422: 'Unprocessable content',
  429: 'Too many requests',
  500: 'Internal server error',
  503: 'Service unavailable',
};

type Problem = { status: number; code: string; detail: string; [key: string]: unknown };

/** Seconds a client (or balancer) should wait before retrying a 503. */
const RETRY_AFTER_S = 2;

export function sendProblem(res: Parameters<RequestHandler>[1], problem: Problem) {
  const { status, code, detail, ...extras } = problem;
  if (status === 503 && !res.getHeader('Retry-After')) res.setHeader('Retry-After', String(RETRY_AFTER_S));
  // Extras come first so they can never overwrite the standard members.
  res
    .status(status)
    .type('application/problem+json')
    .json({
      ...extras,
      type: `https://specbench.example/problems/${code}`,
      title: TITLES[status] ?? 'Error',
      status,
      detail,
      code,
      requestId: requestIdOf(res),
    });
}

export const notFoundHandler: RequestHandler = (req, res) => {
  sendProblem(res, { status: 404, code: 'not_found', detail: `No route for ${req.method} ${req.path}.` });
};

/** Database connection failures become 503 so clients retry instead of giving up. */
const DB_DOWN = new Set([
  'ECONNREFUSED',
  'PROTOCOL_CONNECTION_LOST',
  'ETIMEDOUT',
  'ER_CON_COUNT_ERROR',
  'ECONNRESET',
  'EPIPE',
  // A query that outlived DB_QUERY_TIMEOUT_MS (client side) or MAX_STATEMENT_TIME (server side).
  'PROTOCOL_SEQUENCE_TIMEOUT',
]);
/** MariaDB's ER_STATEMENT_TIMEOUT (mysql2 has no name for it). */
const STATEMENT_TIMEOUT = 1969;
function isDatabaseDown(err: unknown): boolean {
  const e = err as { code?: string; errno?: number; driverError?: { code?: string; errno?: number }; message?: string };
  const code = e?.code ?? e?.driverError?.code;
  return (
    (code !== undefined && DB_DOWN.has(code)) ||
    (e?.errno ?? e?.driverError?.errno) === STATEMENT_TIMEOUT ||
    /Connection lost|connect ECONNREFUSED|Pool is closed/i.test(e?.message ?? '')
  );
}

/** Why body-parser could not read a request body, by its error `type`. */
function unreadableBody(err: { type?: string; charset?: string; encoding?: string }): { code: string; detail: string } {
  switch (err.type) {
    case 'entity.too.large':
      return { code: 'payload_too_large', detail: 'The request body is too large.' };
    case 'entity.parse.failed':
      return { code: 'bad_request', detail: 'The request body could not be read (malformed JSON?).' };
    case 'charset.unsupported':
      return {
        code: 'unsupported_charset',
        detail: `The request body's charset "${String(err.charset ?? '').slice(0, 40)}" is not supported; send JSON in UTF-8 (Content-Type: application/json; charset=utf-8).`,
      };
    case 'encoding.unsupported':
      return {
        code: 'unsupported_encoding',
        detail: `The request body's Content-Encoding "${String(err.encoding ?? '').slice(0, 40)}" is not supported; send it uncompressed, or as gzip, deflate or br.`,
      };
    default:
      return { code: 'bad_request', detail: 'The request body could not be read.' };
  }
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof AppError) {
    if (err.status >= 500 && err.status !== 503) req.log?.error({ err }, err.message);
    return sendProblem(res, { status: err.status, code: err.code, detail: err.message, ...err.extras });
  }
  // body-parser and multer errors carry an HTTP status of their own.
  const status =
    (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500)
    return sendProblem(res, { status, ...unreadableBody(err) });
  if (isDatabaseDown(err)) {
    req.log?.warn({ err }, 'database unavailable');
    return sendProblem(res, {
      status: 503,
      code: 'unavailable',
      detail: 'The database is not reachable right now. Try again in a moment.',
    });
  }
  // Deadlocks that outlasted writeTransaction's retries (server/db/deadlock-retry.ts), Galera
  // certification failures (also 1213) and lock-wait timeouts: nothing was written, so the
  // client may simply send it again (503 + Retry-After keeps an offline reading queued).
  if (isLockContention(err)) {
    req.log?.warn({ err }, 'write conflict');
    return sendProblem(res, {
      status: 503,
      code: 'write_conflict',
      detail: 'Another change reached the same records at the same moment, so nothing was saved. Send it again.',
    });
  }
  if (req.log) req.log.error({ err }, `${req.method} ${req.path} failed`);
  else console.error(`${req.method} ${req.originalUrl} failed:`, err);
  sendProblem(res, {
    status: 500,
    code: 'internal',
    detail: 'Something went wrong on the server. It has been logged.',
  });
};
