import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** `warnings` (rows accepted with a plausibility warning) is absent on batches from before it existed. */
export type ImportCounts = { created: number; updated: number; unchanged: number; rejected: number; warnings?: number };
export type ImportStatus = 'previewed' | 'committed' | 'failed';

/**
 * One uploaded or loaded CSV file: what it would change and whether it was committed.
 * Its rows, each with the planned action, live in import_batch_rows (see import-stage.ts).
 */
@Entity({ name: 'import_batches' })
export class ImportBatch {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'file_name', type: 'varchar', length: 255 })
  fileName: string;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ name: 'file_size', type: 'int', default: 0 })
  fileSize: number;

  @Column({ name: 'uploader_id', type: 'int', nullable: true })
  uploaderId: number | null;

  @Column({ name: 'uploader_name', type: 'varchar', length: 120 })
  uploaderName: string;

  @Column({ type: 'json' })
  counts: ImportCounts;

  /** File-level problems (a failed batch), or rows rejected by the demo loader: line, column and a plain reason. */
  @Column({ name: 'row_errors', type: 'json' })
  rowErrors: { line: number; column: string | null; reason: string }[];

  @Column({ type: 'enum', enum: ['previewed', 'committed', 'failed'] })
  status: ImportStatus;

  @Index('idx_import_batches_created')
  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @Column({ name: 'committed_at', type: 'datetime', precision: 3, nullable: true })
  committedAt: Date | null;

  @Column({ name: 'committed_by_id', type: 'int', nullable: true })
  committedById: number | null;

  @Column({ name: 'committed_by_name', type: 'varchar', length: 120, nullable: true })
  committedByName: string | null;

  /** The reason recorded on every revision the commit wrote. */
  @Column({ type: 'varchar', length: 500, nullable: true })
  reason: string | null;
}
