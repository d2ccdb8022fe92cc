/**
 * route(): the one way to write an API route. It parses the request's params, query and
 * body with zod schemas, hands the typed result to the handler together with the signed-in
 * account, and answers with what the handler returns (JSON, 200 unless `status` says
 * otherwise). Invalid input answers 400 validation_failed problem details with
 * `errors: [{ path, message }]`, before the handler runs.
 *
 *   const update = route({ params: IdParams, body: UpdateJobBody }, ({ user, params, body }) =>
 *     updateJob(user, params.id, body),
 *   );
 *   // 201 + Location: /api/specs/<id>
 *   const create = route({ use: [requireJson], body: CreateSpecBody, created: true }, ({ body, actor }) =>
 *     createSpec(body, actor),
 *   );
 *   jobRouter.patch('/:id', update);   // routers: handlers named above, one line per route
 *   specRouter.post('/', create);
 *
 * Order: params, then query, then the `use` middleware (requireJson, an upload), then body,
 * so a bad id is reported before a wrong content type. Rate limits and other middleware
 * that must run first go before route() in the router call. `user` and `actor` throw 401
 * when read on a request without a signed-in account (route-rules.ts normally answers
 * first). A handler that answers by itself (a cookie and 204, a file, a CSV stream) uses
 * `res` and returns nothing.
 */
import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { actorOf, type Actor } from '@/server/auth/actor';
import type { SignedInUser } from '@/server/auth/roles';
import { AppError } from '@/server/errors/app-error';
import { parsePart } from '@/server/middleware/validate';

export type RouteSpec = {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** Middleware run after params and query are parsed and before the body is. */
  use?: RequestHandler[];
  /** Status of a successful answer (default 200). */
  status?: number;
  /** 201 with `Location: <mount>/<result.id>`; the handler must return something with an id. */
  created?: boolean;
};

type Parsed<S, K extends 'params' | 'query' | 'body'> = S extends { [P in K]: infer T extends z.ZodType }
  ? z.output<T>
  : undefined;

export type RouteContext<S extends RouteSpec> = {
  params: Parsed<S, 'params'>;
  query: Parsed<S, 'query'>;
  body: Parsed<S, 'body'>;
  /** The signed-in account (id, e-mail, display name, role); 401 when there is none. */
  readonly user: SignedInUser;
  /** The signed-in account as the author of a change (revisions, import batches). */
  readonly actor: Actor;
  req: Request;
  res: Response;
};

type Result<S extends RouteSpec> = S extends { created: true } ? { id: number | string } : unknown;

const PARSED = Symbol('parsed input');
type WithParsed = Request & { [PARSED]?: Record<string, unknown> };

function parseInto(req: Request, spec: RouteSpec, parts: ('params' | 'query' | 'body')[]) {
  const parsed = ((req as WithParsed)[PARSED] ??= {});
  for (const part of parts) {
    const schema = spec[part];
    if (schema) parsed[part] = parsePart(req, part, schema);
  }
}

function contextOf<S extends RouteSpec>(req: Request, res: Response): RouteContext<S> {
  const parsed = (req as WithParsed)[PARSED] ?? {};
  return {
    params: parsed.params,
    query: parsed.query,
    body: parsed.body,
    get user() {
      if (!req.user) throw AppError.unauthorized();
      return req.user;
    },
    get actor() {
      return actorOf(req);
    },
    req,
    res,
  } as RouteContext<S>;
}

export function route<S extends RouteSpec>(
  spec: S,
  handler: (ctx: RouteContext<S>) => Result<S> | Promise<Result<S>>,
): RequestHandler[] {
  const answer: RequestHandler = async (req, res) => {
    parseInto(req, spec, ['body']);
    const result = await handler(contextOf<S>(req, res));
    if (result === undefined || res.headersSent) return;
    if (spec.created) res.status(201).location(`${req.baseUrl}/${(result as { id: number | string }).id}`);
    else if (spec.status) res.status(spec.status);
    res.json(result);
  };
  const early: RequestHandler = (req, _res, next) => {
    parseInto(req, spec, ['params', 'query']);
    next();
  };
  return [early, ...(spec.use ?? []), answer];
}
