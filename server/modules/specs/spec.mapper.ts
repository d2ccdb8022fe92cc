/** Spec entities → DTOs (the library's own: library/library.mapper.ts). Services return DTOs, never entities. */
import type { RevisionDto, SpecSummaryDto } from '@/lib/contracts/library';
import { formatRange } from '@/lib/units';
import { COLUMN_FIELDS, type SpecValues } from '@/lib/contracts/spec-fields';
import type { Spec } from './spec.entity';
import type { SpecRevision } from './spec-revision.entity';

export function toSpecSummary(s: Spec): SpecSummaryDto {
  return {
    id: s.id,
    componentId: s.componentId,
    parameter: s.parameter,
    quantityKind: s.quantityKind,
    min: s.min,
    nominal: s.nominal,
    max: s.max,
    unit: s.unit,
    refTempC: s.refTempC,
    material: s.material,
    status: s.status,
    version: s.version,
    display: formatRange(s.min, s.nominal, s.max, s.unit),
  };
}

/** Every value field of the list, as the spec card shows it. */
export function specValuesOf(s: Spec): Omit<SpecValues, 'sourceId'> {
  return Object.fromEntries(COLUMN_FIELDS.map((f) => [f.key, s[f.key]])) as Omit<SpecValues, 'sourceId'>;
}

export function toRevision(r: SpecRevision): RevisionDto {
  return {
    id: r.id,
    version: r.version,
    changedFields: r.changedFields,
    authorName: r.authorName,
    reason: r.reason,
    origin: r.origin,
    originRef: r.originRef,
    createdAt: r.createdAt.toISOString(),
    snapshot: r.snapshot,
  };
}
