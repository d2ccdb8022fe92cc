import { Router } from 'express';
import { CreateSpecBody, RevertSpecBody, UpdateSpecBody } from '@/lib/contracts/curation';
import { IdParams } from '@/lib/contracts/library';
import { actorOf } from '@/server/auth/actor';
import { requireJson } from '@/server/middleware/require-json';
import { validate } from '@/server/middleware/validate';
import { createSpec, updateSpec } from './spec-edit.service';
import { listRevisions, revertSpec } from './revision.service';

/** Editors' writes and the revision history; mounted beside specRouter at /api/specs. */
export const specEditRouter = Router();

specEditRouter.post('/', requireJson, validate('body', CreateSpecBody), async (req, res) => {
  const spec = await createSpec(res.locals.body, actorOf(req));
  res.status(201).location(`${req.baseUrl}/${spec.id}`).json(spec);
});

specEditRouter.patch(
  '/:id',
  validate('params', IdParams),
  requireJson,
  validate('body', UpdateSpecBody),
  async (req, res) => {
    res.json(await updateSpec(res.locals.params.id, res.locals.body, actorOf(req)));
  },
);

specEditRouter.get('/:id/revisions', validate('params', IdParams), async (_req, res) => {
  res.json(await listRevisions(res.locals.params.id));
});

specEditRouter.post(
  '/:id/revert',
  validate('params', IdParams),
  requireJson,
  validate('body', RevertSpecBody),
  async (req, res) => {
    res.json(await revertSpec(res.locals.params.id, res.locals.body, actorOf(req)));
  },
);
