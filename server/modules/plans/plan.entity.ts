import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import {
  PLAN_STATUSES,
  SYSTEMS,
  type PlanCitation,
  type PlanStatus,
  type PlanStep,
  type System,
} from '@/lib/contracts/plans';
import type { VehicleModel } from '../library/vehicle-model.entity';

/**
 * A test plan: a symptom, a system and its ordered steps. The steps are one JSON document
 * (checked by lib/contracts/plans.ts and lib/plans/validate.ts), versioned as a whole like a
 * spec: every change bumps `version` and appends a PlanRevision with the full snapshot.
 */
@Entity({ name: 'plans' })
@Index('ix_plans_system_status', ['system', 'status'])
export class Plan {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'varchar', length: 200 })
  symptom: string;

  @Column({ type: 'enum', enum: SYSTEMS })
  system: System;

  /** Null for a generic plan (every model that has the components its steps name). */
  @Index()
  @Column({ name: 'model_id', type: 'int', nullable: true })
  modelId: number | null;

  @ManyToOne('VehicleModel', { createForeignKeyConstraints: false, nullable: true })
  @JoinColumn({ name: 'model_id' })
  model?: VehicleModel | null;

  @Column({ type: 'enum', enum: PLAN_STATUSES, default: 'published' })
  status: PlanStatus;

  @Column({ type: 'json' })
  citation: PlanCitation;

  @Column({ type: 'json' })
  steps: PlanStep[];

  @Column({ type: 'int', default: 1 })
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
