import { Router } from 'express';
import { CreateSpecBody, RevertSpecBody, UpdateSpecBody } from '@/lib/contracts/curation';
import { IdParams } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { requireJson } from '@/server/middleware/require-json';
import { createSpec, updateSpec } from './spec-edit.service';
import { listRevisions, revertSpec } from './revision.service';

const create = route({ use: [requireJson], body: CreateSpecBody, created: true }, ({ body, actor }) =>
  createSpec(body, actor),
);
const update = route({ params: IdParams, use: [requireJson], body: UpdateSpecBody }, ({ params, body, actor }) =>
  updateSpec(params.id, body, actor),
);
const revert = route({ params: IdParams, use: [requireJson], body: RevertSpecBody }, ({ params, body, actor }) =>
  revertSpec(params.id, body, actor),
);

const revisions = route({ params: IdParams }, ({ params }) => listRevisions(params.id));

/** Editors' writes and the revision history; mounted beside specRouter at /api/specs. */
export const specEditRouter = Router();

specEditRouter.post('/', create);
specEditRouter.patch('/:id', update);
specEditRouter.get('/:id/revisions', revisions);
specEditRouter.post('/:id/revert', revert);
