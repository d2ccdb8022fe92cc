import { Router } from 'express';
import { VerdictBody } from '@/lib/contracts/verdicts';
import { validate } from '@/server/middleware/validate';
import { evaluateVerdict } from './verdict.service';

export const verdictRouter = Router();

verdictRouter.post('/', validate('body', VerdictBody), async (_req, res) => {
  res.json(await evaluateVerdict(res.locals.body));
});
