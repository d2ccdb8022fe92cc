import { Router } from 'express';
import { IdParams } from '@/lib/contracts/library';
import { validate } from '@/server/middleware/validate';
import { readSpec } from './spec.service';

export const specRouter = Router();

specRouter.get('/:id', validate('params', IdParams), async (_req, res) => {
  res.json(await readSpec(res.locals.params.id));
});
