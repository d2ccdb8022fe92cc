/**
 * A spec's revision history with field diffs, and reverting to one revision's values
 * (written as a new revision: history is append-only).
 */
import type { RevertSpecBody, RevisionDiffDto, RevisionListDto } from '@/lib/contracts/curation';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { diffSnapshots, valuesOfSnapshot } from '@/lib/contracts/spec-snapshot';
import { AppError } from '@/server/errors/app-error';
import type { Actor } from '@/server/auth/actor';
import type { SignedInUser } from '@/server/auth/roles';
import { markLibraryChanged } from '../search/search.service';
import type { SpecRevision } from './spec-revision.entity';
import { RevisionRepository, SpecRepository } from './spec.repository';
import { checkValues, inSpecTransaction, lockSpec, writeSpecChange } from './spec-write';
import { checkVisible, getSpec } from './spec.service';

/** Newest first, each with its changes against the revision before it (a draft's only for editors). */
export async function listRevisions(specId: number, viewer: SignedInUser | undefined): Promise<RevisionListDto> {
  const spec = await SpecRepository.versionOf(specId);
  if (!spec) throw AppError.notFound('spec', specId);
  checkVisible(spec, viewer);
  const revisions = await RevisionRepository.historyOf(specId, 'ASC');
  const withDiffs = revisions.map((r, i): RevisionDiffDto => ({
    id: r.id,
    version: r.version,
    origin: r.origin,
    originRef: r.originRef,
    authorName: r.authorName,
    reason: r.reason,
    createdAt: r.createdAt.toISOString(),
    changedFields: r.changedFields,
    changes: diffSnapshots(i === 0 ? null : revisions[i - 1].snapshot, r.snapshot),
    snapshot: r.snapshot,
  }));
  return { specId, version: spec.version, revisions: withDiffs.reverse() };
}

async function revisionOf(specId: number, revisionId: number): Promise<SpecRevision> {
  const revision = await RevisionRepository.findOneBy({ id: revisionId });
  if (revision?.specId === specId) return revision;
  if (!(await SpecRepository.existsBy({ id: specId }))) throw AppError.notFound('spec', specId);
  throw AppError.notFound(`revision of spec ${specId}`, revisionId);
}

/** Applies the revision's snapshot as a new revision (origin 'revert'); 409 on a stale version. */
export async function revertSpec(specId: number, body: RevertSpecBody, actor: Actor): Promise<SpecDetailDto> {
  const revision = await revisionOf(specId, body.revisionId);
  const changed = await inSpecTransaction(async (m) => {
    const { spec, source } = await lockSpec(m, specId, body.version);
    const values = valuesOfSnapshot(revision.snapshot, spec);
    checkValues(values);
    return writeSpecChange(m, spec, source, {
      values,
      actor,
      reason: body.reason,
      origin: 'revert',
      originRef: `revision #${revision.id}`,
    });
  });
  if (changed) markLibraryChanged();
  return getSpec(specId);
}
