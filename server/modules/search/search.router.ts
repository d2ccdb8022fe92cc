import { Router } from 'express';
import { SearchQuery } from '@/lib/contracts/library';
import { validate } from '@/server/middleware/validate';
import { searchLibrary } from './search.service';

export const searchRouter = Router();

searchRouter.get('/', validate('query', SearchQuery), async (_req, res) => {
  res.json(await searchLibrary(res.locals.query));
});
