/**
 * Health for people and balancers. Every answer comes within HEALTH_TIMEOUT_MS even when
 * the database does not answer at all (a frozen server), as 503 with Retry-After.
 *  - GET /api/health        the database answers, with the published spec count
 *  - GET /api/health/ready  this replica should get traffic: started, not draining, database answering
 *  - GET /api/health/live   the process itself runs (never touches the database)
 */
import { Router } from 'express';
import type { HealthDto } from '@/lib/contracts/library';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';
import { lifecycle, within } from '@/server/http/lifecycle';

/** Below the 2 s a balancer's health probe usually waits (common practice, no published source). */
export const HEALTH_TIMEOUT_MS = 1500;

async function answers<T>(work: () => Promise<T>): Promise<T> {
  try {
    if (!AppDataSource.isInitialized) throw new Error('not connected');
    return await within(HEALTH_TIMEOUT_MS, work());
  } catch {
    throw AppError.unavailable();
  }
}

async function health(): Promise<HealthDto> {
  const [row] = await answers(() => AppDataSource.query("SELECT COUNT(*) AS n FROM specs WHERE status = 'published'"));
  return { status: 'ok', database: 'up', specs: Number(row.n), time: new Date().toISOString() };
}

async function ready() {
  if (lifecycle.phase !== 'ready') {
    throw new AppError(503, 'unavailable', `This server is ${lifecycle.phase}.`, { phase: lifecycle.phase });
  }
  await answers(() => AppDataSource.query('SELECT 1'));
  return { status: 'ready', phase: lifecycle.phase };
}

function live() {
  return { status: 'live', phase: lifecycle.phase, pid: process.pid, uptimeS: Math.round(process.uptime()) };
}

export const healthRouter = Router();

healthRouter.get('/', route({}, health));
healthRouter.get('/ready', route({}, ready));
healthRouter.get('/live', route({}, live));
