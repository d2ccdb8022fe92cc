/** Entities → DTOs. Services return DTOs, never entities. */
import type { ComponentDto, ModelRefDto, RevisionDto, SourceDto, SpecSummaryDto } from '@/lib/contracts/library';
import { formatRange } from '@/lib/units';
import { COLUMN_FIELDS, type SpecValues } from '@/lib/contracts/spec-fields';
import type { Spec } from './spec.entity';
import type { SpecRevision } from './spec-revision.entity';
import type { VehicleModel } from '../library/vehicle-model.entity';
import type { Component } from '../library/component.entity';
import type { Source } from '../library/source.entity';

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

export function toModelRef(m: VehicleModel): ModelRefDto {
  return {
    id: m.id,
    make: { id: m.make.id, name: m.make.name },
    name: m.name,
    yearFrom: m.yearFrom,
    yearTo: m.yearTo,
    variant: m.variant,
  };
}

export function toComponent(c: Component): ComponentDto {
  return { id: c.id, name: c.name, locationNotes: c.locationNotes, connectorNotes: c.connectorNotes };
}

export function toSource(s: Source): SourceDto {
  return {
    id: s.id,
    title: s.title,
    edition: s.edition,
    publisher: s.publisher,
    year: s.year,
    kind: s.kind,
    url: s.url,
  };
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
