import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { ConnectorDto } from '@/lib/contracts/plans';

/** A component's optional connector face (lib/contracts/plans.ts Connector), one per component. */
@Entity({ name: 'component_connectors' })
export class ComponentConnector {
  @PrimaryColumn({ name: 'component_id', type: 'int' })
  componentId: number;

  @Column({ type: 'json' })
  connector: ConnectorDto;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
