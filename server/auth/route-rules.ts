/**
 * The one place that says who may call each API route. enforceRouteRules (access.ts)
 * applies it before any router runs; a test walks every route of this table and of
 * the Express router stack, so a route without a rule fails the suite.
 * Keys are 'METHOD /api/path' with Express-style :params.
 */
import type { AccessRule } from './roles';

export const ROUTE_RULES: Record<string, AccessRule> = {
  'GET /api/health': 'public',
  'GET /api/search': 'public',
  'GET /api/models': 'public',
  'GET /api/models/:id': 'public',
  'GET /api/specs/:id': 'public',
  'POST /api/verdicts': 'public',
  'POST /api/specs': 'editor',
  'PATCH /api/specs/:id': 'editor',
  'GET /api/specs/:id/revisions': 'public',
  'POST /api/specs/:id/revert': 'editor',
  'GET /api/imports': 'editor',
  'POST /api/imports': 'editor',
  'GET /api/imports/template.csv': 'public',
  'GET /api/imports/columns': 'public',
  'GET /api/imports/:id': 'editor',
  'POST /api/imports/:id/commit': 'editor',
  'GET /api/exports/specs.csv': 'editor',
  'POST /api/auth/sign-up': 'public',
  'POST /api/auth/verify': 'public',
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/sign-out': 'public',
  'POST /api/auth/forgot': 'public',
  'POST /api/auth/reset': 'public',
  'GET /api/auth/me': 'signed-in',
  'POST /api/auth/password': 'signed-in',
  'POST /api/auth/sign-out-everywhere': 'signed-in',
  'POST /api/jobs': 'signed-in',
  'GET /api/jobs': 'signed-in',
  'GET /api/jobs/:id': 'signed-in',
  'PATCH /api/jobs/:id': 'signed-in',
  'POST /api/jobs/:id/readings': 'signed-in',
  'GET /api/jobs/:id/readings.csv': 'signed-in',
  'POST /api/corrections': 'contributor',
  'GET /api/corrections': 'contributor',
  'GET /api/corrections/summary': 'contributor',
  'GET /api/corrections/:id': 'contributor',
  'PATCH /api/corrections/:id': 'contributor',
  'POST /api/corrections/:id/withdraw': 'contributor',
  'POST /api/corrections/:id/accept': 'editor',
  'POST /api/corrections/:id/reject': 'editor',
  'GET /api/users': 'admin',
  'PATCH /api/users/:id': 'admin',
  'GET /api/users/:id/audit': 'admin',
};
