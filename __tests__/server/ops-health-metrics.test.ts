/**
 * Readiness, liveness, request ids and /metrics (issue 15: graceful lifecycle, structured
 * logs, metrics), in-process against this worker's database.
 */
import type { Request, Response } from 'express';
import request from 'supertest';
import { createApp } from '@/server/app';
import { config } from '@/server/config';
import { lifecycle } from '@/server/http/lifecycle';
import { metricsEndpoint, routeLabel, setIndexAgeSource } from '@/server/http/metrics';
import { expectProblem } from '../helpers/problems';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();
const app = createApp({ webDist: null });
afterEach(() => lifecycle.reset());

describe('GET /api/health/ready and /live', () => {
  it('ready answers 503 while the process starts, 200 once it serves, and 503 again while it drains', async () => {
    lifecycle.reset('starting');
    const starting = await request(app).get('/api/health/ready');
    expectProblem(starting, 503, 'unavailable');
    expect(starting.body.phase).toBe('starting');
    expect(starting.headers['retry-after']).toBe('2');

    lifecycle.markReady();
    const ready = await request(app).get('/api/health/ready').expect(200);
    expect(ready.body).toEqual({ status: 'ready', phase: 'ready' });

    lifecycle.markDraining();
    const draining = await request(app).get('/api/health/ready');
    expectProblem(draining, 503, 'unavailable');
    expect(draining.body.phase).toBe('draining');
  });

  it('live reports the process itself, whatever its phase', async () => {
    lifecycle.reset('draining');
    const res = await request(app).get('/api/health/live').expect(200);
    expect(res.body).toMatchObject({ status: 'live', phase: 'draining', pid: process.pid });
  });
});

describe('request ids', () => {
  it('every answer carries X-Request-Id, and a problem names the same id', async () => {
    const res = await request(app).get('/api/no-such-thing');
    expectProblem(res, 404, 'not_found');
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.body.requestId).toBe(res.headers['x-request-id']);
  });

  it("keeps the balancer's id when it looks like one, and replaces one that does not", async () => {
    const kept = await request(app).get('/api/health/live').set('X-Request-Id', 'nginx-3f2a9c1d0b7e4a55');
    expect(kept.headers['x-request-id']).toBe('nginx-3f2a9c1d0b7e4a55');
    const replaced = await request(app).get('/api/health/live').set('X-Request-Id', 'bad id\twith spaces');
    expect(replaced.headers['x-request-id']).not.toContain(' ');
    expect(replaced.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });
});

describe('GET /metrics', () => {
  it('serves Prometheus text to a loopback peer: latency by route pattern, pool, outbox backlog, index age', async () => {
    setIndexAgeSource(() => 4);
    await request(app).get('/api/specs/999999999');
    const res = await request(app).get('/metrics').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/plain; version=0\.0\.4/);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.text).toMatch(
      /specbench_http_request_duration_seconds_bucket\{le="0\.05",method="GET",route="\/api\/specs\/:id",status="404"\}/,
    );
    // The id never becomes a label (a value such as a latency sum may hold those digits by chance).
    expect(res.text).not.toMatch(/\{[^}]*999999999[^}]*\}/);
    expect(res.text).toMatch(/specbench_db_pool_connections\{state="open"\} [1-9]/);
    expect(res.text).toMatch(/specbench_db_pool_connections\{state="limit"\} 20/);
    expect(res.text).toMatch(/specbench_outbox_backlog\{which="unsent"\} \d+/);
    expect(res.text).toMatch(/specbench_search_index_age_seconds 4/);
  });

  it('is refused to a request relayed by a proxy, even from loopback', async () => {
    const res = await request(app).get('/metrics').set('X-Forwarded-For', '203.0.113.9');
    expectProblem(res, 404, 'not_found');
  });

  it('opens to another host only with the bearer token', async () => {
    const saved = config.METRICS_TOKEN;
    config.METRICS_TOKEN = 'metrics-token-for-the-test-0123';
    try {
      const answer = async (authorization?: string) => {
        const sent: { status?: number; body?: string } = {};
        const res = {
          status(code: number) {
            sent.status = code;
            return res;
          },
          type: () => res,
          json: (body: unknown) => ((sent.body = JSON.stringify(body)), res),
          send: (body: string) => ((sent.status ??= 200), (sent.body = body), res),
          setHeader: () => res,
          getHeader: () => undefined,
        };
        const req = {
          socket: { remoteAddress: '198.51.100.7' },
          headers: { authorization },
          method: 'GET',
          path: '/metrics',
        };
        await metricsEndpoint(req as unknown as Request, res as unknown as Response, () => undefined);
        return sent;
      };
      expect((await answer()).status).toBe(404);
      expect((await answer('Bearer wrong-token-wrong-token-00')).status).toBe(404);
      const ok = await answer('Bearer metrics-token-for-the-test-0123');
      expect(ok.status).toBe(200);
      expect(ok.body).toContain('specbench_http_request_duration_seconds');
    } finally {
      config.METRICS_TOKEN = saved;
    }
  });

  it('labels requests by their route pattern, so ids never become labels', () => {
    expect(routeLabel('GET', '/api/specs/12')).toBe('/api/specs/:id');
    expect(routeLabel('HEAD', '/api/health')).toBe('/api/health');
    expect(routeLabel('GET', '/api/nope/1')).toBe('unmatched');
    expect(routeLabel('GET', '/specs/12')).toBe('web');
  });
});
