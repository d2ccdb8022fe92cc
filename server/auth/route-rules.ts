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
};
