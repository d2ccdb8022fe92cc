import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Spec } from '../specs/spec.entity';
import type { Job } from './job.entity';

/**
 * One meter reading judged on a job: the inputs as given, the spec limits and version
 * it was judged against, and the engine's answer. Never edited: a re-take is a new
 * reading that supersedes this one.
 */
@Entity({ name: 'readings' })
@Index('uq_readings_job_key', ['jobId', 'idempotencyKey'], { unique: true })
export class Reading {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Index()
  @Column({ name: 'job_id', type: 'int' })
  jobId: number;

  // Relations for joins only: the schema has no foreign keys on readings (createForeignKeyConstraints: false).
  @ManyToOne('Job', { createForeignKeyConstraints: false })
  @JoinColumn({ name: 'job_id' })
  job?: Job;

  @Column({ name: 'spec_id', type: 'int', nullable: true })
  specId: number | null;

  @ManyToOne('Spec', { createForeignKeyConstraints: false, nullable: true })
  @JoinColumn({ name: 'spec_id' })
  spec?: Spec | null;

  @Column({ name: 'spec_version', type: 'int', nullable: true })
  specVersion: number | null;

  /** What was measured: the spec's component and parameter, or the technician's words. */
  @Column({ type: 'varchar', length: 200 })
  label: string;

  @Column({ name: 'component_name', type: 'varchar', length: 120, default: '' })
  componentName: string;

  /** The limits used (min, nominal, max, unit, refTempC, material). */
  @Column({ name: 'spec_limits', type: 'json' })
  specLimits: Record<string, unknown>;

  /** The verdict inputs as sent (reading, leads, series, temperature, meter). */
  @Column({ type: 'json' })
  inputs: Record<string, unknown>;

  @Column({ type: 'double' })
  value: number;

  @Column({ type: 'varchar', length: 8 })
  unit: string;

  @Column({ name: 'expanded_uncertainty', type: 'double', nullable: true })
  expandedUncertainty: number | null;

  @Column({ name: 'conformance_probability', type: 'double', nullable: true })
  conformanceProbability: number | null;

  @Column({ type: 'enum', enum: ['pass', 'marginal', 'fail'] })
  verdict: 'pass' | 'marginal' | 'fail';

  @Column({ type: 'text' })
  reason: string;

  @Column({ type: 'json' })
  steps: unknown[];

  @Column({ type: 'json' })
  zones: Record<string, unknown>;

  @Column({ name: 'idempotency_key', type: 'varchar', length: 80 })
  idempotencyKey: string;

  /** SHA-256 of the request body (request-hash.ts); null for readings stored before it was kept. */
  @Column({ name: 'request_hash', type: 'char', length: 64, nullable: true })
  requestHash: string | null;

  @Column({ name: 'superseded_by', type: 'int', nullable: true })
  supersededBy: number | null;

  /** When the technician took it (may be earlier than created_at when queued offline). */
  @Column({ name: 'taken_at', type: 'datetime', precision: 3 })
  takenAt: Date;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
