/** Library entities (models, components, sources) → DTOs. Mappers never query. */
import type { ComponentDto, ModelRefDto, SourceDto } from '@/lib/contracts/library';
import type { VehicleModel } from './vehicle-model.entity';
import type { Component } from './component.entity';
import type { Source } from './source.entity';

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
