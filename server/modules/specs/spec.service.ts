/** Reading specs: one spec with its citation, place in the library and full history. */
import type { SpecDetailDto } from '../../../lib/contracts/library';
import { AppDataSource } from '../../db/data-source';
import { AppError } from '../../errors/app-error';
import { Spec } from './spec.entity';
import { SpecRevision } from './spec-revision.entity';
import { toComponent, toModelRef, toRevision, toSource, toSpecSummary } from './spec.mapper';

export async function getSpec(id: number): Promise<SpecDetailDto> {
  const spec = await AppDataSource.getRepository(Spec).findOne({
    where: { id },
    relations: { component: { model: { make: true } }, source: true },
  });
  if (!spec) throw AppError.notFound('spec', id);
  const revisions = await AppDataSource.getRepository(SpecRevision).find({ where: { specId: id }, order: { version: 'DESC' } });
  return {
    ...toSpecSummary(spec),
    testPoints: spec.testPoints, conditions: spec.conditions, notes: spec.notes, sourcePage: spec.sourcePage,
    source: spec.source ? toSource(spec.source) : null,
    component: toComponent(spec.component),
    model: toModelRef(spec.component.model),
    updatedAt: spec.updatedAt.toISOString(),
    revisions: revisions.map(toRevision),
  };
}
