/**
 * The one factory of rate limiters: every limiter in the app comes from limiter(), and all
 * of them keep their counters in the store chosen here (MariaDB, shared by every replica).
 */
import type { Request } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import { rateLimitStore } from '../http/rate-limit-store';
import { sendProblem } from './error-handler';

export type LimiterOptions = {
  /**
   * Count per `key` alone, across every client address (default: per client address and
   * key). For budgets that belong to an account or an inbox, not to a machine: sending
   * from many addresses must not buy more attempts.
   */
  acrossClients?: boolean;
};

/**
 * A limiter that answers 429 problem details with Retry-After. Its counters live in
 * MariaDB (rate-limit-store.ts), so the limit holds across replicas; a store that fails
 * (the database is down) lets the request through to fail on its own.
 */
export function limiter(
  name: string,
  limit: number,
  windowMs: number,
  key?: (req: Request) => string,
  options: LimiterOptions = {},
) {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: rateLimitStore(name),
    passOnStoreError: true,
    keyGenerator: (req) => {
      const client = options.acrossClients && key ? '*' : ipKeyGenerator(req.ip ?? '');
      return `${name}:${client}${key ? `:${key(req)}` : ''}`;
    },
    handler: (req, res) => {
      const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = reset
        ? Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 1000))
        : Math.ceil(windowMs / 1000);
      res.setHeader('Retry-After', String(seconds));
      sendProblem(res, {
        status: 429,
        code: 'rate_limited',
        detail: `Too many attempts. Try again in ${seconds} seconds.`,
        retryAfter: seconds,
      });
    },
  });
}
