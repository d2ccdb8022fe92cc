/**
 * What the search index is built from: the published specs with their component, model
 * and make, read page by page in id order (a full build never holds the whole result
 * set), or by id for the specs a library change names.
 */
import { AppDataSource } from '@/server/db/data-source';
import type { QuantityKind } from '@/lib/contracts/library';
import type { CanonicalUnit } from '@/lib/units';
import type { SearchDoc } from './search-index';

export type IndexedSpec = SearchDoc & {
  makeId: number;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
};

const SELECT = `SELECT s.id AS specId, vm.id AS modelId, mk.id AS makeId, mk.name AS make, vm.name AS model,
       vm.year_from AS yearFrom, vm.year_to AS yearTo, vm.variant, c.name AS component, s.parameter,
       s.quantity_kind AS quantityKind, s.min_value AS min, s.nominal_value AS nominal, s.max_value AS max, s.unit
  FROM specs s STRAIGHT_JOIN components c ON c.id = s.component_id
  STRAIGHT_JOIN vehicle_models vm ON vm.id = c.model_id STRAIGHT_JOIN makes mk ON mk.id = vm.make_id`;

/**
 * Shares equal strings between documents: a million rows name a few thousand models,
 * components and parameters, and each row would otherwise carry its own copies.
 */
class Strings {
  private readonly seen = new Map<string, string>();
  get(s: string): string {
    const known = this.seen.get(s);
    if (known !== undefined) return known;
    if (this.seen.size > 500_000) this.seen.clear();
    this.seen.set(s, s);
    return s;
  }
}
const strings = new Strings();

type Row = Omit<IndexedSpec, 'min' | 'nominal' | 'max'> & {
  min: number | string | null;
  nominal: number | string | null;
  max: number | string | null;
};
const num = (v: number | string | null) => (v === null ? null : Number(v));

function toDoc(r: Row): IndexedSpec {
  return {
    specId: Number(r.specId),
    modelId: Number(r.modelId),
    makeId: Number(r.makeId),
    make: strings.get(r.make),
    model: strings.get(r.model),
    yearFrom: Number(r.yearFrom),
    yearTo: r.yearTo === null ? null : Number(r.yearTo),
    variant: strings.get(r.variant),
    component: strings.get(r.component),
    parameter: strings.get(r.parameter),
    quantityKind: r.quantityKind,
    min: num(r.min),
    nominal: num(r.nominal),
    max: num(r.max),
    unit: strings.get(r.unit) as CanonicalUnit,
  };
}

/** The next `limit` published specs after `afterId`, in id order. */
export async function loadPublishedPage(afterId: number, limit: number): Promise<IndexedSpec[]> {
  const rows: Row[] = await AppDataSource.query(
    `${SELECT} WHERE s.id > ? AND s.status = 'published' ORDER BY s.id LIMIT ?`,
    [afterId, limit],
  );
  return rows.map(toDoc);
}

/** The published ones among `ids` (a spec that is a draft now, or deleted, is absent). */
export async function loadPublishedByIds(ids: number[]): Promise<IndexedSpec[]> {
  if (ids.length === 0) return [];
  const rows: Row[] = await AppDataSource.query(`${SELECT} WHERE s.id IN (?) AND s.status = 'published'`, [ids]);
  return rows.map(toDoc);
}
