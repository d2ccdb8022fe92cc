import { Router } from 'express';
import type { HealthDto } from '@/lib/contracts/library';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';

export const healthRouter = Router();

/** Answers 200 only when the database answers; 503 otherwise, so a load balancer can tell. */
healthRouter.get('/', async (_req, res) => {
  let specs: number;
  try {
    const [row] = await AppDataSource.query("SELECT COUNT(*) AS n FROM specs WHERE status = 'published'");
    specs = Number(row.n);
  } catch {
    throw AppError.unavailable();
  }
  const body: HealthDto = { status: 'ok', database: 'up', specs, time: new Date().toISOString() };
  res.json(body);
});
