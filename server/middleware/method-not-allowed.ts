/**
 * 405 Method Not Allowed, with Allow, for a path some route has but not with this method;
 * OPTIONS answers 204 with Allow. The methods come from the Express router stack itself
 * (each route's own path matcher, as the router runs it), flattened once on the first
 * request, so no list of routes is kept by hand. A path no route has goes on to the 404.
 * RFC 9110 §15.5.6: "The origin server MUST generate an Allow header field in a 405
 * response containing a list of the target resource's currently supported methods."
 */
import type { RequestHandler, Router } from 'express';
import { sendProblem } from './error-handler';

/** The parts of router 2.x's Layer and Route this reads (Layer#match has no side effects there). */
type Layer = {
  match(path: string): { path: string } | false;
  route?: { methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
};
/** A route and the mounts leading to it, outermost first. */
type Entry = { chain: Layer[]; methods: string[] };

function methodsOf(route: { methods: Record<string, boolean> }): string[] {
  const methods = Object.keys(route.methods)
    .filter((m) => m !== '_all' && route.methods[m])
    .map((m) => m.toUpperCase());
  return methods.includes('GET') && !methods.includes('HEAD') ? [...methods, 'HEAD'] : methods;
}

function flatten(stack: Layer[], mounts: Layer[] = []): Entry[] {
  return stack.flatMap((layer): Entry[] => {
    if (layer.route) return [{ chain: [...mounts, layer], methods: methodsOf(layer.route) }];
    if (layer.handle?.stack) return flatten(layer.handle.stack, [...mounts, layer]);
    return [];
  });
}

/** Matches as the router does: each mount takes its prefix off the path, the route takes the rest. */
function matches(chain: Layer[], path: string): boolean {
  let rest = path;
  for (const layer of chain) {
    const m = layer.match(rest);
    if (!m) return false;
    rest = rest.slice(m.path.length) || '/';
    if (!rest.startsWith('/')) rest = `/${rest}`;
  }
  return true;
}

/** For `router` (mounted somewhere); use it in that router before anything that answers 404. */
export function methodNotAllowed(router: Router): RequestHandler {
  let entries: Entry[] | null = null;
  return (req, res, next) => {
    entries ??= flatten((router as unknown as { stack: Layer[] }).stack);
    const allowed = new Set(entries.filter((e) => matches(e.chain, req.path)).flatMap((e) => e.methods));
    if (allowed.size === 0 || allowed.has(req.method)) return next();
    const allow = [...allowed].sort().join(', ');
    res.setHeader('Allow', allow);
    if (req.method === 'OPTIONS') return void res.status(204).end();
    sendProblem(res, {
      status: 405,
      code: 'method_not_allowed',
      detail: `${req.method} is not allowed on ${req.baseUrl}${req.path}; it takes ${allow}.`,
    });
  };
}
