import { Router } from 'express';
import { VerdictBody } from '@/lib/contracts/verdicts';
import { route } from '@/server/http/handler';
import { evaluateVerdict } from './verdict.service';

const evaluate = route({ body: VerdictBody }, ({ body }) => evaluateVerdict(body));

export const verdictRouter = Router();

verdictRouter.post('/', evaluate);
