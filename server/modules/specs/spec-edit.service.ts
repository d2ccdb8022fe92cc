/**
 * Editors' spec writes: create a spec (finding or creating its make, model, component and
 * source), and edit one with optimistic locking. Every change writes one revision
 * (origin 'edit', the editor as author, the changed fields and the full snapshot).
 */
import type { EntityManager } from 'typeorm';
import type { CreateSpecBody, UpdateSpecBody } from '@/lib/contracts/curation';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { EDITABLE_FIELDS, type SpecValues } from '@/lib/contracts/spec-fields';
import { pickValues, snapshotOfSpec } from '@/lib/contracts/spec-snapshot';
import { defaultMaterial } from '@/lib/specs/classify';
import { parseUnit } from '@/lib/units';
import { AppError } from '@/server/errors/app-error';
import type { Actor } from '@/server/auth/actor';
import { foldKey } from '../library/keys';
import { recordSpecChange } from '../library/library-changes';
import { markLibraryChanged } from '../search/search.service';
import { Spec } from './spec.entity';
import { RevisionRepository, SourceRepository, SpecRepository } from './spec.repository';
import { ensureComponent, ensureSource } from './spec-library';
import { StaleSpec, checkValues, inSpecTransaction, lockSpec, writeSpecChange } from './spec-write';
import { getSpec } from './spec.service';

const orNull = (s: string) => s || null;

/** Inserts a new spec and its first revision; corrections pass their own origin. */
export async function insertNewSpec(
  m: EntityManager,
  b: CreateSpecBody,
  actor: Actor,
  from: { origin: 'edit' | 'correction'; originRef: string | null } = { origin: 'edit', originRef: null },
): Promise<number> {
  const componentId = await ensureComponent(m, b);
  const existing = await m.withRepository(SpecRepository).findByParameterKey(componentId, foldKey(b.parameter));
  if (existing)
    throw new StaleSpec(
      existing.id,
      `This component already has a spec for '${existing.parameter}' (spec ${existing.id}); edit that one instead.`,
    );
  const sourceId = await ensureSource(m, b.source);
  const kind = parseUnit(b.unit)!.kind;
  const material = b.material ?? defaultMaterial(b.parameter, kind);
  const values = pickValues({ ...b, material, sourceId, sourcePage: b.source.page });
  const { identifiers } = await m
    .withRepository(SpecRepository)
    .insert({ ...values, componentId, parameterKey: foldKey(b.parameter), quantityKind: kind, version: 1 });
  const id = Number(identifiers[0].id);
  const source = await m.withRepository(SourceRepository).findOneByOrFail({ id: sourceId });
  await m.withRepository(RevisionRepository).append({
    specId: id,
    version: 1,
    snapshot: snapshotOfSpec(values, source),
    changedFields: ['created'],
    actor,
    reason: b.reason,
    origin: from.origin,
    originRef: from.originRef,
  });
  await recordSpecChange(m, id);
  return id;
}

export async function createSpec(body: CreateSpecBody, actor: Actor): Promise<SpecDetailDto> {
  const id = await inSpecTransaction((m) => insertNewSpec(m, body, actor)).catch((err) => {
    const code = (err as { driverError?: { code?: string } }).driverError?.code;
    if (code === 'ER_DUP_ENTRY')
      throw AppError.conflict('The same spec was created by someone else a moment ago; load it and edit that one.');
    throw err;
  });
  markLibraryChanged();
  return getSpec(id);
}

/** The spec an edit would leave: the body's fields over the current ones (empty text clears a field). */
function merge(spec: Spec, b: UpdateSpecBody, sourceId: number | null): SpecValues {
  const values: SpecValues = { ...pickValues(spec), sourceId, sourcePage: b.source ? b.source.page : spec.sourcePage };
  const set = values as Record<keyof SpecValues, unknown>;
  for (const key of EDITABLE_FIELDS) {
    const value = b[key];
    if (value !== undefined) set[key] = typeof value === 'string' ? orNull(value) : value;
  }
  return values;
}

/** 200 with the spec as saved (unchanged, with no new revision, when the body changes nothing). */
export async function updateSpec(id: number, body: UpdateSpecBody, actor: Actor): Promise<SpecDetailDto> {
  const changed = await inSpecTransaction(async (m) => {
    const { spec, source } = await lockSpec(m, id, body.version);
    const sourceId = body.source ? await ensureSource(m, body.source) : spec.sourceId;
    const values = merge(spec, body, sourceId);
    checkValues(values);
    return writeSpecChange(m, spec, source, { values, actor, reason: body.reason, origin: 'edit', originRef: null });
  });
  if (changed) markLibraryChanged();
  return getSpec(id);
}
