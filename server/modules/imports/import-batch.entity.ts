import { IMPORT_STATUSES, type ImportStatus } from '@/lib/contracts/enums';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** `warnings` (rows accepted with a plausibility warning) is absent on batches from before it existed. */
export type ImportCounts = { created: number; updated: number; unchanged: number; rejected: number; warnings?: number };

/**
 * One uploaded or loaded CSV file: what it would change and whether it was committed.
 * Its rows, each with the planned action, live in import_batch_rows (columns and flags in
 * import-rows.ts, written by import-stage.ts, committed by import-apply.ts).
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

  /** File-level problems of a failed batch: line, column and a plain reason (rejected rows are staged rows). */
  @Column({ name: 'row_errors', type: 'json' })
  rowErrors: { line: number; column: string | null; reason: string }[];

  @Column({ type: 'enum', enum: IMPORT_STATUSES })
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
