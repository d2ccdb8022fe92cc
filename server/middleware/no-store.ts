/**
 * Private answers are never kept by a browser's or a shared (proxy, CDN) cache: every
 * answer to a request that carries a bearer token (what it sees depends on who asks),
 * every route that is not public (jobs, users, corrections, CSV of readings…) and
 * everything under /api/auth (access tokens, the refresh cookie, who is signed in) gets
 * `Cache-Control: no-store` (RFC 9111 §5.2.2.5). It is set when the headers go out, so a
 * route that sets caching of its own cannot make a private answer cacheable by mistake.
 * The offline copy of a user's own data lives in the app's device storage, not in HTTP caches.
 */
import type { Request, RequestHandler } from 'express';
import { ruleFor } from '../auth/access';

export function isPrivate(req: Request): boolean {
  const path = req.baseUrl + req.path;
  return !!req.headers.authorization || path.startsWith('/api/auth/') || ruleFor(req.method, path) !== 'public';
}

export const noStoreForPrivate: RequestHandler = (req, res, next) => {
  if (!isPrivate(req)) return next();
  res.setHeader('Cache-Control', 'no-store');
  const writeHead = res.writeHead;
  res.writeHead = function (this: typeof res, ...args: Parameters<typeof writeHead>) {
    if (!this.headersSent) this.setHeader('Cache-Control', 'no-store');
    return writeHead.apply(this, args);
  } as typeof writeHead;
  next();
};
