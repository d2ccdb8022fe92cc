/**
 * Enforces ROUTE_RULES before any router runs: reads the bearer token when there is
 * one, then answers 401 (no valid token) or 403 (role too low) for routes that need
 * them. Routes missing from the table are refused, so a new route cannot slip out
 * without a rule.
 */
import type { RequestHandler } from 'express';
import { AppError } from '../errors/app-error';
import { passport } from './passport';
import { ROUTE_RULES } from './route-rules';
import { roleAtLeast, type AccessRule } from './roles';

type CompiledRule = { method: string; pattern: RegExp; rule: AccessRule; specificity: number; key: string };

export function compileRules(rules: Record<string, AccessRule>): CompiledRule[] {
  return Object.entries(rules)
    .map(([key, rule]) => {
      const [method, path] = key.split(' ');
      const parts = path.split('/');
      const pattern = new RegExp(
        `^${parts.map((p) => (p.startsWith(':') ? '[^/]+' : p.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'))).join('/')}/?$`,
      );
      return { method, pattern, rule, key, specificity: parts.filter((p) => !p.startsWith(':')).length };
    })
    .sort((a, b) => b.specificity - a.specificity);
}

const COMPILED = compileRules(ROUTE_RULES);

export function ruleFor(method: string, path: string): AccessRule | undefined {
  const m = method === 'HEAD' ? 'GET' : method;
  return COMPILED.find((r) => r.method === m && r.pattern.test(path))?.rule;
}

export const enforceRouteRules: RequestHandler = (req, res, next) => {
  const rule = ruleFor(req.method, req.baseUrl + req.path);
  if (!rule) return next(AppError.notFound(`route ${req.method} ${req.baseUrl + req.path}`));
  const check = () => {
    if (rule === 'public') return next();
    if (!req.user) return next(AppError.unauthorized());
    if (rule !== 'signed-in' && !roleAtLeast(req.user.role, rule)) return next(AppError.forbidden());
    next();
  };
  if (!req.headers.authorization) return check();
  passport.authenticate('jwt', { session: false }, (err: unknown, user: Express.User | false) => {
    if (err) return next(err);
    // A token that is present but invalid is refused even on public routes, so clients notice.
    if (!user) return next(AppError.unauthorized('Your session has expired or is not valid. Sign in again.'));
    req.user = user;
    check();
  })(req, res, next);
};
