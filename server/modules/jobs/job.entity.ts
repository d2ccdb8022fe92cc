import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { User } from '../users/user.entity';
import type { VehicleModel } from '../library/vehicle-model.entity';

/** One customer's machine on one job: the readings taken belong to it. */
@Entity({ name: 'jobs' })
@Index('ix_jobs_owner_created', ['ownerId', 'createdAt'])
@Index('uq_jobs_owner_key', ['ownerId', 'idempotencyKey'], { unique: true })
export class Job {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'owner_id', type: 'int' })
  ownerId: number;

  // Relations for joins only: the schema has no foreign keys on jobs (createForeignKeyConstraints: false).
  @ManyToOne('User', { createForeignKeyConstraints: false })
  @JoinColumn({ name: 'owner_id' })
  owner?: User;

  /** The library model, or null for a machine that is not in the library. */
  @Column({ name: 'model_id', type: 'int', nullable: true })
  modelId: number | null;

  @ManyToOne('VehicleModel', { createForeignKeyConstraints: false, nullable: true })
  @JoinColumn({ name: 'model_id' })
  model?: VehicleModel | null;

  /** How the technician names the machine when it is not in the library (or a nickname). */
  @Column({ name: 'machine_label', type: 'varchar', length: 160, default: '' })
  machineLabel: string;

  /** VIN or frame number, free text. */
  @Column({ name: 'machine_id', type: 'varchar', length: 40, default: '' })
  machineId: string;

  @Column({ name: 'customer_ref', type: 'varchar', length: 80, default: '' })
  customerRef: string;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ type: 'enum', enum: ['open', 'closed'], default: 'open' })
  status: 'open' | 'closed';

  /** The Idempotency-Key it was created with (a job started offline and resent), if any. */
  @Column({ name: 'idempotency_key', type: 'varchar', length: 80, nullable: true })
  idempotencyKey: string | null;

  /** requestHash() of the create body sent with that key. */
  @Column({ name: 'request_hash', type: 'char', length: 64, nullable: true })
  requestHash: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
