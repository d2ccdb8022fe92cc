import { Router } from 'express';
import { IdParams } from '@/lib/contracts/library';
import { PlanBody, PlanFile, PlansQuery, UpdatePlanBody } from '@/lib/contracts/plans';
import { route } from '@/server/http/handler';
import { exportPlanFile, importPlanFile } from './plan-file.service';
import { createPlan, getPlan, listPlans, planRevisions, updatePlan } from './plan.service';

const list = route({ query: PlansQuery }, ({ query, req }) => listPlans(query, req.user));
const show = route({ params: IdParams }, ({ params, req }) => getPlan(params.id, req.user));
const create = route({ body: PlanBody, created: true }, ({ body, actor }) => createPlan(body, actor));
const update = route({ params: IdParams, body: UpdatePlanBody }, ({ params, body, actor }) =>
  updatePlan(params.id, body, actor),
);
const revisions = route({ params: IdParams }, ({ params }) => planRevisions(params.id));
const importFile = route({ body: PlanFile }, ({ body, actor }) => importPlanFile(body, actor));
const exportFile = route({}, async ({ res }) => {
  res.attachment('specbench-plans.json').json(await exportPlanFile());
});

export const planRouter = Router();

planRouter.get('/', list);
planRouter.post('/', create);
planRouter.get('/export.json', exportFile);
planRouter.post('/import', importFile);
planRouter.get('/:id', show);
planRouter.patch('/:id', update);
planRouter.get('/:id/revisions', revisions);
