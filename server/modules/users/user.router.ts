import { Router } from 'express';
import { UpdateUserBody, UsersQuery } from '@/lib/contracts/auth';
import { IdParams } from '@/lib/contracts/library';
import { actorOf } from '@/server/auth/actor';
import { validate } from '@/server/middleware/validate';
import { listUsers, updateUser, userAudit } from './user.service';

export const userRouter = Router();

userRouter.get('/', validate('query', UsersQuery), async (_req, res) => {
  res.json(await listUsers(res.locals.query.q));
});

userRouter.patch('/:id', validate('params', IdParams), validate('body', UpdateUserBody), async (req, res) => {
  res.json(await updateUser(res.locals.params.id, res.locals.body, actorOf(req)));
});

userRouter.get('/:id/audit', validate('params', IdParams), async (_req, res) => {
  res.json(await userAudit(res.locals.params.id));
});
