/**
 * Search over the published library. The index is built from MariaDB on first use
 * and rebuilt when the library's fingerprint (spec count and last change) moves,
 * checked at most every few seconds, or at once after markLibraryChanged().
 */
import type { SearchQuery, SearchResultDto, SearchGroupDto } from '@/lib/contracts/library';
import { formatRange } from '@/lib/units';
import { SearchIndex } from './search-index';
import { loadPublishedDocs, publishedFingerprint, type IndexedSpec } from './search.queries';
import { markLibraryChanged, onLibraryChanged } from '../library/library-changes';

const RECHECK_MS = 3000;
let state: { index: SearchIndex; fingerprint: string; checkedAt: number } | null = null;
let building: Promise<SearchIndex> | null = null;

export { markLibraryChanged };
onLibraryChanged(() => {
  if (state) state.checkedAt = 0;
});

async function currentIndex(): Promise<SearchIndex> {
  const now = Date.now();
  if (state && now - state.checkedAt < RECHECK_MS) return state.index;
  const fp = await publishedFingerprint();
  if (state && state.fingerprint === fp) {
    state.checkedAt = now;
    return state.index;
  }
  building ??= loadPublishedDocs()
    .then((docs) => {
      const index = new SearchIndex(docs);
      state = { index, fingerprint: fp, checkedAt: Date.now() };
      return index;
    })
    .finally(() => {
      building = null;
    });
  return building;
}

export async function searchLibrary(query: SearchQuery): Promise<SearchResultDto> {
  const index = await currentIndex();
  const { matches, total } = index.search(query.q, query.limit);
  const groups = new Map<number, SearchGroupDto>();
  for (const { doc, score } of matches) {
    const d = doc as IndexedSpec;
    let group = groups.get(d.modelId);
    if (!group) {
      group = {
        model: {
          id: d.modelId,
          make: { id: d.makeId, name: d.make },
          name: d.model,
          yearFrom: d.yearFrom,
          yearTo: d.yearTo,
          variant: d.variant,
        },
        hits: [],
      };
      groups.set(d.modelId, group);
    }
    group.hits.push({
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
  return { query: query.q, total, groups: [...groups.values()] };
}
