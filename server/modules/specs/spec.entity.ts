import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import {
  MATERIALS,
  QUANTITY_KINDS,
  SPEC_STATUSES,
  type CanonicalUnit,
  type Material,
  type QuantityKind,
  type SpecStatus,
} from '@/lib/contracts/enums';
import type { Component } from '../library/component.entity';
import type { Source } from '../library/source.entity';

@Entity({ name: 'specs' })
@Index('uq_specs_component_parameter', ['componentId', 'parameterKey'], { unique: true })
export class Spec {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'component_id', type: 'int' })
  componentId: number;

  @ManyToOne('Component', 'specs', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'component_id' })
  component: Component;

  @Column({ type: 'varchar', length: 120 })
  parameter: string;

  @Column({ name: 'parameter_key', type: 'varchar', length: 120 })
  parameterKey: string;

  @Column({ name: 'quantity_kind', type: 'enum', enum: QUANTITY_KINDS })
  quantityKind: QuantityKind;

  @Column({ name: 'min_value', type: 'double', nullable: true })
  min: number | null;

  @Column({ name: 'nominal_value', type: 'double', nullable: true })
  nominal: number | null;

  @Column({ name: 'max_value', type: 'double', nullable: true })
  max: number | null;

  @Column({ type: 'varchar', length: 8 })
  unit: CanonicalUnit;

  @Column({ name: 'ref_temp_c', type: 'double', nullable: true })
  refTempC: number | null;

  @Column({ type: 'enum', enum: MATERIALS, default: 'none' })
  material: Material;

  @Column({ name: 'test_points', type: 'text', nullable: true })
  testPoints: string | null;

  @Column({ type: 'text', nullable: true })
  conditions: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Index()
  @Column({ name: 'source_id', type: 'int', nullable: true })
  sourceId: number | null;

  @ManyToOne('Source', { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'source_id' })
  source: Source | null;

  @Column({ name: 'source_page', type: 'varchar', length: 200, nullable: true })
  sourcePage: string | null;

  @Column({ type: 'enum', enum: SPEC_STATUSES, default: 'published' })
  status: SpecStatus;

  /** Optimistic lock: every write states the version it was based on. */
  @VersionColumn({ type: 'int' })
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
