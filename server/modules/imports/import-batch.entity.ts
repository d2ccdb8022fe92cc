import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type ImportCounts = { created: number; updated: number; unchanged: number; rejected: number };
export type ImportStatus = 'previewed' | 'committed' | 'failed';

/** One uploaded or loaded CSV file: what it would change and whether it was committed. */
@Entity({ name: 'import_batches' })
export class ImportBatch {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'file_name', type: 'varchar', length: 255 })
  fileName: string;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ name: 'uploader_id', type: 'int', nullable: true })
  uploaderId: number | null;

  @Column({ name: 'uploader_name', type: 'varchar', length: 120 })
  uploaderName: string;

  @Column({ type: 'json' })
  counts: ImportCounts;

  /** Rejected rows: line, column and a plain reason. */
  @Column({ name: 'row_errors', type: 'json' })
  rowErrors: Array<{ line: number; column: string | null; reason: string }>;

  @Column({ type: 'enum', enum: ['previewed', 'committed', 'failed'] })
  status: ImportStatus;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @Column({ name: 'committed_at', type: 'datetime', precision: 3, nullable: true })
  committedAt: Date | null;
}
