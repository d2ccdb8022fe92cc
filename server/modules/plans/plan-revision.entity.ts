import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { PlanBody } from '@/lib/contracts/plans';

/** Append-only: one row per version of a plan, with the full snapshot, author and reason. */
@Entity({ name: 'plan_revisions' })
@Index('uq_plan_revisions_plan_version', ['planId', 'version'], { unique: true })
export class PlanRevision {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'plan_id', type: 'int' })
  planId: number;

  @Column({ type: 'int' })
  version: number;

  @Column({ type: 'json' })
  snapshot: PlanBody;

  @Column({ name: 'changed_fields', type: 'json' })
  changedFields: string[];

  @Column({ name: 'author_id', type: 'int', nullable: true })
  authorId: number | null;

  @Column({ name: 'author_name', type: 'varchar', length: 120 })
  authorName: string;

  @Column({ type: 'varchar', length: 500 })
  reason: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
