import { Router } from 'express';
import { SearchQuery } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { searchLibrary } from './search.service';

const search = route({ query: SearchQuery }, ({ query }) => searchLibrary(query));

export const searchRouter = Router();

searchRouter.get('/', search);
