/** The plan area's queries: plans, their revisions, runs and results, and connectors. */
import { In, type EntityManager } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';
import { ComponentConnector } from './component-connector.entity';
import { Plan } from './plan.entity';
import { PlanRevision } from './plan-revision.entity';
import { PlanRun } from './plan-run.entity';
import { PlanRunResult } from './plan-run-result.entity';
import { Component } from '../library/component.entity';

export const PlanRepository = AppDataSource.getRepository(Plan).extend({
  listWithModels(): Promise<Plan[]> {
    return this.find({ relations: { model: { make: true } }, order: { title: 'ASC' } });
  },
  findWithModel(id: number): Promise<Plan | null> {
    return this.findOne({ where: { id }, relations: { model: { make: true } } });
  },
  lockById(id: number): Promise<Plan | null> {
    return this.createQueryBuilder('p').setLock('pessimistic_write').where('p.id = :id', { id }).getOne();
  },
});

export const PlanRevisionRepository = AppDataSource.getRepository(PlanRevision).extend({
  listFor(planId: number): Promise<PlanRevision[]> {
    return this.find({ where: { planId }, order: { version: 'DESC' } });
  },
});

export const PlanRunRepository = AppDataSource.getRepository(PlanRun).extend({
  lockOnJob(id: number, jobId: number): Promise<PlanRun | null> {
    return this.createQueryBuilder('r')
      .setLock('pessimistic_write')
      .where('r.id = :id AND r.jobId = :jobId', { id, jobId })
      .getOne();
  },
  listForJob(jobId: number): Promise<PlanRun[]> {
    return this.find({ where: { jobId }, order: { startedAt: 'DESC', id: 'DESC' } });
  },
});

export const PlanRunResultRepository = AppDataSource.getRepository(PlanRunResult).extend({
  listFor(runIds: number[]): Promise<PlanRunResult[]> {
    if (runIds.length === 0) return Promise.resolve([]);
    return this.find({ where: { runId: In(runIds) }, order: { id: 'ASC' } });
  },
});

/** One model's components with their published specs (and the specs' sources), as the applicability rules read them. */
export function modelParts(modelId: number, m?: EntityManager): Promise<Component[]> {
  return (m ?? AppDataSource.manager)
    .getRepository(Component)
    .createQueryBuilder('c')
    .leftJoinAndSelect('c.specs', 's', "s.status = 'published'")
    .leftJoinAndSelect('s.source', 'src')
    .where('c.modelId = :modelId', { modelId })
    .orderBy('c.name', 'ASC')
    .getMany();
}

export function connectorsOf(componentIds: number[], m?: EntityManager): Promise<ComponentConnector[]> {
  if (componentIds.length === 0) return Promise.resolve([]);
  const repo = (m ?? AppDataSource.manager).getRepository(ComponentConnector);
  return repo.findBy({ componentId: In(componentIds) });
}
