/**
 * The library's read queries (makes, models, components and their published specs).
 * Joins go through the entities' relations: model → make, component → specs.
 */
import { AppDataSource } from '@/server/db/data-source';
import { VehicleModel } from './vehicle-model.entity';
import { Component } from './component.entity';

export type ModelCounts = { componentCount: number; specCount: number };

export const ModelRepository = AppDataSource.getRepository(VehicleModel).extend({
  existsById(id: number): Promise<boolean> {
    return this.existsBy({ id });
  },
  findWithMake(id: number): Promise<VehicleModel | null> {
    return this.findOne({ where: { id }, relations: { make: true } });
  },
  /** Every model with its make, by make, name and first year; only one make's when `makeKey` is given. */
  listWithMakes(makeKey?: string): Promise<VehicleModel[]> {
    const qb = this.createQueryBuilder('vm')
      .innerJoinAndSelect('vm.make', 'mk')
      .orderBy('mk.name', 'ASC')
      .addOrderBy('vm.name', 'ASC')
      .addOrderBy('vm.yearFrom', 'ASC');
    if (makeKey) qb.where('mk.nameKey = :make', { make: makeKey });
    return qb.getMany();
  },
});

export const ComponentRepository = AppDataSource.getRepository(Component).extend({
  /** Per model: how many components, and how many published specs they hold. */
  async countsByModel(modelIds: number[]): Promise<Map<number, ModelCounts>> {
    if (modelIds.length === 0) return new Map();
    const rows: { modelId: number; components: string; specs: string }[] = await this.createQueryBuilder('c')
      .leftJoin('c.specs', 's', "s.status = 'published'")
      .select('c.modelId', 'modelId')
      .addSelect('COUNT(DISTINCT c.id)', 'components')
      .addSelect('COUNT(s.id)', 'specs')
      .where('c.modelId IN (:...ids)', { ids: modelIds })
      .groupBy('c.modelId')
      .getRawMany();
    return new Map(
      rows.map((r) => [Number(r.modelId), { componentCount: Number(r.components), specCount: Number(r.specs) }]),
    );
  },
  /** One model's components by name, each with its published specs by parameter. */
  withPublishedSpecs(modelId: number): Promise<Component[]> {
    return this.createQueryBuilder('c')
      .leftJoinAndSelect('c.specs', 's', "s.status = 'published'")
      .where('c.modelId = :modelId', { modelId })
      .orderBy('c.name', 'ASC')
      .addOrderBy('s.parameter', 'ASC')
      .getMany();
  },
});
