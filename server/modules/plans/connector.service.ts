/** A component's connector face: editors set or remove it; the plan file can carry them too. */
import type { EntityManager } from 'typeorm';
import type { ConnectorDto } from '@/lib/contracts/plans';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { Component } from '../library/component.entity';
import { markLibraryChanged } from '../library/library-changes';
import { ComponentConnector } from './component-connector.entity';

export async function setConnectorIn(m: EntityManager, componentId: number, connector: ConnectorDto | null) {
  if (!(await m.existsBy(Component, { id: componentId }))) throw AppError.notFound('component', componentId);
  const repo = m.getRepository(ComponentConnector);
  if (connector === null) await repo.delete({ componentId });
  else await repo.save({ componentId, connector });
  return { componentId, connector };
}

export async function setConnector(componentId: number, connector: ConnectorDto | null) {
  const set = await AppDataSource.transaction((m) => setConnectorIn(m, componentId, connector));
  // The runs' cached parts carry the connector faces (run-step.ts).
  markLibraryChanged();
  return set;
}
