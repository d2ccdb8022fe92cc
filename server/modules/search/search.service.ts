/**
 * Search over the published library. The index is built from MariaDB on first use
 * and rebuilt when the library's fingerprint (spec count and last change) moves,
 * checked at most every few seconds, or at once after markLibraryChanged().
 */
import type { SearchQuery, SearchResultDto, SearchGroupDto, QuantityKind } from '@/lib/contracts/library';
import { formatRange, type CanonicalUnit } from '@/lib/units';
import { AppDataSource } from '@/server/db/data-source';
import { SearchIndex, type SearchDoc } from './search-index';
import { markLibraryChanged, onLibraryChanged } from '../library/library-changes';

type IndexedSpec = SearchDoc & {
  makeId: number;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
};

const RECHECK_MS = 3000;
let state: { index: SearchIndex; fingerprint: string; checkedAt: number } | null = null;
let building: Promise<SearchIndex> | null = null;

export { markLibraryChanged };
onLibraryChanged(() => {
  if (state) state.checkedAt = 0;
});

async function fingerprint(): Promise<string> {
  const [row] = await AppDataSource.query(
    "SELECT COUNT(*) AS n, MAX(updated_at) AS t FROM specs WHERE status = 'published'",
  );
  return `${row.n}|${row.t ? new Date(row.t).toISOString() : ''}`;
}

async function loadDocs(): Promise<IndexedSpec[]> {
  const rows = await AppDataSource.query(`
    SELECT s.id AS specId, vm.id AS modelId, mk.id AS makeId, mk.name AS make, vm.name AS model,
           vm.year_from AS yearFrom, vm.year_to AS yearTo, vm.variant, c.name AS component, s.parameter,
           s.quantity_kind AS quantityKind, s.min_value AS min, s.nominal_value AS nominal, s.max_value AS max, s.unit
      FROM specs s JOIN components c ON c.id = s.component_id
      JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id
     WHERE s.status = 'published'`);
  return rows.map((r: IndexedSpec) => ({
    ...r,
    yearFrom: Number(r.yearFrom),
    yearTo: r.yearTo === null ? null : Number(r.yearTo),
  }));
}

async function currentIndex(): Promise<SearchIndex> {
  const now = Date.now();
  if (state && now - state.checkedAt < RECHECK_MS) return state.index;
  const fp = await fingerprint();
  if (state && state.fingerprint === fp) {
    state.checkedAt = now;
    return state.index;
  }
  building ??= loadDocs()
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
