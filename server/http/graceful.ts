/**
 * Stopping without dropping requests (SIGTERM from an orchestrator, a rolling restart):
 * readiness turns 503, the listener closes (no new connections; idle keep-alive ones are
 * closed), requests in flight get up to SHUTDOWN_TIMEOUT_MS to finish, then whatever is
 * left is cut, background work is awaited, and the pool is closed.
 */
import type { Server } from 'node:http';
import { lifecycle } from './lifecycle';

export type DrainSteps = {
  server?: Server;
  timeoutMs: number;
  /** Stop background work and wait for the current run (the outbox worker). */
  stopWork: () => Promise<void>;
  /** Close the database pool and other resources. */
  close: () => Promise<void>;
};

/** Resolves once everything is closed; `true` when every request finished in time. */
export async function drain({ server, timeoutMs, stopWork, close }: DrainSteps): Promise<boolean> {
  lifecycle.markDraining();
  let clean = true;
  if (server) {
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    // Keep-alive connections that become idle after their answer are closed as they go.
    const sweep = setInterval(() => server.closeIdleConnections(), 100);
    let timer: ReturnType<typeof setTimeout> | undefined;
    const late = new Promise<'late'>((resolve) => {
      timer = setTimeout(() => resolve('late'), timeoutMs);
    });
    if ((await Promise.race([closed, late])) === 'late') {
      clean = false;
      server.closeAllConnections();
      await closed;
    }
    clearInterval(sweep);
    clearTimeout(timer);
  }
  await stopWork().catch(() => undefined);
  await close().catch(() => undefined);
  return clean;
}
