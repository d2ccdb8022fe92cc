import { Router } from 'express';
import { ExportQuery } from '@/lib/contracts/imports';
import { route } from '@/server/http/handler';
import { openSpecsExport } from './export.service';
import { sendCsv } from './csv-download';

const specsCsv = route({ query: ExportQuery }, async ({ query, res }) => sendCsv(res, await openSpecsExport(query)));

export const exportRouter = Router();

exportRouter.get('/specs.csv', specsCsv);
