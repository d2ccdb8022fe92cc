import { Router } from 'express';
import { IdParams, ModelsQuery } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { getModel, listModels } from './model.service';

const list = route({ query: ModelsQuery }, ({ query }) => listModels(query));
const show = route({ params: IdParams }, ({ params }) => getModel(params.id));

export const modelRouter = Router();

modelRouter.get('/', list);
modelRouter.get('/:id', show);
