import path from 'node:path';
import { Router } from 'express';
import { COLUMN_REFERENCE } from '@/lib/csv';
import { IdParams } from '@/lib/contracts/library';
import { ImportCommitBody, ImportListQuery, ImportPreviewQuery } from '@/lib/contracts/imports';
import { actorOf } from '@/server/auth/actor';
import { config } from '@/server/config';
import { requireJson } from '@/server/middleware/require-json';
import { validate } from '@/server/middleware/validate';
import { commitImport, getImportPreview, listImports, previewImport } from './import.service';
import { uploadCsv, uploadedFile } from './import-upload';

export const importRouter = Router();

// Before '/:id', which would take these names for ids.
importRouter.get('/template.csv', (_req, res) => {
  res.attachment('spec-template.csv').sendFile(path.join(config.rootDir, 'data', 'spec-template.csv'));
});

importRouter.get('/columns', (_req, res) => {
  res.json(COLUMN_REFERENCE);
});

importRouter.get('/', validate('query', ImportListQuery), async (_req, res) => {
  res.json(await listImports(res.locals.query.limit));
});

importRouter.post('/', validate('query', ImportPreviewQuery), uploadCsv, async (req, res) => {
  const preview = await previewImport(uploadedFile(req), actorOf(req), res.locals.query);
  res.status(201).location(`${req.baseUrl}/${preview.id}`).json(preview);
});

importRouter.get('/:id', validate('params', IdParams), validate('query', ImportPreviewQuery), async (_req, res) => {
  res.json(await getImportPreview(res.locals.params.id, res.locals.query));
});

importRouter.post(
  '/:id/commit',
  validate('params', IdParams),
  requireJson,
  validate('body', ImportCommitBody),
  async (req, res) => {
    res.json(await commitImport(res.locals.params.id, actorOf(req), res.locals.body.reason));
  },
);
