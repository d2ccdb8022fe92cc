/**
 * The process's phase, for readiness: `starting` until the server listens, `ready`,
 * then `draining` from SIGTERM on. A balancer takes a replica out when /api/health/ready
 * answers 503, so a starting or stopping replica gets no new traffic.
 */
export type Phase = 'starting' | 'ready' | 'draining';

let phase: Phase = 'starting';

export const lifecycle = {
  get phase(): Phase {
    return phase;
  },
  markReady() {
    if (phase === 'starting') phase = 'ready';
  },
  markDraining() {
    phase = 'draining';
  },
  /** Tests only: back to a fresh process. */
  reset(to: Phase = 'starting') {
    phase = to;
  },
};

/** Resolves with `work`, or rejects after `ms` (the work itself goes on; its own timeout ends it). */
export function within<T>(ms: number, work: Promise<T>): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const late = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms);
  });
  return Promise.race([work, late]).finally(() => clearTimeout(timer));
}
