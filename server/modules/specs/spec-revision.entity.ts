import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { REVISION_ORIGINS, type RevisionOrigin } from '@/lib/contracts/enums';
import type { SpecSnapshot } from '@/lib/contracts/spec-fields';
import type { Spec } from './spec.entity';

@Entity({ name: 'spec_revisions' })
@Index('uq_spec_revisions_spec_version', ['specId', 'version'], { unique: true })
export class SpecRevision {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'spec_id', type: 'int' })
  specId: number;

  @ManyToOne('Spec', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'spec_id' })
  spec: Spec;

  @Column({ type: 'int' })
  version: number;

  @Column({ type: 'json' })
  snapshot: SpecSnapshot;

  @Column({ name: 'changed_fields', type: 'json' })
  changedFields: string[];

  /** Null for changes made by the system itself (the demo library loader). */
  @Index()
  @Column({ name: 'author_id', type: 'int', nullable: true })
  authorId: number | null;

  @Column({ name: 'author_name', type: 'varchar', length: 120 })
  authorName: string;

  @Column({ type: 'varchar', length: 500 })
  reason: string;

  @Column({ type: 'enum', enum: REVISION_ORIGINS })
  origin: RevisionOrigin;

  /** The import batch, correction or revision this one came from, e.g. 'batch #3'. */
  @Column({ name: 'origin_ref', type: 'varchar', length: 60, nullable: true })
  originRef: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
