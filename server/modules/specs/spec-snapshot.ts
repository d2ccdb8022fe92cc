/**
 * Revision snapshots: the full values of a spec as one revision left them, built here for
 * the editor and the reverter (the importer builds the same object in SQL, JSON_OBJECT in
 * import-apply.ts), and compared field by field for the history's diffs.
 */
import type { FieldChangeDto } from '@/lib/contracts/curation';
import type { Source } from '../library/source.entity';
import type { Spec } from './spec.entity';
import type { SpecSnapshot } from './spec-revision.entity';

/** The fields a history shows, in order; sourceId is internal (title and edition show it). */
export const SNAPSHOT_FIELDS = [
  'parameter',
  'min',
  'nominal',
  'max',
  'unit',
  'refTempC',
  'material',
  'testPoints',
  'conditions',
  'notes',
  'sourceTitle',
  'sourceEdition',
  'sourcePage',
  'status',
] as const satisfies readonly (keyof SpecSnapshot)[];

type SpecValues = Pick<
  Spec,
  | 'parameter'
  | 'min'
  | 'nominal'
  | 'max'
  | 'unit'
  | 'refTempC'
  | 'material'
  | 'testPoints'
  | 'conditions'
  | 'notes'
  | 'sourcePage'
  | 'status'
>;

export function snapshotOfSpec(
  spec: SpecValues,
  source: Pick<Source, 'id' | 'title' | 'edition'> | null,
): SpecSnapshot {
  return {
    parameter: spec.parameter,
    min: spec.min,
    nominal: spec.nominal,
    max: spec.max,
    unit: spec.unit,
    refTempC: spec.refTempC,
    material: spec.material,
    testPoints: spec.testPoints,
    conditions: spec.conditions,
    notes: spec.notes,
    sourceId: source?.id ?? null,
    sourceTitle: source?.title ?? null,
    sourceEdition: source?.edition ?? null,
    sourcePage: spec.sourcePage,
    status: spec.status,
  };
}

type Value = string | number | null;
const valueOf = (s: Partial<SpecSnapshot> | null, field: keyof SpecSnapshot): Value => {
  const v = s?.[field];
  return v === undefined || v === '' ? null : (v as Value);
};

/** Field-by-field differences; against nothing (a first revision) every field that has a value. */
export function diffSnapshots(before: Partial<SpecSnapshot> | null, after: Partial<SpecSnapshot>): FieldChangeDto[] {
  return SNAPSHOT_FIELDS.map((field) => ({
    field,
    before: valueOf(before, field),
    after: valueOf(after, field),
  })).filter((c) => c.before !== c.after);
}
