/**
 * What the search index is built from: the published specs with their component, model
 * and make (joined through the entities' relations), and a fingerprint that moves when
 * any of them changes.
 */
import { AppDataSource } from '@/server/db/data-source';
import type { QuantityKind } from '@/lib/contracts/library';
import type { CanonicalUnit } from '@/lib/units';
import { Spec } from '../specs/spec.entity';
import type { SearchDoc } from './search-index';

export type IndexedSpec = SearchDoc & {
  makeId: number;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
};

const published = () => AppDataSource.getRepository(Spec).createQueryBuilder('s').where("s.status = 'published'");

/** How many specs are published and when the last one changed. */
export async function publishedFingerprint(): Promise<string> {
  const row: { n: string | number; t: Date | string | null } | undefined = await published()
    .select('COUNT(*)', 'n')
    .addSelect('MAX(s.updated_at)', 't')
    .getRawOne();
  return `${row?.n ?? 0}|${row?.t ? new Date(row.t).toISOString() : ''}`;
}

export async function loadPublishedDocs(): Promise<IndexedSpec[]> {
  const rows: IndexedSpec[] = await published()
    .innerJoin('s.component', 'c')
    .innerJoin('c.model', 'vm')
    .innerJoin('vm.make', 'mk')
    .select('s.id', 'specId')
    .addSelect('vm.id', 'modelId')
    .addSelect('mk.id', 'makeId')
    .addSelect('mk.name', 'make')
    .addSelect('vm.name', 'model')
    .addSelect('vm.year_from', 'yearFrom')
    .addSelect('vm.year_to', 'yearTo')
    .addSelect('vm.variant', 'variant')
    .addSelect('c.name', 'component')
    .addSelect('s.parameter', 'parameter')
    .addSelect('s.quantity_kind', 'quantityKind')
    .addSelect('s.min_value', 'min')
    .addSelect('s.nominal_value', 'nominal')
    .addSelect('s.max_value', 'max')
    .addSelect('s.unit', 'unit')
    .getRawMany();
  return rows.map((r) => ({
    ...r,
    yearFrom: Number(r.yearFrom),
    yearTo: r.yearTo === null ? null : Number(r.yearTo),
  }));
}
