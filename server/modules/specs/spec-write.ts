/**
 * The one way editors' writes change a spec: lock the row, check the version the edit is
 * based on, write the new values with version + 1 and append one revision with the full
 * snapshot and the changed fields. A stale version becomes 409 carrying the current spec;
 * nothing is silently overwritten.
 */
import type { EntityManager } from 'typeorm';
import { specValueIssues } from '@/lib/contracts/curation';
import type { SpecValues } from '@/lib/contracts/spec-fields';
import { diffSnapshots, snapshotOfSpec } from '@/lib/contracts/spec-snapshot';
import { parseUnit } from '@/lib/units';
import { isLockContention, writeTransaction } from '@/server/db/deadlock-retry';
import { AppError } from '@/server/errors/app-error';
import type { Actor } from '@/server/auth/actor';
import { foldKey } from '../library/keys';
import { recordSpecChange } from '../library/library-changes';
import type { Source } from '../library/source.entity';
import { Spec } from './spec.entity';
import { RevisionRepository, SourceRepository, SpecRepository } from './spec.repository';
import type { RevisionOrigin } from '@/lib/contracts/enums';
import { getSpec } from './spec.service';

/** Thrown inside a transaction; becomes 409 with the current spec once it has rolled back. */
export class StaleSpec extends Error {
  constructor(
    readonly specId: number,
    message: string,
  ) {
    super(message);
  }
}

export async function inSpecTransaction<T>(fn: (m: EntityManager) => Promise<T>): Promise<T> {
  try {
    return await writeTransaction(fn);
  } catch (err) {
    if (err instanceof StaleSpec) throw AppError.conflict(err.message, { current: await getSpec(err.specId) });
    if (isLockContention(err))
      throw AppError.conflict('Someone else is saving this spec right now. Load it again and retry.');
    throw err;
  }
}

/** Locks the spec row for this transaction and checks the version the write is based on. */
export async function lockSpec(
  m: EntityManager,
  id: number,
  version: number,
): Promise<{ spec: Spec; source: Source | null }> {
  const spec = await m.withRepository(SpecRepository).lockById(id);
  if (!spec) throw AppError.notFound('spec', id);
  if (spec.version !== version) {
    throw new StaleSpec(
      id,
      `Spec ${id} has changed since version ${version} (it is now at version ${spec.version}). Nothing was saved; review the current values and apply your change again.`,
    );
  }
  const source = await m.withRepository(SourceRepository).findCited(spec.sourceId);
  return { spec, source };
}

/** 422 when the spec a write would leave breaks the value rules (e.g. a new max below the old min). */
export function checkValues(values: SpecValues) {
  const issues = specValueIssues(values);
  if (issues.length) throw AppError.unprocessable(`The spec would not be valid: ${issues[0].message}.`, issues);
}

async function checkParameterFree(m: EntityManager, spec: Spec, parameter: string) {
  const key = foldKey(parameter);
  if (key === spec.parameterKey) return;
  const other = await m.withRepository(SpecRepository).findByParameterKey(spec.componentId, key);
  if (other)
    throw AppError.conflict(`This component already has a spec for '${other.parameter}' (spec ${other.id}).`, {
      specId: other.id,
    });
}

type Change = { values: SpecValues; actor: Actor; reason: string; origin: RevisionOrigin; originRef: string | null };

/**
 * Writes the change and its revision; returns false (and writes nothing) when the values
 * are the ones the spec already has.
 */
export async function writeSpecChange(
  m: EntityManager,
  spec: Spec,
  source: Source | null,
  change: Change,
): Promise<boolean> {
  const { values } = change;
  const nextSource =
    values.sourceId === source?.id ? source : await m.withRepository(SourceRepository).findCited(values.sourceId);
  const after = snapshotOfSpec(values, nextSource);
  const changes = diffSnapshots(snapshotOfSpec(spec, source), after);
  if (changes.length === 0) return false;
  await checkParameterFree(m, spec, values.parameter);
  const kind = parseUnit(values.unit)!.kind;
  const result = await m
    .createQueryBuilder()
    .update(Spec)
    .set({ ...values, parameterKey: foldKey(values.parameter), quantityKind: kind, version: () => 'version + 1' })
    .where('id = :id AND version = :version', { id: spec.id, version: spec.version })
    .execute();
  if (result.affected !== 1)
    throw new StaleSpec(spec.id, `Spec ${spec.id} changed while this edit was being saved. Nothing was saved.`);
  await m.withRepository(RevisionRepository).append({
    specId: spec.id,
    version: spec.version + 1,
    snapshot: after,
    changedFields: changes.map((c) => c.field),
    actor: change.actor,
    reason: change.reason,
    origin: change.origin,
    originRef: change.originRef,
  });
  await recordSpecChange(m, spec.id);
  return true;
}
