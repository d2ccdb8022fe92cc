import { Router } from 'express';
import type { HealthDto } from '@/lib/contracts/library';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';

/** Answers 200 only when the database answers; 503 otherwise, so a load balancer can tell. */
async function health(): Promise<HealthDto> {
  let specs: number;
  try {
    const [row] = await AppDataSource.query("SELECT COUNT(*) AS n FROM specs WHERE status = 'published'");
    specs = Number(row.n);
  } catch {
    throw AppError.unavailable();
  }
  return { status: 'ok', database: 'up', specs, time: new Date().toISOString() };
}

export const healthRouter = Router();

healthRouter.get('/', route({}, health));
