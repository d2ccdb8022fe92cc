/** Reading the library by model: the list of models and one model's spec sheet. */
import type { ModelDetailDto, ModelSummaryDto, ModelsQuery } from '@/lib/contracts/library';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { VehicleModel } from './vehicle-model.entity';
import { Component } from './component.entity';
import { Spec } from '../specs/spec.entity';
import { toComponent, toModelRef, toSpecSummary } from '../specs/spec.mapper';
import { foldKey } from './keys';

export async function listModels(query: ModelsQuery): Promise<ModelSummaryDto[]> {
  const qb = AppDataSource.getRepository(VehicleModel)
    .createQueryBuilder('vm')
    .innerJoinAndSelect('vm.make', 'mk')
    .orderBy('mk.name', 'ASC')
    .addOrderBy('vm.name', 'ASC')
    .addOrderBy('vm.yearFrom', 'ASC');
  if (query.make) qb.where('mk.nameKey = :make', { make: foldKey(query.make) });
  const models = await qb.getMany();
  const counts = await countsByModel(models.map((m) => m.id));
  return models.map((m) => ({ ...toModelRef(m), ...(counts.get(m.id) ?? { componentCount: 0, specCount: 0 }) }));
}

async function countsByModel(modelIds: number[]): Promise<Map<number, { componentCount: number; specCount: number }>> {
  if (modelIds.length === 0) return new Map();
  const rows: { modelId: number; components: string; specs: string }[] = await AppDataSource.getRepository(Component)
    .createQueryBuilder('c')
    .leftJoin(Spec, 's', "s.component_id = c.id AND s.status = 'published'")
    .select('c.modelId', 'modelId')
    .addSelect('COUNT(DISTINCT c.id)', 'components')
    .addSelect('COUNT(s.id)', 'specs')
    .where('c.modelId IN (:...ids)', { ids: modelIds })
    .groupBy('c.modelId')
    .getRawMany();
  return new Map(
    rows.map((r) => [Number(r.modelId), { componentCount: Number(r.components), specCount: Number(r.specs) }]),
  );
}

export async function getModel(id: number): Promise<ModelDetailDto> {
  const model = await AppDataSource.getRepository(VehicleModel).findOne({ where: { id }, relations: { make: true } });
  if (!model) throw AppError.notFound('model', id);
  const components = await AppDataSource.getRepository(Component).find({
    where: { modelId: id },
    order: { name: 'ASC' },
  });
  const specs = components.length
    ? await AppDataSource.getRepository(Spec)
        .createQueryBuilder('s')
        .where('s.componentId IN (:...ids)', { ids: components.map((c) => c.id) })
        .andWhere("s.status = 'published'")
        .orderBy('s.parameter', 'ASC')
        .getMany()
    : [];
  return {
    ...toModelRef(model),
    componentCount: components.length,
    specCount: specs.length,
    components: components.map((c) => ({
      ...toComponent(c),
      specs: specs.filter((s) => s.componentId === c.id).map(toSpecSummary),
    })),
  };
}
