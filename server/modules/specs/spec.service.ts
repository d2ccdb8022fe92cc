/** Reading specs: one spec with its citation, place in the library and full history. */
import type { SpecDetailDto } from '@/lib/contracts/library';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { Spec } from './spec.entity';
import { SpecRevision } from './spec-revision.entity';
import { toRevision, toSpecSummary, specValuesOf } from './spec.mapper';
import { toComponent, toModelRef, toSource } from '../library/library.mapper';
import { libraryGeneration, onLibraryChanged } from '../library/library-changes';

export async function getSpec(id: number): Promise<SpecDetailDto> {
  const spec = await AppDataSource.getRepository(Spec).findOne({
    where: { id },
    relations: { component: { model: { make: true } }, source: true },
  });
  if (!spec) throw AppError.notFound('spec', id);
  const revisions = await AppDataSource.getRepository(SpecRevision).find({
    where: { specId: id },
    order: { version: 'DESC' },
  });
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
 * small in-memory cache, dropped whenever the library changes in this process and
 * trusted for at most a few seconds (another server process may have written).
 * Writers use getSpec(), which always reads the database.
 */
const CACHE_TTL_MS = 5000;
const CACHE_MAX = 5000;
const cache = new Map<number, { dto: SpecDetailDto; at: number }>();
onLibraryChanged(() => cache.clear());

export async function readSpec(id: number): Promise<SpecDetailDto> {
  const hit = cache.get(id);
  if (hit && Date.now() - hit.at < CACHE_TTL_MS) return hit.dto;
  const generation = libraryGeneration();
  const dto = await getSpec(id);
  // A write that landed while this read was under way may not be in it: do not keep it.
  if (generation === libraryGeneration()) {
    if (cache.size >= CACHE_MAX) cache.delete(cache.keys().next().value!);
    cache.set(id, { dto, at: Date.now() });
  }
  return dto;
}
