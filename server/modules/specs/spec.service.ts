/** Reading specs: one spec with its citation, place in the library and full history. */
import type { SpecDetailDto } from '@/lib/contracts/library';
import { AppError } from '@/server/errors/app-error';
import { roleAtLeast, type SignedInUser } from '@/server/auth/roles';
import { RevisionRepository, SpecRepository } from './spec.repository';
import { toRevision, toSpecSummary, specValuesOf } from './spec.mapper';
import { toComponent, toModelRef, toSource } from '../library/library.mapper';
import { LibraryCache } from '../library/library-cache';
import { libraryFollower } from '../library/library-follower';

/**
 * Drafts are the editors' work in progress: to everyone below editor (and to anonymous
 * visitors) a draft spec does not exist, on every path that reads a spec by id, as in
 * search, model sheets and verdicts.
 */
export const seesDrafts = (viewer: SignedInUser | undefined) => !!viewer && roleAtLeast(viewer.role, 'editor');

/** 404 unless the spec is published or the viewer may see drafts. */
export function checkVisible(spec: { id: number; status: string }, viewer: SignedInUser | undefined) {
  if (spec.status !== 'published' && !seesDrafts(viewer)) throw AppError.notFound('spec', spec.id);
}

export async function getSpec(id: number): Promise<SpecDetailDto> {
  const spec = await SpecRepository.findCard(id);
  if (!spec) throw AppError.notFound('spec', id);
  const revisions = await RevisionRepository.historyOf(id, 'DESC');
  return {
    ...toSpecSummary(spec),
    ...specValuesOf(spec),
    source: spec.source ? toSource(spec.source) : null,
    component: toComponent(spec.component),
    model: toModelRef(spec.component.model),
    updatedAt: spec.updatedAt.toISOString(),
    revisions: revisions.map(toRevision),
  };
}

/**
 * Spec cards are read far more often than written: GET /api/specs/:id answers from a
 * small in-memory cache, dropped whenever the library changes in this process, entry by
 * entry when library_changes names a spec written by any process (libraryFollower), and
 * trusted for at most a few seconds in any case. Writers use getSpec(), which always
 * reads the database.
 */
const cache = new LibraryCache<number, SpecDetailDto>(5000, 5000);
libraryFollower.subscribe((ids) => {
  for (const id of ids) cache.delete(id);
});

export async function readSpec(id: number, viewer: SignedInUser | undefined): Promise<SpecDetailDto> {
  const dto = await cache.get(id, () => getSpec(id));
  checkVisible(dto, viewer);
  return dto;
}
