import { Router } from 'express';
import { SearchQuery } from '@/lib/contracts/library';
import { route } from '@/server/http/handler';
import { limiter } from '@/server/middleware/rate-limit';
import { searchEngine, searchLibrary } from './search.service';
import type { SearchEngine } from './search-engine';

/** Generous for a person (several searches a second while typing), a ceiling for a script. */
const SEARCHES_PER_MINUTE = 600;

/** Each app gets its own router and limiter; a test may hand it an engine of its own (another "process"). */
export function searchRouter(engine: SearchEngine = searchEngine) {
  const router = Router();
  router.get(
    '/',
    limiter('search', SEARCHES_PER_MINUTE, 60_000),
    route({ query: SearchQuery }, ({ query }) => searchLibrary(query, engine)),
  );
  return router;
}
