import { Column, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import type { VehicleModel } from './vehicle-model.entity';
import type { Spec } from '../specs/spec.entity';

@Entity({ name: 'components' })
@Index('uq_components_model_name', ['modelId', 'nameKey'], { unique: true })
export class Component {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'model_id', type: 'int' })
  modelId: number;

  @ManyToOne('VehicleModel', 'components', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'model_id' })
  model: VehicleModel;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'name_key', type: 'varchar', length: 120 })
  nameKey: string;

  @Column({ name: 'location_notes', type: 'text', nullable: true })
  locationNotes: string | null;

  @Column({ name: 'connector_notes', type: 'text', nullable: true })
  connectorNotes: string | null;

  @OneToMany('Spec', 'component')
  specs: Spec[];
}
