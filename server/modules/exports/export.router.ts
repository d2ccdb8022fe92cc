import { Router } from 'express';
import { ExportQuery } from '../../../lib/contracts/imports';
import { validate } from '../../middleware/validate';
import { streamSpecsCsv } from './export.service';

export const exportRouter = Router();

exportRouter.get('/specs.csv', validate('query', ExportQuery), async (_req, res) => {
  await streamSpecsCsv(res, res.locals.query);
});
