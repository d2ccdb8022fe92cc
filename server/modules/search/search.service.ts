/**
 * Search over the published library: the engine (search-engine.ts) answers from its index;
 * this module turns matches into the result groups the screen shows (by model, value inline).
 */
import type { SearchQuery, SearchResultDto, SearchGroupDto } from '@/lib/contracts/library';
import { formatRange } from '@/lib/units';
import { setIndexAgeSource } from '@/server/http/metrics';
import { SearchEngine } from './search-engine';
import type { IndexedSpec } from './search.queries';
import type { SearchMatch } from './search-index';

export { markLibraryChanged } from '../library/library-changes';

/** The process's engine; tests make more to act as other server processes. */
export const searchEngine = new SearchEngine();
setIndexAgeSource(() => searchEngine.ageSeconds());

function group(matches: SearchMatch<IndexedSpec>[]): SearchGroupDto[] {
  const groups = new Map<number, SearchGroupDto>();
  for (const { doc: d, score } of matches) {
    let g = groups.get(d.modelId);
    if (!g) {
      const model = { id: d.modelId, make: { id: d.makeId, name: d.make }, name: d.model };
      g = { model: { ...model, yearFrom: d.yearFrom, yearTo: d.yearTo, variant: d.variant }, hits: [] };
      groups.set(d.modelId, g);
    }
    g.hits.push({
      specId: d.specId,
      component: d.component,
      parameter: d.parameter,
      quantityKind: d.quantityKind,
      min: d.min,
      nominal: d.nominal,
      max: d.max,
      unit: d.unit,
      display: formatRange(d.min, d.nominal, d.max, d.unit),
      score: Math.round(score * 1000) / 1000,
    });
  }
  return [...groups.values()];
}

export async function searchLibrary(query: SearchQuery, engine = searchEngine): Promise<SearchResultDto> {
  const index = await engine.current();
  const { matches, total } = await index.searchAsync(query.q, query.limit);
  return { query: query.q, total, groups: group(matches) };
}
