import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { Make } from './make.entity';
import type { Component } from './component.entity';

@Entity({ name: 'vehicle_models' })
export class VehicleModel {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Index()
  @Column({ name: 'make_id', type: 'int' })
  makeId: number;

  @ManyToOne('Make', 'models', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'make_id' })
  make: Make;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'year_from', type: 'smallint' })
  yearFrom: number;

  @Column({ name: 'year_to', type: 'smallint', nullable: true })
  yearTo: number | null;

  /** Engine, market or trim; '' when the model has one variant. */
  @Column({ type: 'varchar', length: 120, default: '' })
  variant: string;

  /** make + name + years + variant, normalised: the natural key. */
  @Column({ name: 'model_key', type: 'varchar', length: 400, unique: true })
  modelKey: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @OneToMany('Component', 'model')
  components: Component[];
}
