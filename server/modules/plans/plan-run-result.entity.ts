import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One step's result in a run: its outcome and verdict, the job reading that holds the
 * measurement (null for a skip or an observation), and the Idempotency-Key it came with.
 * Going back marks the last result `undone`; it is kept, never deleted.
 */
@Entity({ name: 'plan_run_results' })
@Index('uq_plan_run_results_key', ['runId', 'idempotencyKey'], { unique: true })
export class PlanRunResult {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'run_id', type: 'int' })
  runId: number;

  @Column({ name: 'step_id', type: 'varchar', length: 60 })
  stepId: string;

  @Column({ type: 'varchar', length: 60 })
  outcome: string;

  @Column({ type: 'enum', enum: ['pass', 'marginal', 'fail'], nullable: true })
  verdict: 'pass' | 'marginal' | 'fail' | null;

  @Column({ type: 'text' })
  reason: string;

  @Column({ name: 'reading_id', type: 'int', nullable: true })
  readingId: number | null;

  @Column({ name: 'skip_reason', type: 'varchar', length: 300, nullable: true })
  skipReason: string | null;

  @Column({ name: 'idempotency_key', type: 'varchar', length: 80 })
  idempotencyKey: string;

  /** requestHash() of the body sent with that key (null for results stored before it was kept). */
  @Column({ name: 'request_hash', type: 'char', length: 64, nullable: true })
  requestHash: string | null;

  @Column({ type: 'boolean', default: false })
  undone: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
