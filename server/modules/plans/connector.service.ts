/** A component's connector face: editors set or remove it; the plan file can carry them too. */
import type { EntityManager } from 'typeorm';
import type { ConnectorDto } from '@/lib/contracts/plans';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { Component } from '../library/component.entity';
import { ComponentConnector } from './component-connector.entity';

export async function setConnectorIn(m: EntityManager, componentId: number, connector: ConnectorDto | null) {
  if (!(await m.existsBy(Component, { id: componentId }))) throw AppError.notFound('component', componentId);
  const repo = m.getRepository(ComponentConnector);
  if (connector === null) await repo.delete({ componentId });
  else await repo.save({ componentId, connector });
  return { componentId, connector };
}

export const setConnector = (componentId: number, connector: ConnectorDto | null) =>
  AppDataSource.transaction((m) => setConnectorIn(m, componentId, connector));
