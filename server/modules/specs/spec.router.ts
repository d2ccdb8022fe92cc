import { Router } from 'express';
import { CreateSpecBody, RevertSpecBody, UpdateSpecBody } from '@/lib/contracts/curation';
import { IdParams } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { requireJson } from '@/server/middleware/require-json';
import { readSpec } from './spec.service';
import { createSpec, updateSpec } from './spec-edit.service';
import { listRevisions, revertSpec } from './revision.service';

// Public routes: req.user is the signed-in viewer when there is one (drafts are for editors).
const show = route({ params: IdParams }, ({ params, req }) => readSpec(params.id, req.user));
// Editors' writes and the revision history (route-rules.ts: editor and up).
const create = route({ use: [requireJson], body: CreateSpecBody, created: true }, ({ body, actor }) =>
  createSpec(body, actor),
);
const update = route({ params: IdParams, use: [requireJson], body: UpdateSpecBody }, ({ params, body, actor }) =>
  updateSpec(params.id, body, actor),
);
const revisions = route({ params: IdParams }, ({ params, req }) => listRevisions(params.id, req.user));
const revert = route({ params: IdParams, use: [requireJson], body: RevertSpecBody }, ({ params, body, actor }) =>
  revertSpec(params.id, body, actor),
);

/** Published specs for everyone; editors' writes and revisions. Mounted at /api/specs. */
export const specRouter = Router();

specRouter.get('/:id', show);
specRouter.post('/', create);
specRouter.patch('/:id', update);
specRouter.get('/:id/revisions', revisions);
specRouter.post('/:id/revert', revert);
