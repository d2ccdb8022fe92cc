import { Router } from 'express';
import { IdParams } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { readSpec } from './spec.service';

const show = route({ params: IdParams }, ({ params }) => readSpec(params.id));

export const specRouter = Router();

specRouter.get('/:id', show);
