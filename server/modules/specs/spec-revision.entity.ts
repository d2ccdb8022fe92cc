import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Spec } from './spec.entity';

export type RevisionOrigin = 'edit' | 'import' | 'correction' | 'revert';

/** The values of a spec as one revision left them (append-only history). */
export type SpecSnapshot = {
  parameter: string;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: string;
  refTempC: number | null;
  material: 'copper' | 'none';
  testPoints: string | null;
  conditions: string | null;
  notes: string | null;
  sourceId: number | null;
  sourceTitle: string | null;
  sourceEdition: string | null;
  sourcePage: string | null;
  status: 'published' | 'draft';
};

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

  @Column({ type: 'enum', enum: ['edit', 'import', 'correction', 'revert'] })
  origin: RevisionOrigin;

  /** The import batch, correction or revision this one came from, e.g. 'batch #3'. */
  @Column({ name: 'origin_ref', type: 'varchar', length: 60, nullable: true })
  originRef: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
