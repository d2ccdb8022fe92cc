/**
 * Structured request logs: one JSON line per request (pino-http), each with a request id.
 * The id is taken from the balancer's `X-Request-Id` when it looks like one (nginx's
 * $request_id), made here otherwise, sent back in `X-Request-Id` and put in every problem
 * details answer (`requestId`), so a user's error report finds its log line.
 */
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import pino from 'pino';
import { pinoHttp } from 'pino-http';
import { config } from '@/server/config';

export const logger = pino({
  level: config.LOG_LEVEL ?? (config.NODE_ENV === 'test' ? 'silent' : 'info'),
  base: { pid: process.pid },
  timestamp: pino.stdTimeFunctions.isoTime,
});

const GIVEN_ID = /^[A-Za-z0-9._:-]{8,128}$/;

export function requestIdFor(req: IncomingMessage, res: ServerResponse): string {
  const given = req.headers['x-request-id'];
  const id = typeof given === 'string' && GIVEN_ID.test(given) ? given : randomUUID();
  res.setHeader('X-Request-Id', id);
  return id;
}

/** Links carry one-time tokens in their query (`/verify?token=`); the log never keeps them. */
export function loggedUrl(url: string | undefined): string {
  return (url ?? '').replace(/([?&](?:token|access_token)=)[^&]*/gi, '$1[redacted]');
}

export const requestLogger = pinoHttp({
  logger,
  genReqId: requestIdFor,
  customLogLevel: (_req, res, err) =>
    err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
  autoLogging: { ignore: (req) => req.url === '/api/health/live' },
  serializers: {
    req: (req: { id: string; method: string; url: string; remoteAddress?: string }) => ({
      id: req.id,
      method: req.method,
      url: loggedUrl(req.url),
      remoteAddress: req.remoteAddress,
    }),
    res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
  },
});

/** The id of the request an answer belongs to (set by requestLogger). */
export function requestIdOf(res: ServerResponse): string | undefined {
  const id = (res as ServerResponse & { req?: { id?: unknown } }).req?.id;
  return typeof id === 'string' ? id : undefined;
}
