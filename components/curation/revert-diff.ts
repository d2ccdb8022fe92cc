/**
 * What a revert would change: the spec's values now against the revision's snapshot, over
 * the same fields the server's history diffs (server/modules/specs/spec-snapshot.ts).
 */
import type { FieldChangeDto } from '@/lib/contracts/curation';
import type { SpecDetailDto } from '@/lib/contracts/library';

const FIELDS = [
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
] as const;

type Value = string | number | null;
export type Snapshot = Partial<Record<(typeof FIELDS)[number], unknown>>;

export function snapshotOfDetail(s: SpecDetailDto): Snapshot {
  return {
    parameter: s.parameter,
    min: s.min,
    nominal: s.nominal,
    max: s.max,
    unit: s.unit,
    refTempC: s.refTempC,
    material: s.material,
    testPoints: s.testPoints,
    conditions: s.conditions,
    notes: s.notes,
    sourceTitle: s.source?.title ?? null,
    sourceEdition: s.source?.edition ?? null,
    sourcePage: s.sourcePage,
    status: s.status,
  };
}

const valueOf = (s: Snapshot, f: (typeof FIELDS)[number]): Value => {
  const v = s[f];
  return v === undefined || v === '' ? null : (v as Value);
};

export function revertChanges(now: Snapshot, target: Snapshot): FieldChangeDto[] {
  return FIELDS.map((field) => ({ field, before: valueOf(now, field), after: valueOf(target, field) })).filter(
    (c) => c.before !== c.after,
  );
}
