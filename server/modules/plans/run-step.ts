/**
 * A run's steps as the technician sees them: each step with the library spec it judges
 * against on the job's model (by component and parameter), or null when the step offers
 * typed limits, and the connector face of its test point's component.
 */
import type { ConnectorDto, PlanStep, RunStepDto, SpecForStepDto } from '@/lib/contracts/plans';
import { findComponent, findSpec } from '@/lib/plans/applicability';
import { defaultMode } from '@/lib/specs/classify';
import { formatRange, unitKind, type CanonicalUnit } from '@/lib/units';
import type { Component } from '../library/component.entity';
import type { Spec } from '../specs/spec.entity';
import { LibraryCache } from '../library/library-cache';
import { libraryFollower } from '../library/library-follower';
import { connectorsOf, modelParts } from './plan.repository';

export type JobModelParts = { components: Component[]; connectors: Map<number, ConnectorDto> };

/**
 * A model's components with their published specs, and their connector faces, change only
 * with the library, and every step of every run reads them: they are kept per model, dropped
 * on any library change (this process: onLibraryChanged, which a connector edit also fires;
 * any process: libraryFollower) and trusted for at most a few seconds in any case, like the
 * spec cards (specs/spec.service.ts). Connector edits are not in the change log, so another
 * process shows one within that TTL. The values are shared between requests: nothing may
 * change them.
 */
const partsCache = new LibraryCache<number, JobModelParts>(5000, 500);
libraryFollower.subscribe(() => partsCache.clear());

async function loadParts(modelId: number): Promise<JobModelParts> {
  const components = await modelParts(modelId);
  const connectors = await connectorsOf(components.map((c) => c.id));
  return { components, connectors: new Map(connectors.map((c) => [c.componentId, c.connector])) };
}

/**
 * The job's model's parts, from the cache even inside a writer's transaction: a step is
 * judged against the spec as the technician's screen showed it, at most one library poll
 * behind an edit.
 */
export function jobModelParts(modelId: number | null): Promise<JobModelParts> {
  if (modelId === null) return Promise.resolve({ components: [], connectors: new Map() });
  return partsCache.get(modelId, () => loadParts(modelId));
}

/** The published spec a step's check names on this model, or null. */
export function specOfStep(step: PlanStep, parts: JobModelParts): { spec: Spec; component: Component } | null {
  if (step.check.kind !== 'spec') return null;
  const component = findComponent(step.check.component, parts.components);
  const spec = component ? findSpec(step.check.parameter, component.specs) : null;
  return component && spec ? { spec, component } : null;
}

/** The spec as the run's calculator takes it: the same limits, mode and band the server judges with. */
function specDto(s: Spec): SpecForStepDto {
  return {
    id: s.id,
    mode: s.mode ?? defaultMode(s.parameter, unitKind(s.unit as CanonicalUnit)),
    engineRpm: s.engineRpm ?? null,
    quantityKind: s.quantityKind,
    min: s.min,
    nominal: s.nominal,
    max: s.max,
    unit: s.unit,
    refTempC: s.refTempC,
    material: s.material,
    nearLimit: s.nearLimit,
    display: formatRange(s.min, s.nominal, s.max, s.unit as CanonicalUnit),
    testPoints: s.testPoints,
    conditions: s.conditions,
  };
}

export function toRunStep(steps: PlanStep[], id: string | null, parts: JobModelParts): RunStepDto | null {
  const position = steps.findIndex((s) => s.id === id);
  if (position < 0) return null;
  const step = steps[position];
  const found = specOfStep(step, parts);
  const pointComponent = step.testPoint.component ? findComponent(step.testPoint.component, parts.components) : null;
  const component = pointComponent ?? found?.component ?? null;
  return {
    ...step,
    position,
    spec: found ? specDto(found.spec) : null,
    connector: component ? (parts.connectors.get(component.id) ?? null) : null,
  };
}
