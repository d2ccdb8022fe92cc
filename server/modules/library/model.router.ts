import { Router } from 'express';
import { IdParams, ModelsQuery } from '@/lib/contracts/library';
import { validate } from '@/server/middleware/validate';
import { getModel, listModels } from './model.service';

export const modelRouter = Router();

modelRouter.get('/', validate('query', ModelsQuery), async (_req, res) => {
  res.json(await listModels(res.locals.query));
});

modelRouter.get('/:id', validate('params', IdParams), async (_req, res) => {
  res.json(await getModel(res.locals.params.id));
});
