import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type SourceKind = 'service_manual' | 'bulletin' | 'datasheet' | 'handbook';

/** A document that specs cite: many specs point at one source, each with its own page. */
@Entity({ name: 'sources' })
export class Source {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  edition: string;

  @Column({ type: 'varchar', length: 200, nullable: true })
  publisher: string | null;

  @Column({ type: 'smallint', nullable: true })
  year: number | null;

  @Column({ type: 'enum', enum: ['service_manual', 'bulletin', 'datasheet', 'handbook'], default: 'service_manual' })
  kind: SourceKind;

  @Column({ type: 'varchar', length: 500, nullable: true })
  url: string | null;

  /** title + edition, normalised: the natural key used by the importer. */
  @Column({ name: 'source_key', type: 'varchar', length: 420, unique: true })
  sourceKey: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
