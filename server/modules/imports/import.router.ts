import { Router } from 'express';
import { COLUMN_REFERENCE } from '@/lib/csv';
import { IdParams } from '@/lib/contracts/library';
import { ImportCommitBody, ImportListQuery, ImportPreviewQuery } from '@/lib/contracts/imports';
import { route } from '@/server/http/handler';
import { requireJson } from '@/server/middleware/require-json';
import { commitImport, getImportPreview, listImports, previewImport } from './import.service';
import { uploadCsv, uploadedFile } from './import-upload';
import { templateCsv } from './import-template';

const template = route({}, ({ res }) => {
  res.attachment('spec-template.csv').type('text/csv; charset=utf-8').send(templateCsv());
});
const upload = route({ query: ImportPreviewQuery, use: [uploadCsv], created: true }, ({ query, actor, req }) =>
  previewImport(uploadedFile(req), actor, query),
);
const preview = route({ params: IdParams, query: ImportPreviewQuery }, ({ params, query }) =>
  getImportPreview(params.id, query),
);
const columns = route({}, () => COLUMN_REFERENCE);
const list = route({ query: ImportListQuery }, ({ query }) => listImports(query.limit));
const commit = route({ params: IdParams, use: [requireJson], body: ImportCommitBody }, ({ params, actor, body }) =>
  commitImport(params.id, actor, body.reason),
);

export const importRouter = Router();

// Before '/:id', which would take these names for ids.
importRouter.get('/template.csv', template);
importRouter.get('/columns', columns);
importRouter.get('/', list);
importRouter.post('/', upload);
importRouter.get('/:id', preview);
importRouter.post('/:id/commit', commit);
