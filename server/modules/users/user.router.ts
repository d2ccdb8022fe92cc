import { Router } from 'express';
import { UpdateUserBody, UsersQuery } from '@/lib/contracts/auth';
import { IdParams } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { listUsers, updateUser, userAudit } from './user.service';

const list = route({ query: UsersQuery }, ({ query }) => listUsers(query.q));
const update = route({ params: IdParams, body: UpdateUserBody }, ({ params, body, actor }) =>
  updateUser(params.id, body, actor),
);
const audit = route({ params: IdParams }, ({ params }) => userAudit(params.id));

export const userRouter = Router();

userRouter.get('/', list);
userRouter.patch('/:id', update);
userRouter.get('/:id/audit', audit);
