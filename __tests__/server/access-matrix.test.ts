/**
 * Every API route × every role: anonymous, contributor, editor, admin. A route mounted
 * without a rule in server/auth/route-rules.ts, or a rule for a route that does not
 * exist, fails here.
 */
import request from 'supertest';
import { apiRouters, createApp } from '@/server/app';
import { ROUTE_RULES } from '@/server/auth/route-rules';
import { ROLES, roleAtLeast, type AccessRule, type Role } from '@/server/auth/roles';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });

type Layer = { route?: { path: string | string[]; methods: Record<string, boolean> } };

/** 'METHOD /api/prefix/path' for every route the routers declare. */
function mountedRoutes(): string[] {
  return apiRouters().flatMap(([prefix, router]) =>
    (router as unknown as { stack: Layer[] }).stack
      .filter((l) => l.route)
      .flatMap((l) =>
        [l.route!.path].flat().flatMap((path) =>
          Object.keys(l.route!.methods)
            .filter((m) => m !== '_all')
            .map((m) => `${m.toUpperCase()} /api${prefix}${path === '/' ? '' : path}`),
        ),
      ),
  );
}

function expectedFor(rule: AccessRule, who: Role | 'anonymous'): 'allowed' | 401 | 403 {
  if (rule === 'public') return 'allowed';
  if (who === 'anonymous') return 401;
  if (rule === 'signed-in') return 'allowed';
  return roleAtLeast(who, rule) ? 'allowed' : 403;
}

describe('route rules', () => {
  it('every mounted route has exactly one rule, and every rule names a mounted route', () => {
    const mounted = mountedRoutes().sort();
    expect(mounted.length).toBeGreaterThan(10);
    expect(Object.keys(ROUTE_RULES).sort()).toEqual(mounted);
  });
});

const CASES = Object.entries(ROUTE_RULES).flatMap(([key, rule]) =>
  (['anonymous', ...ROLES] as const).map((who) => [key, who, rule, expectedFor(rule, who)] as const),
);

describe.each(CASES)('%s as %s', (key, who, _rule, expected) => {
  it(`is ${expected === 'allowed' ? 'allowed past the access check' : `refused with ${expected}`}`, async () => {
    const [method, path] = key.split(' ');
    const url = path.replace(/:[a-zA-Z]+/g, '1');
    let req = request(app)[method.toLowerCase() as 'get'](url);
    if (who !== 'anonymous') req = req.set(await authHeader(who, `matrix-${who}`));
    // Sign-out-everywhere would revoke nothing harmful; bodies are empty on purpose (validation may answer 400).
    const res = method === 'GET' ? await req : await req.send({});
    if (expected === 'allowed') {
      // Refusals of the access layer carry these codes; a route's own 401 (e.g. no refresh cookie) or 403
      // (e.g. not_job_owner: an admin may read a job but not record on it) carries its own.
      expect(['unauthorized', 'forbidden']).not.toContain(res.body?.code);
    } else {
      expect(res.status).toBe(expected);
      expect(res.body.code).toBe(expected === 401 ? 'unauthorized' : 'forbidden');
    }
  });
});
