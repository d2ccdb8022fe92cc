/**
 * Planning an import: compares validated CSV rows with what the library holds and
 * says, row by row, whether the spec would be created, updated (with field diffs) or
 * left unchanged. Reads only; the commit (import-apply.ts) writes.
 */
import type { EntityManager } from 'typeorm';
import type { SpecCsvRow } from '../../../lib/csv';
import { Spec } from '../specs/spec.entity';
import { foldKey, modelKey, sourceKey } from '../library/keys';

export type FieldChange = { field: string; before: string | number | null; after: string | number | null };

export type PlannedRow = {
  line: number;
  row: SpecCsvRow;
  action: 'create' | 'update' | 'unchanged';
  specId: number | null;
  baseVersion: number | null;
  changes: FieldChange[];
};

type Comparable = Record<string, string | number | null>;

/** The spec fields a CSV row sets, in the form both sides are compared in. */
export function rowFields(row: SpecCsvRow): Comparable {
  return {
    min: row.min, nominal: row.nominal, max: row.max, unit: row.unit, refTempC: row.refTempC,
    material: row.material, testPoints: row.testPoints || null, conditions: row.conditions || null,
    notes: row.notes || null, source: sourceKey({ title: row.sourceTitle, edition: row.sourceEdition }),
    sourcePage: row.sourcePage || null,
  };
}

function specFields(spec: Spec): Comparable {
  return {
    min: spec.min, nominal: spec.nominal, max: spec.max, unit: spec.unit, refTempC: spec.refTempC,
    material: spec.material, testPoints: spec.testPoints, conditions: spec.conditions, notes: spec.notes,
    source: spec.source ? sourceKey(spec.source) : null, sourcePage: spec.sourcePage,
  };
}

export function diffFields(before: Comparable, after: Comparable): FieldChange[] {
  return Object.keys(after)
    .filter((field) => before[field] !== after[field])
    .map((field) => ({ field, before: before[field] ?? null, after: after[field] ?? null }));
}

export const specRowKey = (row: SpecCsvRow) => `${modelKey(row)}|${foldKey(row.component)}|${foldKey(row.parameter)}`;

/** Loads the existing specs that the rows name, keyed like specRowKey. */
async function loadExisting(m: EntityManager, rows: SpecCsvRow[]): Promise<Map<string, Spec>> {
  const modelKeys = [...new Set(rows.map((r) => modelKey(r)))];
  const existing = new Map<string, Spec>();
  for (let i = 0; i < modelKeys.length; i += 500) {
    const specs = await m.getRepository(Spec).createQueryBuilder('s')
      .innerJoinAndSelect('s.component', 'c')
      .innerJoinAndSelect('c.model', 'vm')
      .leftJoinAndSelect('s.source', 'src')
      .where('vm.modelKey IN (:...keys)', { keys: modelKeys.slice(i, i + 500) })
      .getMany();
    for (const s of specs) existing.set(`${s.component.model.modelKey}|${s.component.nameKey}|${s.parameterKey}`, s);
  }
  return existing;
}

export async function planImport(m: EntityManager, rows: Array<{ line: number; row: SpecCsvRow }>): Promise<PlannedRow[]> {
  const existing = await loadExisting(m, rows.map((r) => r.row));
  return rows.map(({ line, row }) => {
    const spec = existing.get(specRowKey(row));
    if (!spec) return { line, row, action: 'create', specId: null, baseVersion: null, changes: [] };
    const changes = diffFields(specFields(spec), rowFields(row));
    return { line, row, action: changes.length ? 'update' : 'unchanged', specId: spec.id, baseVersion: spec.version, changes };
  });
}
