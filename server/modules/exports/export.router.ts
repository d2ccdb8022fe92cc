import { Router } from 'express';
import { ExportQuery } from '@/lib/contracts/imports';
import { validate } from '@/server/middleware/validate';
import { openSpecsExport } from './export.service';
import { sendCsv } from './csv-download';

export const exportRouter = Router();

exportRouter.get('/specs.csv', validate('query', ExportQuery), async (_req, res) => {
  await sendCsv(res, await openSpecsExport(res.locals.query));
});
