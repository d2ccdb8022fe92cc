/**
 * /metrics in Prometheus text format (prom-client): request latency by route, the
 * database pool, the outbox backlog and the search index's age, beside Node's own
 * process metrics. Only direct loopback peers (the socket address, and no proxy headers:
 * the dev mailbox's rule) or a caller with `Authorization: Bearer $METRICS_TOKEN` may read it.
 */
import { timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import client from 'prom-client';
import { compileRules } from '@/server/auth/access';
import { ROUTE_RULES } from '@/server/auth/route-rules';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { sendProblem } from '@/server/middleware/error-handler';
import { isDirectLoopbackPeer } from '@/server/modules/mail/dev-mailbox.router';
import { within } from './lifecycle';

export const registry = new client.Registry();
client.collectDefaultMetrics({ register: registry });

const requestSeconds = new client.Histogram({
  name: 'specbench_http_request_duration_seconds',
  help: 'Time to answer an HTTP request, by route pattern and status',
  labelNames: ['method', 'route', 'status'] as const,
  buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
  registers: [registry],
});

const RULES = compileRules(ROUTE_RULES);

/** A bounded label: the route-rule pattern (`GET /api/specs/:id`), never the raw path. */
export function routeLabel(method: string, path: string): string {
  if (path === '/metrics') return '/metrics';
  if (!path.startsWith('/api/')) return 'web';
  const m = method === 'HEAD' ? 'GET' : method;
  return RULES.find((r) => r.method === m && r.pattern.test(path))?.key.split(' ')[1] ?? 'unmatched';
}

export const measureRequests: RequestHandler = (req, res, next) => {
  const end = requestSeconds.startTimer();
  const path = req.path;
  res.on('finish', () => end({ method: req.method, route: routeLabel(req.method, path), status: res.statusCode }));
  next();
};

type MysqlPool = {
  _allConnections?: { length: number };
  _freeConnections?: { length: number };
  _connectionQueue?: { length: number };
};
const pool = () =>
  AppDataSource.isInitialized ? (AppDataSource.driver as unknown as { pool?: MysqlPool }).pool : undefined;

new client.Gauge({
  name: 'specbench_db_pool_connections',
  help: 'Database pool connections by state (open, idle, in use) and requests waiting for one',
  labelNames: ['state'] as const,
  registers: [registry],
  collect() {
    const p = pool();
    const open = p?._allConnections?.length ?? 0;
    const idle = p?._freeConnections?.length ?? 0;
    this.set({ state: 'open' }, open);
    this.set({ state: 'idle' }, idle);
    this.set({ state: 'in_use' }, open - idle);
    this.set({ state: 'waiting' }, p?._connectionQueue?.length ?? 0);
    this.set({ state: 'limit' }, config.DB_POOL_SIZE);
  },
});

const backlog = new client.Gauge({
  name: 'specbench_outbox_backlog',
  help: 'E-mails not yet sent (all, and due now)',
  labelNames: ['which'] as const,
  registers: [registry],
});
const oldestUnsent = new client.Gauge({
  name: 'specbench_outbox_oldest_unsent_seconds',
  help: 'Age of the oldest unsent e-mail (0 when none)',
  registers: [registry],
});

async function collectOutbox() {
  const [row] = await within(
    1000,
    AppDataSource.query(
      `SELECT COUNT(*) AS n, SUM(next_attempt_at <= NOW(3)) AS due,
              TIMESTAMPDIFF(SECOND, MIN(created_at), NOW(3)) AS age
         FROM outbox_messages WHERE sent_at IS NULL`,
    ),
  );
  backlog.set({ which: 'unsent' }, Number(row.n));
  backlog.set({ which: 'due' }, Number(row.due ?? 0));
  oldestUnsent.set(Number(row.age ?? 0));
}

/** Seconds since the search index was last brought up to date; the search module reports it. */
let indexAgeSource: (() => number | null) | null = null;
export function setIndexAgeSource(source: () => number | null) {
  indexAgeSource = source;
}
const indexAge = new client.Gauge({
  name: 'specbench_search_index_age_seconds',
  help: 'Seconds since this process last brought its search index up to date (-1 before the first build)',
  registers: [registry],
  collect() {
    this.set(indexAgeSource?.() ?? -1);
  },
});
void indexAge;

function tokenMatches(header: string | undefined): boolean {
  if (!config.METRICS_TOKEN || !header?.startsWith('Bearer ')) return false;
  const given = Buffer.from(header.slice(7));
  const want = Buffer.from(config.METRICS_TOKEN);
  return given.length === want.length && timingSafeEqual(given, want);
}

export const metricsEndpoint: RequestHandler = async (req, res) => {
  if (!isDirectLoopbackPeer(req) && !tokenMatches(req.headers.authorization)) {
    return sendProblem(res, { status: 404, code: 'not_found', detail: `No route for ${req.method} ${req.path}.` });
  }
  if (AppDataSource.isInitialized) await collectOutbox().catch(() => undefined);
  res.setHeader('Cache-Control', 'no-store');
  res.type(registry.contentType).send(await registry.metrics());
};
