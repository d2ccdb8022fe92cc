/**
 * Planning an import: compares validated CSV rows with what the library holds and
 * says, row by row, whether the spec would be created, updated (with field diffs) or
 * left unchanged. Reads only; the commit (import-apply.ts) writes.
 */
import type { EntityManager } from 'typeorm';
import type { SpecCsvRow } from '@/lib/csv';
import { SPEC_FIELDS, hasFlag, type KeysWith, type SpecValues } from '@/lib/contracts/spec-fields';
import { sourceName } from '@/lib/format/citation';
import type { Spec } from '../specs/spec.entity';
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

/** The fields the plan compares, in order; the cited source's title and edition compare as one 'source'. */
const COMPARED = SPEC_FIELDS.filter((f) => hasFlag(f, 'imported'));
const SPEC_COMPARED = COMPARED.filter((f) => f.column !== null);
type ComparedKey = Extract<KeysWith<'imported'>, keyof SpecValues>;

/** The compared values, each spec field by `valueOf`, the source once (where its first field stands). */
function compared(valueOf: (key: ComparedKey) => string | number | null, source: string | null): Comparable {
  const out: Comparable = {};
  for (const f of COMPARED) {
    if (f.column === null) out.source = source;
    else out[f.key] = valueOf(f.key as ComparedKey);
  }
  return out;
}

/** The spec fields a CSV row sets, in the form both sides are compared in. */
export function rowFields(row: SpecCsvRow): Comparable {
  const emptyAsNull = (v: string | number | null | undefined) => (v === '' || v === undefined ? null : v);
  return compared((key) => emptyAsNull(row[key]), sourceKey({ title: row.sourceTitle, edition: row.sourceEdition }));
}

/** What the plan needs of an existing spec (read with plain SQL: 50 000 entities hydrate slowly). */
type ExistingSpec = Pick<Spec, 'id' | 'version' | ComparedKey> & {
  source: { title: string; edition: string } | null;
};

function specFields(spec: ExistingSpec): Comparable {
  return compared((key) => spec[key], spec.source ? sourceKey(spec.source) : null);
}

/** The compared spec columns, selected under their field names. */
const SELECTED = SPEC_COMPARED.map((f) => `s.${f.column} AS ${f.key}`).join(', ');

export function diffFields(before: Comparable, after: Comparable): FieldChange[] {
  return Object.keys(after)
    .filter((field) => before[field] !== after[field])
    .map((field) => ({ field, before: before[field] ?? null, after: after[field] ?? null }));
}

export const specRowKey = (row: SpecCsvRow) => `${modelKey(row)}|${foldKey(row.component)}|${foldKey(row.parameter)}`;

type ExistingRow = Omit<ExistingSpec, 'source'> & {
  key: string;
  sourceTitle: string | null;
  sourceEdition: string | null;
};

/** Loads the existing specs of the models the rows name, keyed like specRowKey. */
async function loadExisting(m: EntityManager, rows: SpecCsvRow[]): Promise<Map<string, ExistingSpec>> {
  const modelKeys = [...new Set(rows.map((r) => modelKey(r)))];
  const existing = new Map<string, ExistingSpec>();
  for (let i = 0; i < modelKeys.length; i += 500) {
    const found: ExistingRow[] = await m.query(
      `SELECT s.id, s.version, ${SELECTED},
              src.title AS sourceTitle, src.edition AS sourceEdition, CONCAT(vm.model_key, '|', c.name_key, '|', s.parameter_key) AS \`key\`
         FROM vehicle_models vm JOIN components c ON c.model_id = vm.id JOIN specs s ON s.component_id = c.id
         LEFT JOIN sources src ON src.id = s.source_id
        WHERE vm.model_key IN (?)`,
      [modelKeys.slice(i, i + 500)],
    );
    for (const { key, sourceTitle, sourceEdition, ...spec } of found) {
      existing.set(key, {
        ...spec,
        source: sourceTitle === null ? null : { title: sourceTitle, edition: sourceEdition ?? '' },
      });
    }
  }
  return existing;
}

/** Sources compare by natural key (case and spacing ignored) but show as the editor wrote them. */
const sourceLabel = (s: { title: string; edition: string }) =>
  sourceName({ title: s.title.trim(), edition: s.edition.trim() });

function readable(change: FieldChange, spec: ExistingSpec, row: SpecCsvRow): FieldChange {
  if (change.field !== 'source') return change;
  return {
    field: 'source',
    before: spec.source ? sourceLabel(spec.source) : null,
    after: sourceLabel({ title: row.sourceTitle, edition: row.sourceEdition }),
  };
}

/** The fields of columns added later (csvOptional): a file without the column keeps the spec's value. */
const UNSTATED_KEPT = SPEC_COMPARED.filter((f) => hasFlag(f, 'csvOptional')).map((f) => f.key as ComparedKey);

function keepUnstated(row: SpecCsvRow, spec: ExistingSpec): SpecCsvRow {
  const kept: Record<string, unknown> = {};
  for (const key of UNSTATED_KEPT) if (row[key as keyof SpecCsvRow] === undefined) kept[key] = spec[key];
  return { ...row, ...kept } as SpecCsvRow;
}

export async function planImport(m: EntityManager, rows: { line: number; row: SpecCsvRow }[]): Promise<PlannedRow[]> {
  const existing = await loadExisting(
    m,
    rows.map((r) => r.row),
  );
  return rows.map(({ line, row: stated }) => {
    const spec = existing.get(specRowKey(stated));
    if (!spec) return { line, row: stated, action: 'create', specId: null, baseVersion: null, changes: [] };
    const row = keepUnstated(stated, spec);
    const changes = diffFields(specFields(spec), rowFields(row)).map((c) => readable(c, spec, row));
    return {
      line,
      row,
      action: changes.length ? 'update' : 'unchanged',
      specId: spec.id,
      baseVersion: spec.version,
      changes,
    };
  });
}
