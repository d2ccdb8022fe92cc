import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Finding, PlanStep, System } from '@/lib/contracts/plans';

/**
 * A plan run on a job. The plan's steps are copied in when the run starts, so an editor's
 * later change never moves a run under the technician's feet; the run's state lives here,
 * on the server, so it can be paused on one device and resumed on another.
 */
@Entity({ name: 'plan_runs' })
@Index('ix_plan_runs_job', ['jobId'])
export class PlanRun {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'job_id', type: 'int' })
  jobId: number;

  @Column({ name: 'plan_id', type: 'int' })
  planId: number;

  @Column({ name: 'plan_version', type: 'int' })
  planVersion: number;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'varchar', length: 200 })
  symptom: string;

  @Column({ type: 'varchar', length: 20 })
  system: System;

  @Column({ type: 'json' })
  steps: PlanStep[];

  /** The step waiting for a result; null once the run has reached its finding. */
  @Column({ name: 'current_step', type: 'varchar', length: 60, nullable: true })
  currentStep: string | null;

  @Column({ type: 'enum', enum: ['active', 'concluded'], default: 'active' })
  status: 'active' | 'concluded';

  @Column({ type: 'json', nullable: true })
  finding: (Finding & { stepId: string }) | null;

  @CreateDateColumn({ name: 'started_at', type: 'datetime', precision: 3 })
  startedAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
