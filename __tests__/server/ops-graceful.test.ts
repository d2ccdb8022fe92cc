/**
 * drain() (server/http/graceful.ts), the SIGTERM path, on a bare HTTP server: requests in
 * flight finish, idle keep-alive connections close at once, and a request that outlives the
 * bound is cut so the process can still exit. No database.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { drain } from '@/server/http/graceful';
import { lifecycle } from '@/server/http/lifecycle';

function serve(handler: http.RequestListener) {
  const server = http.createServer(handler);
  return new Promise<{ server: http.Server; port: number }>((resolve) =>
    server.listen(0, '127.0.0.1', () => resolve({ server, port: (server.address() as AddressInfo).port })),
  );
}
function get(port: number, agent?: http.Agent) {
  return new Promise<{ status: number; body: string }>((resolve, reject) => {
    http
      .get({ host: '127.0.0.1', port, path: '/', agent }, (res) => {
        let body = '';
        res.on('data', (c: Buffer) => (body += c.toString()));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
      })
      .on('error', reject);
  });
}
const steps = { stopWork: jest.fn(async () => undefined), close: jest.fn(async () => undefined) };

afterEach(() => lifecycle.reset());

describe('drain()', () => {
  it('marks the process draining, lets a slow request finish, then stops work and closes', async () => {
    const { server, port } = await serve((_req, res) => setTimeout(() => res.end('finished'), 300));
    const inFlight = get(port);
    await new Promise((resolve) => setTimeout(resolve, 50));
    const drained = drain({ server, timeoutMs: 5000, ...steps });
    expect(lifecycle.phase).toBe('draining');
    await expect(get(port)).rejects.toThrow(/ECONNREFUSED/);
    expect(await inFlight).toEqual({ status: 200, body: 'finished' });
    expect(await drained).toBe(true);
    expect(steps.stopWork).toHaveBeenCalled();
    expect(steps.close).toHaveBeenCalled();
  });

  it('does not wait for idle keep-alive connections', async () => {
    const { server, port } = await serve((_req, res) => res.end('ok'));
    const agent = new http.Agent({ keepAlive: true });
    await get(port, agent);
    const started = Date.now();
    expect(await drain({ server, timeoutMs: 5000, ...steps })).toBe(true);
    expect(Date.now() - started).toBeLessThan(1000);
    agent.destroy();
  });

  it('cuts a request that outlives the bound, and still closes', async () => {
    const { server, port } = await serve(() => undefined); // never answers
    const hung = get(port).catch((err: Error) => err);
    await new Promise((resolve) => setTimeout(resolve, 50));
    const started = Date.now();
    expect(await drain({ server, timeoutMs: 300, ...steps })).toBe(false);
    expect(Date.now() - started).toBeLessThan(2000);
    expect(String(await hung)).toMatch(/socket hang up|ECONNRESET/);
    expect(steps.close).toHaveBeenCalled();
  });
});
